import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';

/**
 * Roboto from @fontsource/roboto, the same bundled font as the screens: the Latin subset for
 * text and the Greek subset for the method's symbols (rho, phi, Gamma, omega), switched run by
 * run, since a PDF font draws only the glyphs it has.
 */
const fontFile = (subset: string, weight: number) =>
  createRequire(__filename).resolve(
    `@fontsource/roboto/files/roboto-${subset}-${weight}-normal.woff`,
  );

export type Doc = PDFKit.PDFDocument;

export const MARGIN = 50;

export function newDocument(title: string): Doc {
  const doc = new PDFDocument({
    size: 'A4',
    margin: MARGIN,
    bufferPages: true,
    info: { Title: title, Creator: 'Tiermode', Producer: 'Tiermode (pdfkit)' },
  });
  doc.registerFont('text', fontFile('latin', 400));
  doc.registerFont('bold', fontFile('latin', 700));
  doc.registerFont('greek', fontFile('greek', 400));
  doc.registerFont('greek-bold', fontFile('greek', 700));
  return doc.font('text').fontSize(10);
}

const GREEK = /([\u0370-\u03ff]+)/;

/** Writes text in Roboto, switching to the Greek subset for Greek letters. */
export function write(
  doc: Doc,
  text: string,
  options: PDFKit.Mixins.TextOptions & { bold?: boolean } = {},
): void {
  const { bold = false, ...rest } = options;
  const runs = text.split(GREEK).filter((run) => run !== '');
  runs.forEach((run, i) => {
    const greek = GREEK.test(run);
    doc.font(greek ? (bold ? 'greek-bold' : 'greek') : bold ? 'bold' : 'text');
    doc.text(run, { ...rest, continued: i < runs.length - 1 });
  });
  doc.font('text');
}

/** A section heading; starts a new page when too little of this one is left. */
export function heading(doc: Doc, text: string, size = 13): void {
  if (doc.y > doc.page.height - MARGIN - 120) doc.addPage();
  doc.moveDown(0.8).fontSize(size);
  write(doc, text, { bold: true });
  doc.fontSize(10).moveDown(0.3);
}

/** Collects the document into one Buffer. */
export function finish(doc: Doc): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}

/** Bold keys in a column, their values beside them. */
export function keyValues(doc: Doc, pairs: [string, string][]): void {
  for (const [key, value] of pairs) {
    const y = doc.y;
    doc.font('bold').text(key, MARGIN, y, { width: 125 });
    const afterKey = doc.y;
    doc.x = MARGIN + 130;
    doc.y = y;
    write(doc, value || '-', { width: 365 });
    doc.x = MARGIN;
    doc.y = Math.max(afterKey, doc.y) + 2;
  }
}
