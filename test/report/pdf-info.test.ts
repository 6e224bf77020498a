import { describe, expect, it } from 'vitest';
import { renderPdf } from '../../src/report/render-pdf.js';
import { isPdf, pdfInfoString } from '../../src/report/pdf-info.js';
import { drawSvg } from '../../src/report/svg-pdf.js';
import { provenanceLine, section, type ReportDoc } from '../../src/report/doc.js';
import { readPdf } from './pdf-read.js';

/** A small PDF as text: the objects given, then a trailer naming `info` as its Info. */
function tinyPdf(objects: string[], info?: string): Buffer {
  const body = objects.map((o, i) => `${i + 1} 0 obj\n${o}\nendobj\n`).join('');
  const trailer = `trailer\n<< /Size ${objects.length + 1}${info ? ` /Info ${info}` : ''} >>\n%%EOF\n`;
  return Buffer.from(`%PDF-1.4\n${body}${trailer}`, 'latin1');
}

const doc: ReportDoc = {
  format: 'skidcase-report',
  version: 1,
  title: 'Speed from tire marks: (invented) A\\B',
  caseId: 'heron-gap-7',
  toolVersion: '0.1.0',
  generatedAt: '2026-12-03T06:00:00.000Z',
  source: { sha256: 'c'.repeat(64), saved: '2026-12-02T18:30:00Z' },
  sections: [section('about', 'About', [])],
};

describe('the document information a PDF carries (what verify reads)', () => {
  it('reads an entry written by reference, as PDFKit writes it, the same as pdf.js does', async () => {
    const bytes = await renderPdf(doc, 'a4');
    expect(isPdf(bytes)).toBe(true);
    const line = provenanceLine(doc.caseId, doc.source!, doc.toolVersion);
    expect(pdfInfoString(bytes, 'Subject')).toBe(line);
    expect((await readPdf(bytes)).subject).toBe(line);
    // Parentheses and a backslash in the title survive their escapes.
    expect(pdfInfoString(bytes, 'Title')).toBe(doc.title);
  });

  it('reads a literal string in the dictionary, with escapes, nested parentheses and octal', () => {
    const pdf = tinyPdf(
      ['<< /Subject (a \\(b\\) (c) d\\\\e\\051 f\\\nnext) /Title (x) >>'],
      '1 0 R',
    );
    expect(pdfInfoString(pdf, 'Subject')).toBe('a (b) (c) d\\e) fnext');
    expect(pdfInfoString(pdf, 'Title')).toBe('x');
  });

  it('reads a UTF-16 hex string, and takes the last trailer of an updated file', () => {
    const utf16 = Buffer.concat([
      Buffer.from([0xfe, 0xff]),
      Buffer.from('Ωmega', 'utf16le').swap16(),
    ]);
    const pdf = Buffer.concat([
      tinyPdf(['<< /Subject (old) >>', `<< /Subject <${utf16.toString('hex')}> >>`], '1 0 R'),
      Buffer.from('trailer\n<< /Info 2 0 R >>\n%%EOF\n', 'latin1'),
    ]);
    expect(pdfInfoString(pdf, 'Subject')).toBe('Ωmega');
  });

  it('has nothing to say when there is no Info, no such key, or no string', () => {
    expect(pdfInfoString(tinyPdf(['<< /Type /Catalog >>']), 'Subject')).toBeUndefined();
    expect(pdfInfoString(tinyPdf(['<< /Title (t) >>'], '1 0 R'), 'Subject')).toBeUndefined();
    expect(pdfInfoString(tinyPdf(['<< /Subjects (t) >>'], '1 0 R'), 'Subject')).toBeUndefined();
    expect(pdfInfoString(tinyPdf(['<< /Subject /Name >>'], '1 0 R'), 'Subject')).toBeUndefined();
    expect(isPdf(Buffer.from('# report\n'))).toBe(false);
  });
});

describe('pictures in the PDF', () => {
  it('refuses an SVG element it cannot draw, naming the picture, rather than leave it out', async () => {
    const { createRequire } = await import('node:module');
    const PDFDocument = createRequire(import.meta.url)('pdfkit') as typeof import('pdfkit');
    const pdf = new PDFDocument();
    const svg =
      '<svg width="10" height="10" viewBox="0 0 10 10"><ellipse cx="5" cy="5" rx="2" ry="1"/></svg>';
    expect(() => drawSvg(pdf, { name: 'speed', svg }, 0, 0, 100, 'Helvetica')).toThrow(
      'picture speed: <ellipse> cannot be drawn in the PDF',
    );
    const odd = '<svg width="10" height="10"><g><line x1="0" y1="0" x2="1" y2="1"/></g></svg>';
    expect(() => drawSvg(pdf, { name: 'yaw-arc', svg: odd }, 0, 0, 100, 'Helvetica')).toThrow(
      /<g> cannot be drawn/,
    );
  });
});

describe('pictures in the PDF, drawn to fit', () => {
  const figureDoc = (svg: string, textLines: string[]): ReportDoc => ({
    ...doc,
    sections: [
      section('pictures', 'Pictures', [
        { kind: 'figure', name: 'tall', caption: 'A tall picture', svg, textLines },
      ]),
    ],
  });

  it('draws a picture taller than a page on one page, scaled down, its label kept', async () => {
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="600" height="3000" viewBox="0 0 600 3000"><rect x="0" y="0" width="600" height="3000" fill="#fff"/><line x1="0" y1="0" x2="600" y2="3000" stroke="#000" stroke-width="1"/><text x="300" y="2990" font-size="40" text-anchor="middle">bottom label</text></svg>`;
    const pdf = await readPdf(await renderPdf(figureDoc(svg, []), 'letter'));
    const at = pdf.pages.findIndex((p) => p.includes('Figure: A tall picture'));
    expect(at).toBeGreaterThanOrEqual(0);
    expect(pdf.pages[at]).toContain('bottom label');
  });

  it('sets a picture that exists only as text lines in the monospaced face, box characters kept', async () => {
    const lines = ['40.0 ┤█████', '20.0 ┤██▌', '     └──┴──'];
    const pdf = await readPdf(await renderPdf(figureDoc('', lines), 'a4'));
    const all = pdf.pages.join(' ');
    for (const l of lines) expect(all).toContain(l.trim());
  });
});
