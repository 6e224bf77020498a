import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { caseResult } from '../../src/extras/analysis-extras.js';
import { loadCaseText, type Case } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/solve-case.js';
import { CAUTIONS } from '../../src/format/cautions.js';
import { buildReport } from '../../src/report/build.js';
import { figuresOf } from '../../src/report/doc.js';
import { renderHtml } from '../../src/report/render-html.js';
import { parseReportJson, renderJson } from '../../src/report/render-json.js';
import { renderMarkdown } from '../../src/report/render-markdown.js';
import { renderText } from '../../src/report/render-text.js';
import { demo, fixture, flat } from './helpers.js';

function load(file: string): Case {
  const r = loadCaseText(readFileSync(file, 'utf8'));
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.case;
}

const META = { toolVersion: '9.9.9-test', generatedAt: '2026-12-01T22:30:00.000Z' };
const FILES = [
  demo('demo-orchard-hill.json'),
  demo('demo-kestrel-bend.json'),
  fixture('quarry-lane-skid.json'),
  fixture('birchfield-yaw.json'),
];
const docOf = (file: string) => {
  const c = load(file);
  return buildReport(caseResult(c, solveCase(c)), { ...META, caseFile: file });
};

const VOID = new Set(['meta', 'br', 'hr', 'img', 'link', 'input', 'col', 'wbr']);

/** Checks that every element is closed in order; returns the first problem, or undefined. */
function tagProblem(html: string): string | undefined {
  const stack: string[] = [];
  const body = html
    .replace(/<!DOCTYPE html>/i, '')
    .replace(/<style>[\s\S]*?<\/style>/, '<style></style>');
  for (const m of body.matchAll(/<(\/?)([a-zA-Z][\w:-]*)((?:"[^"]*"|'[^']*'|[^'">])*)>/g)) {
    const [, close, name, rest] = m;
    const tag = name!.toLowerCase();
    if (VOID.has(tag) || rest!.trimEnd().endsWith('/')) continue;
    if (!close) stack.push(tag);
    else if (stack.pop() !== tag) return `</${tag}> closes the wrong element`;
  }
  return stack.length ? `unclosed: ${stack.join(', ')}` : undefined;
}

describe.each(FILES)('report forms for %s', (file) => {
  it('carries every caution, in every form', () => {
    const doc = docOf(file);
    const forms = [renderMarkdown(doc), renderText(doc), renderHtml(doc)];
    for (const form of forms) {
      // Markdown escapes and HTML entities aside, the words are the ones src/format/cautions.ts holds.
      const plain = flat(
        form
          .replace(/\\([\\`*_[\]<>|#])/g, '$1')
          .replace(/&#39;/g, "'")
          .replace(/&amp;/g, '&'),
      );
      for (const c of CAUTIONS) expect(plain).toContain(c);
    }
  });

  it('text: no line is wider than 80 columns, and no NaN or undefined anywhere', () => {
    const text = renderText(docOf(file));
    for (const line of text.split('\n')) expect([...line].length, line).toBeLessThanOrEqual(80);
    for (const form of [text, renderMarkdown(docOf(file)), renderHtml(docOf(file))])
      expect(form).not.toMatch(/NaN|undefined|Infinity|\[object Object\]/);
  });

  it('html: one document, elements balanced, pictures inlined, nothing fetched from outside', () => {
    const doc = docOf(file);
    const html = renderHtml(doc);
    expect(html.startsWith('<!DOCTYPE html>\n<html lang="en">')).toBe(true);
    expect(html.match(/<html[\s>]/g)).toHaveLength(1);
    expect(html.match(/<\/html>/g)).toHaveLength(1);
    expect(html.match(/<body>/g)).toHaveLength(1);
    expect(tagProblem(html)).toBeUndefined();
    const svgs = figuresOf(doc).filter((f) => f.svg);
    expect(svgs.length).toBeGreaterThan(0);
    expect(html.match(/<svg[\s>]/g) ?? []).toHaveLength(svgs.length);
    expect(html).not.toMatch(/<\?xml/);
    expect(html).not.toMatch(/\s(src|href)="(https?:)?\/\//);
    expect(html).toContain('@media print');
  });

  it('json: round-trips to the same document and the same rendered forms', () => {
    const doc = docOf(file);
    const back = parseReportJson(renderJson(doc));
    expect(back).toStrictEqual(doc);
    expect(renderMarkdown(back!)).toBe(renderMarkdown(doc));
    expect(renderText(back!)).toBe(renderText(doc));
  });

  it('names the tool version, the generation time and the case file the figures come from', () => {
    const text = flat(renderText(docOf(file)));
    expect(text).toContain('9.9.9-test');
    expect(text).toContain('2026-12-01T22:30:00.000Z');
    expect(text).toContain(`recomputed by skidcase 9.9.9-test from the case file ${file}`);
  });

  it('never states fault: the only mention of fault is the caution saying it does not', () => {
    const text = flat(renderText(docOf(file))).toLowerCase();
    const mentions = [
      ...text.matchAll(/[^.]*\b(fault|blame|guilty|culpab\w*|negligen\w*)\b[^.]*\./g),
    ].map((m) => m[0]);
    expect(mentions.length).toBeGreaterThan(0);
    for (const m of mentions) expect(m).toMatch(/does not state fault/);
  });
});

describe('parseReportJson', () => {
  it('refuses text that is not a report', () => {
    expect(parseReportJson('{"format":"skidcase-case","version":1}')).toBeUndefined();
    expect(parseReportJson('not json')).toBeUndefined();
  });
});

describe('drafts and failures (the review screen builds reports from unfinished cases)', () => {
  it('an analysis that cannot be computed says why and states no figure for it', () => {
    const c = load(fixture('steep-shoulder.json'));
    const doc = buildReport(caseResult(c, solveCase(c)), META);
    const text = flat(renderText(doc));
    expect(text).toMatch(/Not computed: .*segment 2/);
    expect(text).not.toMatch(/At least \d/);
    expect(text).toContain('1. skid-1 skid not computed');
    for (const form of [text, renderMarkdown(doc), renderHtml(doc)])
      expect(form).not.toMatch(/NaN|undefined/);
    for (const caution of CAUTIONS) expect(text).toContain(caution);
  });

  it('a case with no analysis yet still gives a complete report with its cautions', () => {
    const c = { ...load(fixture('birchfield-yaw.json')), analyses: [] };
    const text = flat(renderText(buildReport(caseResult(c, solveCase(c)), META)));
    expect(text).toContain('The case holds no analysis yet.');
    expect(text).toContain('This tool does not state fault.');
    expect(tagProblem(renderHtml(buildReport(caseResult(c, solveCase(c)), META)))).toBeUndefined();
  });
});
