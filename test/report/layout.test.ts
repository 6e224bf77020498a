import { describe, expect, it } from 'vitest';
import { para, section, table, type ReportDoc } from '../../src/report/doc.js';
import { escapeHtml, renderHtml } from '../../src/report/render-html.js';
import { renderMarkdown } from '../../src/report/render-markdown.js';
import { renderText } from '../../src/report/render-text.js';
import { textTable } from '../../src/report/text-table.js';
import { hang, wrap } from '../../src/report/wrap.js';

const docWith = (...blocks: ReportDoc['sections'][number]['blocks']): ReportDoc => ({
  format: 'skidcase-report',
  version: 1,
  title: 'Layout test',
  caseId: 'layout',
  toolVersion: 't',
  generatedAt: 'now',
  sections: [section('s', 'Section', blocks)],
});

describe('wrap and hang', () => {
  it('breaks at spaces within the width and cuts a word longer than the line', () => {
    expect(wrap('at least 41 mph at the start', 12)).toEqual([
      'at least 41',
      'mph at the',
      'start',
    ]);
    expect(wrap('abcdefghij', 4)).toEqual(['abcd', 'efgh', 'ij']);
    expect(wrap('', 10)).toEqual(['']);
  });
  it('indents the lines after the first under the text, not under the prefix', () => {
    expect(hang('- ', 'one two three four', 10)).toEqual(['- one two', '  three', '  four']);
  });
});

describe('text tables', () => {
  it('fit the width by wrapping the widest column, numbers right-aligned', () => {
    const t = table(
      'T',
      ['Item', 'Value'],
      [
        ['a very long description of a measured thing on the road', '12.5'],
        ['short', '7'],
      ],
      ['left', 'right'],
    );
    const lines = textTable(t, 30);
    for (const l of lines) expect(l.length).toBeLessThanOrEqual(30);
    expect(lines[0]).toMatch(/^Item\s+Value$/);
    expect(lines.some((l) => l.endsWith('  12.5'))).toBe(true);
    expect(lines.find((l) => l.startsWith('short'))).toMatch(/ 7$/);
  });
});

describe('user text is shown as text, not markup', () => {
  const note = 'tape | <b>bold</b> *star* _under_ `tick` #1';
  const doc = docWith(para(note), table('Notes', ['Note'], [[note]]));

  it('markdown escapes only what it would read as markup, so a table keeps its columns', () => {
    const md = renderMarkdown(doc);
    // A paragraph: the tag, emphasis and code are escaped; the pipe and a mid-line # are text.
    expect(md).toContain('tape | \\<b>bold\\</b> \\*star\\* \\_under\\_ \\`tick\\` #1');
    // A cell: the pipe too, or it would end the cell.
    expect(md).toContain('| tape \\| \\<b>bold\\</b> \\*star\\* \\_under\\_ \\`tick\\` #1 |');
    // The table row stays one cell: only its two outer pipes are unescaped.
    const row = md.split('\n').find((l) => l.startsWith('| tape'))!;
    expect(row.replace(/\\\|/g, '').split('|')).toHaveLength(3);
  });

  it('html escapes it', () => {
    const html = renderHtml(doc);
    expect(html).toContain(escapeHtml(note));
    expect(html).not.toContain('<b>bold</b>');
    expect(escapeHtml('<a href="x">&\'')).toBe('&lt;a href=&quot;x&quot;&gt;&amp;&#39;');
  });

  it('plain text keeps it as typed', () => {
    expect(renderText(doc)).toContain(note);
  });

  it('markdown leaves a number sign and an underscore inside a word as typed', () => {
    const md = renderMarkdown(docWith(para('Tester #412 measured R_1'), para('# not a heading')));
    expect(md).toContain('Tester #412 measured R_1');
    expect(md).not.toContain('\\#412');
    expect(md).toContain('\\# not a heading');
  });
});
