import { spawnSync } from 'node:child_process';
import { readFileSync, readdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAUTIONS } from '../../src/format/cautions.js';
import { sha256Of } from '../../src/io/sha256.js';
import { figuresOf, provenanceOf } from '../../src/report/doc.js';
import { parseReportJson } from '../../src/report/render-json.js';
import {
  ROOT,
  decimalsOf,
  demo,
  escapeRe,
  runReport,
  shownAs,
  solveJson,
  tempDir,
  type SolveJson,
  REPORT_CASES,
  NUM,
} from './helpers.js';
import { readPdf, type ReadPdf } from './pdf-read.js';

/**
 * The PDF form read back with pdf.js: its figures equal `solve --json` for the same file, every
 * page carries the case id and "page N of M", the cautions are on page 1, the paper is A4 or
 * Letter, and the pictures are drawn as paths and text, never as images.
 * Cases: the two shipped demo cases (imperial slide, metric yaw) and two invented fixtures.
 */
const CASES = REPORT_CASES;

const A4 = [595.28, 841.89];
const LETTER = [612, 792];

let t: ReturnType<typeof tempDir>;
beforeAll(() => void (t = tempDir()));
afterAll(() => t.done());

let made = 0;
/** Writes the case's PDF with `skidcase report --format pdf --out` and reads it back. */
async function pdfOf(
  file: string,
  paper?: 'a4' | 'letter',
): Promise<{ pdf: ReadPdf; bytes: Buffer }> {
  const out = path.join(t.dir, `report-${++made}.pdf`);
  const r = await runReport(file, { format: 'pdf', out, ...(paper ? { paper } : {}) });
  expect(r.code, r.err).toBe(0);
  expect(r.out).toBe(`wrote ${out}\n`);
  const bytes = readFileSync(out);
  return { pdf: await readPdf(bytes), bytes };
}

describe.each(CASES)('PDF report: %s', (_name, file) => {
  let pdf: ReadPdf;
  let bytes: Buffer;
  let json: SolveJson;
  let all: string;
  beforeAll(async () => {
    ({ pdf, bytes } = await pdfOf(file));
    json = await solveJson(file);
    all = pdf.pages.join(' ');
  });

  it('is a PDF of more than one page, each with the case id and "page N of M"', () => {
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdf.pages.length).toBeGreaterThan(1);
    pdf.pages.forEach((text, i) => {
      expect(text, `page ${i + 1}`).toContain(`Case ${json.id}`);
      expect(text, `page ${i + 1}`).toContain(`page ${i + 1} of ${pdf.pages.length}`);
    });
  });

  it('has every caution on page 1, before the case details', () => {
    const first = pdf.pages[0]!;
    for (const c of CAUTIONS) expect(first).toContain(c);
    expect(first.indexOf('Cautions')).toBeLessThan(first.indexOf('Case details'));
  });

  it('states the "at least" figure, computed speed and range of every analysis as solve --json', () => {
    const u = escapeRe(json.units.speed);
    const re = new RegExp(
      `At least ${NUM} ${u} at the start of the marks \\(computed ${NUM} ${u}, range ${NUM} to ${NUM} ${u}\\)`,
      'g',
    );
    const found = [...all.matchAll(re)];
    expect(found).toHaveLength(json.analyses.length);
    found.forEach((m, i) => {
      const a = json.analyses[i]!;
      expect(Number(m[1])).toBe(a.minimum);
      expect([m[2], m[3], m[4]]).toEqual([
        shownAs(a.speed.value, 1),
        shownAs(a.speed.low, 1),
        shownAs(a.speed.high, 1),
      ]);
    });
  });

  it('has the results table row of every analysis as solve --json', () => {
    const u = escapeRe(json.units.speed);
    json.analyses.forEach((a, i) => {
      const row = new RegExp(
        `${i + 1}\\. ${escapeRe(a.id)} ${a.kind} at least ${NUM} ${u} ${NUM} ${u} ${NUM} to ${NUM} ${u}`,
      ).exec(all);
      expect(row, `results row for ${a.id}`).not.toBeNull();
      expect(Number(row![1])).toBe(a.minimum);
      expect([row![2], row![3], row![4]]).toEqual([
        shownAs(a.speed.value, 1),
        shownAs(a.speed.low, 1),
        shownAs(a.speed.high, 1),
      ]);
    });
  });

  it('shows every step result of the chain, in order, as solve --json', () => {
    const chains = [
      ...all.matchAll(/The chain, step by step(.*?)Where the drag factor comes from/g),
    ];
    expect(chains).toHaveLength(json.analyses.length);
    const re = new RegExp(`Result ${NUM}(?:%| [a-z/]+)?(?: \\(${NUM} to ${NUM}\\))?`, 'g');
    const shown = chains.flatMap((c) => [...c[1]!.matchAll(re)]);
    const steps = json.analyses.flatMap((a) => a.steps);
    expect(shown).toHaveLength(steps.length);
    shown.forEach((m, k) => {
      const st = steps[k]!;
      const dp = decimalsOf(m[1]!);
      expect(m[1], `step ${k + 1} ${st.name}`).toBe(shownAs(st.result, dp));
      expect([m[2] ?? m[1], m[3] ?? m[1]]).toEqual([shownAs(st.low, dp), shownAs(st.high, dp)]);
    });
  });

  it('records the case file SHA-256 in its text and in its Subject', () => {
    const sha = sha256Of(readFileSync(file));
    expect(provenanceOf(all)?.sha256).toBe(sha);
    expect(provenanceOf(pdf.subject ?? '')).toEqual(provenanceOf(all));
  });

  it('draws each picture as paths and text on its page, with no image anywhere', async () => {
    const doc = parseReportJson((await runReport(file, { format: 'json' })).out);
    expect(doc).toBeDefined();
    const figures = figuresOf(doc!).filter((f) => f.svg);
    expect(figures.length).toBeGreaterThan(0);
    for (const f of figures) {
      const at = pdf.pages.findIndex((p) => p.includes(`Figure: ${f.caption}`));
      expect(at, f.name).toBeGreaterThanOrEqual(0);
      // Each shape of the SVG is a path on the page: a polyline of P points a path of at least
      // P - 1 straight segments, a circle a curved one.
      const paths = pdf.paths[at]!;
      const shapes = f.svg.match(/<(rect|line|polyline|circle)\b/g) ?? [];
      expect(paths.length).toBeGreaterThanOrEqual(shapes.length);
      for (const m of f.svg.matchAll(/<polyline points="([^"]*)"/g)) {
        const points = m[1]!.trim().split(/\s+/).length;
        expect(Math.max(...paths.map((p) => p.lines))).toBeGreaterThanOrEqual(points - 1);
      }
      const circles = (f.svg.match(/<circle\b/g) ?? []).length;
      expect(paths.filter((p) => p.curves > 0).length).toBeGreaterThanOrEqual(circles);
      // The picture's labels are text in the PDF, not pixels.
      const labels = [...f.svg.matchAll(/<text[^>]*>([^<]+)<\/text>/g)].map((m) =>
        m[1]!.replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>'),
      );
      expect(labels.length).toBeGreaterThan(0);
      for (const l of labels) expect(pdf.pages[at], `${f.name}: ${l}`).toContain(l);
    }
    const images = ['paintImageXObject', 'paintInlineImageXObject', 'paintImageMaskXObject'];
    for (const ops of pdf.ops) for (const op of images) expect(ops).not.toContain(op);
    expect(bytes.toString('latin1')).not.toMatch(/\/Subtype\s*\/Image/);
  });
});

describe('PDF paper', () => {
  const sizeOf = (pdf: ReadPdf) => {
    const distinct = [...new Set(pdf.sizes.map((s) => s.join('x')))];
    expect(distinct).toHaveLength(1);
    return pdf.sizes[0]!;
  };

  it('is US Letter (612 x 792 pt) for an imperial case and A4 (595.28 x 841.89 pt) for a metric one', async () => {
    const imperial = sizeOf((await pdfOf(demo('demo-orchard-hill.json'))).pdf);
    const metric = sizeOf((await pdfOf(demo('demo-kestrel-bend.json'))).pdf);
    imperial.forEach((v, i) => expect(v).toBeCloseTo(LETTER[i]!, 2));
    metric.forEach((v, i) => expect(v).toBeCloseTo(A4[i]!, 2));
  });

  it('follows --paper whatever the units', async () => {
    const a4 = sizeOf((await pdfOf(demo('demo-orchard-hill.json'), 'a4')).pdf);
    const letter = sizeOf((await pdfOf(demo('demo-kestrel-bend.json'), 'letter')).pdf);
    a4.forEach((v, i) => expect(v).toBeCloseTo(A4[i]!, 2));
    letter.forEach((v, i) => expect(v).toBeCloseTo(LETTER[i]!, 2));
  });
});

describe('PDF refusals', () => {
  it('is never printed to standard output: exit 1, asking for --out, nothing printed', async () => {
    const r = await runReport(demo('demo-orchard-hill.json'), { format: 'pdf' });
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    expect(r.err).toContain('name its file with --out');
  });

  it('refuses a paper size it does not know, naming the choices', async () => {
    const out = path.join(t.dir, 'never.pdf');
    const r = await runReport(demo('demo-orchard-hill.json'), {
      format: 'pdf',
      out,
      paper: 'a5' as never,
    });
    expect(r.code).toBe(1);
    expect(r.err).toContain('--paper must be one of a4, letter');
  });

  it('goes through the same atomic write: an existing file is kept without --force, replaced with it', async () => {
    const out = path.join(t.dir, 'kept.pdf');
    writeFileSync(out, 'an earlier file\n');
    const r = await runReport(demo('demo-kestrel-bend.json'), { format: 'pdf', out });
    expect(r.code).toBe(1);
    expect(r.err).toContain(`${out} already exists; not replaced`);
    expect(readFileSync(out, 'utf8')).toBe('an earlier file\n');
    const f = await runReport(demo('demo-kestrel-bend.json'), { format: 'pdf', out, force: true });
    expect(f.code, f.err).toBe(0);
    expect(readFileSync(out).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // No picture files beside a PDF (it draws them itself) and no temporary file left.
    expect(readdirSync(t.dir).filter((n) => n.startsWith('kept') || n.startsWith('.'))).toEqual([
      'kept.pdf',
    ]);
  });

  it('takes --paper on the command line of the built program, and names the choices for a wrong one', () => {
    const bin = path.join(ROOT, 'dist', 'skidcase.js');
    const run = (...args: string[]) =>
      spawnSync(process.execPath, [bin, 'report', demo('demo-orchard-hill.json'), ...args], {
        cwd: t.dir,
        encoding: 'utf8',
        env: { ...process.env, SKIDCASE_CONFIG_DIR: path.join(t.dir, 'conf') },
      });
    const out = path.join(t.dir, 'cli-a4.pdf');
    const ok = run('--format', 'pdf', '--paper', 'a4', '--out', out);
    expect(ok.status, ok.stderr).toBe(0);
    expect(readFileSync(out, 'latin1')).toMatch(/\/MediaBox \[0 0 595\.28 841\.89\]/);
    const bad = run('--format', 'pdf', '--paper', 'a5', '--out', path.join(t.dir, 'no.pdf'));
    expect(bad.status).not.toBe(0);
    expect(bad.stderr).toMatch(/a5.*a4, letter/s);
    const help = run('--help').stdout.replace(/\s+/g, ' ');
    expect(help).toContain(
      '--paper <size> page size of a PDF (default: letter for an imperial case, a4 for a metric one)',
    );
    expect(help).toContain('"pdf"');
  });
});
