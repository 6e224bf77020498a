/**
 * The report as a PDF, drawn with PDFKit from the same document the other forms render: the
 * cautions on the first page, the case id and "page N of M" on every page, the pictures as vector
 * graphics (svg-pdf.ts), and the provenance sentence both in the text and in the file's Subject,
 * where `skidcase verify` reads it (PDF page text is compressed).
 */
import { createRequire } from 'node:module';
import type { Block, ReportDoc, Section, Table } from './doc.js';
import { provenanceLine } from './doc.js';
import { drawSvg, svgSize } from './svg-pdf.js';

/** Paper sizes the PDF is laid out for. */
export type Paper = 'a4' | 'letter';
/** Every paper size, in the order the help lists them. */
export const PAPERS: readonly Paper[] = ['a4', 'letter'];

/** The paper a case is printed on unless told: US Letter for a case in feet and mph, else A4. */
export function paperFor(c: { units: string }): Paper {
  return c.units === 'imperial' ? 'letter' : 'a4';
}

// 0.75 in at the sides, room for the running header and footer at the top and bottom: the same
// margins on A4 (595 × 842 pt) and Letter (612 × 792 pt) leave a text column of 487 and 504 pt.
const MARGINS = { top: 62, bottom: 62, left: 54, right: 54 };

// The project is ESM; this finds PDFKit and the fonts from here (or from the bundle's folder).
const require = createRequire(import.meta.url);

type Pdf = PDFKit.PDFDocument;

/**
 * The DejaVu faces' files (they hold the θ, Σ and − the formulas use, which PDF's base fonts
 * lack), found in node_modules when a PDF is made. PDFKit's tables open the current font again
 * by its source unless a font is known by that very source, so every face is set by its file's
 * path, never by an alias.
 */
const FACES = {
  body: () => require.resolve('dejavu-fonts-ttf/ttf/DejaVuSans.ttf'),
  bold: () => require.resolve('dejavu-fonts-ttf/ttf/DejaVuSans-Bold.ttf'),
  italic: () => require.resolve('dejavu-fonts-ttf/ttf/DejaVuSans-Oblique.ttf'),
  mono: () => require.resolve('dejavu-fonts-ttf/ttf/DejaVuSansMono.ttf'),
};
type Face = keyof typeof FACES;
const faceFile = (face: Face) => FACES[face]();

const font = (pdf: Pdf, face: Face) => pdf.font(faceFile(face));

/** Moves to a new page unless `h` points still fit on this one. */
function need(pdf: Pdf, h: number): void {
  if (pdf.y + h > pdf.page.maxY()) pdf.addPage();
}

const columnWidth = (pdf: Pdf) => pdf.page.width - MARGINS.left - MARGINS.right;

/** Text across the column, from the left margin, in one face and size. */
function textBlock(pdf: Pdf, s: string, face: Face, size: number, indent = 0): void {
  font(pdf, face).fontSize(size);
  pdf.text(s, MARGINS.left + indent, pdf.y, { width: columnWidth(pdf) - indent });
}

/** Column widths from the cells' natural widths, fitted to the text column. */
function tableWidths(pdf: Pdf, t: Table): number[] {
  const avail = columnWidth(pdf);
  const natural = t.columns.map((c, i) =>
    Math.min(
      avail * 0.5,
      8 + Math.max(pdf.widthOfString(c), ...t.rows.map((r) => pdf.widthOfString(r[i] ?? ''))),
    ),
  );
  const sum = natural.reduce((a, b) => a + b, 0);
  return natural.map((w) => (w / sum) * avail);
}

function drawTable(pdf: Pdf, t: Table): void {
  // The caption, the header and a first row stay together.
  need(pdf, 50);
  if (t.caption) textBlock(pdf, t.caption, 'italic', 9);
  font(pdf, 'body').fontSize(8.5);
  const widths = tableWidths(pdf, t);
  const align = (i: number) => ({ x: t.align[i] === 'right' ? 'right' : 'left' }) as const;
  pdf.table({
    position: { x: MARGINS.left, y: pdf.y },
    columnStyles: widths.map((width, i) => ({ width, align: align(i) })),
    defaultStyle: { border: 0.5, borderColor: '#888888', padding: 3 },
    data: [
      t.columns.map((text) => ({
        text,
        font: { src: faceFile('bold') },
        backgroundColor: '#eeeeee',
      })),
      ...t.rows.map((r) => t.columns.map((_, i) => r[i] ?? '')),
    ],
  });
}

/** A label in the left column and its text beside it, the pair kept on one page. */
function labelled(pdf: Pdf, label: string, text: string, face: Face): void {
  const gap = 62;
  const w = columnWidth(pdf) - gap;
  font(pdf, face).fontSize(8.5);
  need(pdf, pdf.heightOfString(text, { width: w }));
  const y = pdf.y;
  font(pdf, 'bold').text(label, MARGINS.left + 12, y, { width: gap - 14 });
  const below = pdf.y;
  font(pdf, face).text(text, MARGINS.left + gap, y, { width: w });
  pdf.y = Math.max(below, pdf.y);
}

function drawBlock(pdf: Pdf, b: Block): void {
  pdf.x = MARGINS.left;
  switch (b.kind) {
    case 'paragraph':
      textBlock(
        pdf,
        b.text,
        b.tone === 'strong' ? 'bold' : b.tone === 'note' ? 'italic' : 'body',
        10,
      );
      break;
    case 'list':
      font(pdf, 'body').fontSize(10);
      pdf.list(b.items, MARGINS.left + 4, pdf.y, {
        width: columnWidth(pdf) - 16,
        bulletRadius: 1.6,
        textIndent: 12,
      });
      break;
    case 'table':
      drawTable(pdf, b);
      break;
    case 'step':
      font(pdf, 'bold').fontSize(10);
      need(pdf, 60);
      textBlock(pdf, `${b.number}. ${b.name}`, 'bold', 10);
      labelled(pdf, 'Formula', b.formula, 'mono');
      labelled(pdf, 'Numbers', b.substituted, 'mono');
      labelled(pdf, 'Result', b.result, 'body');
      labelled(pdf, 'Why', b.why, 'body');
      break;
    case 'figure': {
      if (b.svg) {
        // Across the column, or smaller when that would be taller than a page can hold.
        const size = svgSize(b.svg);
        const room = pdf.page.maxY() - MARGINS.top - 30;
        const w = Math.min(columnWidth(pdf), (room * size.width) / size.height);
        const h = (size.height * w) / size.width;
        need(pdf, h + 30);
        const top = pdf.y;
        drawSvg(pdf, b, MARGINS.left, top, w, faceFile('body'));
        pdf.y = top + h + 4;
      } else {
        font(pdf, 'mono').fontSize(7);
        need(pdf, b.textLines.length * 9 + 30);
        textBlock(pdf, b.textLines.join('\n'), 'mono', 7);
      }
      textBlock(pdf, `Figure: ${b.caption}`, 'italic', 9);
      break;
    }
  }
  pdf.moveDown(0.6);
}

const HEADING_SIZE = [15, 12.5, 11, 10];

function drawSection(pdf: Pdf, s: Section, depth: number): void {
  const size = HEADING_SIZE[Math.min(depth, HEADING_SIZE.length - 1)]!;
  // An analysis starts a page of its own (as the printed HTML does); any heading keeps with
  // the start of what follows it.
  if (depth === 0 && s.id.startsWith('analysis') && pdf.y > MARGINS.top + 1) pdf.addPage();
  need(pdf, size * 2 + 60);
  pdf.moveDown(depth === 0 ? 0.8 : 0.4);
  textBlock(pdf, s.title, 'bold', size);
  if (depth === 0) {
    const y = pdf.y + 1;
    pdf
      .moveTo(MARGINS.left, y)
      .lineTo(MARGINS.left + columnWidth(pdf), y)
      .lineWidth(0.6)
      .stroke('#444444');
  }
  pdf.moveDown(0.5);
  for (const b of s.blocks) drawBlock(pdf, b);
  for (const sub of s.sections) drawSection(pdf, sub, depth + 1);
}

/** The running header (the title) and footer (the case id, page N of M) on every page. */
function drawFurniture(pdf: Pdf, doc: ReportDoc): void {
  const range = pdf.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    pdf.switchToPage(i);
    const bottom = pdf.page.margins.bottom;
    // Writing in the margin must not start a page of its own.
    pdf.page.margins.bottom = 0;
    const w = columnWidth(pdf);
    const opts = { width: w, lineBreak: false } as const;
    font(pdf, 'body').fontSize(8).fillColor('#444444');
    pdf.text(doc.title, MARGINS.left, 32, { ...opts, ellipsis: true });
    const footY = pdf.page.height - 40;
    pdf.text(`Case ${doc.caseId}`, MARGINS.left, footY, opts);
    pdf.text(`page ${i + 1 - range.start} of ${range.count}`, MARGINS.left, footY, {
      ...opts,
      align: 'right',
    });
    pdf.fillColor('#000000');
    pdf.page.margins.bottom = bottom;
  }
}

/**
 * The report as PDF bytes on A4 or US Letter. The cautions section is drawn first, under the
 * title, so that it is on page 1; every other section follows in the document's order.
 * @example await renderPdf(doc, "a4") // bytes starting with '%PDF-'
 */
export async function renderPdf(doc: ReportDoc, paper: Paper): Promise<Buffer> {
  // Loaded only for a PDF, from node_modules (the build leaves it out of the bundle), so that no
  // other command pays for PDFKit. A require, as the bundle may hold no import().
  const PDFDocument = require('pdfkit') as typeof import('pdfkit');
  const made = new Date(doc.generatedAt);
  const pdf = new PDFDocument({
    size: paper === 'a4' ? 'A4' : 'LETTER',
    margins: MARGINS,
    bufferPages: true,
    info: {
      Title: doc.title,
      Creator: `skidcase ${doc.toolVersion}`,
      ...(doc.source ? { Subject: provenanceLine(doc.caseId, doc.source, doc.toolVersion) } : {}),
      ...(Number.isNaN(made.getTime()) ? {} : { CreationDate: made }),
    },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<void>((resolve, reject) => {
    pdf.on('data', (c: Buffer) => chunks.push(c));
    pdf.on('end', resolve);
    pdf.on('error', reject);
  });

  textBlock(pdf, doc.title, 'bold', 18);
  pdf.moveDown(0.2);
  textBlock(
    pdf,
    `Case ${doc.caseId}. Generated ${doc.generatedAt} by skidcase ${doc.toolVersion}.`,
    'body',
    9,
  );
  const first = doc.sections.filter((s) => s.id === 'cautions');
  for (const s of [...first, ...doc.sections.filter((s) => !first.includes(s))])
    drawSection(pdf, s, 0);
  drawFurniture(pdf, doc);
  pdf.end();
  await done;
  return Buffer.concat(chunks);
}
