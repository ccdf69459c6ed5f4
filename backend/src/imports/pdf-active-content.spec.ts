import { deflateSync } from 'node:zlib';
import { PDFDocument, PDFName, PDFString } from '@cantoo/pdf-lib';
import { pdfActiveContent } from './pdf-active-content';

/** A minimal PDF from numbered object bodies (object 1 the catalog), with a correct xref table. */
function rawPdf(bodies: string[]): Buffer {
  let text = '%PDF-1.7\n';
  const offsets: number[] = [];
  bodies.forEach((body, i) => {
    offsets.push(Buffer.byteLength(text, 'latin1'));
    text += `${i + 1} 0 obj\n${body}\nendobj\n`;
  });
  const xref = Buffer.byteLength(text, 'latin1');
  text += `xref\n0 ${bodies.length + 1}\n0000000000 65535 f \n`;
  for (const offset of offsets) text += `${String(offset).padStart(10, '0')} 00000 n \n`;
  text += `trailer\n<< /Size ${bodies.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return Buffer.from(text, 'latin1');
}

const PAGES = [
  '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
  '<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] >>',
];

async function letter(): Promise<PDFDocument> {
  const document = await PDFDocument.create();
  document.addPage([595, 842]).drawText('Geotechnical letter (invented)', { x: 50, y: 800 });
  return document;
}

describe('pdfActiveContent (ISO 32000-1, 12.6.4 and 7.11.4)', () => {
  it('passes a plain document, written with or without object streams', async () => {
    const document = await letter();
    expect(await pdfActiveContent(await document.save({ useObjectStreams: true }))).toBeNull();
    expect(await pdfActiveContent(await document.save({ useObjectStreams: false }))).toBeNull();
    expect(
      await pdfActiveContent(rawPdf(['<< /Type /Catalog /Pages 2 0 R >>', ...PAGES])),
    ).toBeNull();
  });

  it('finds JavaScript inside a compressed object stream, where no text search can see it', async () => {
    // Object 5, the open action, lives only inside object 4, a Flate-compressed object stream
    // (ISO 32000-1 7.5.7).
    const inner = '<< /Type /Action /S /JavaScript /JS (app.alert(1)) >>';
    const header = '5 0 ';
    const packed = deflateSync(Buffer.from(header + inner, 'latin1'));
    const objectStream =
      `<< /Type /ObjStm /N 1 /First ${header.length} /Filter /FlateDecode /Length ${packed.length} >>\nstream\n` +
      packed.toString('latin1') +
      '\nendstream';
    const bytes = rawPdf([
      '<< /Type /Catalog /Pages 2 0 R /OpenAction 5 0 R >>',
      ...PAGES,
      objectStream,
    ]);
    expect(bytes.toString('latin1')).not.toContain('/JavaScript');
    expect(await pdfActiveContent(bytes)).toBe(
      'contains JavaScript (/JavaScript), which is not kept with a calc; print it to a plain PDF first',
    );
  });

  it('reads names written with # escapes (7.3.5): /J#61vaScript is /JavaScript', async () => {
    const bytes = rawPdf([
      '<< /Type /Catalog /Pages 2 0 R /OpenAction 4 0 R >>',
      ...PAGES,
      '<< /Type /Action /S /J#61vaScript /J#53 (app.alert(1)) >>',
    ]);
    expect(await pdfActiveContent(bytes)).toMatch(/^contains JavaScript \(\/J/);
  });

  it.each([
    [
      'a web link',
      '<< /Type /Annot /Subtype /Link /Rect [0 0 1 1] /A << /S /URI /URI (https://example.test) >> >>',
      'URI',
    ],
    [
      'a form that sends data',
      '<< /Type /Action /S /SubmitForm /F (https://example.test) >>',
      'SubmitForm',
    ],
    ['a launch action', '<< /Type /Action /S /Launch /F (cmd.exe) >>', 'Launch'],
    [
      'an embedded file',
      '<< /Type /EmbeddedFile /Length 0 >>\nstream\n\nendstream',
      'EmbeddedFile',
    ],
  ])('refuses %s', async (what, body, name) => {
    const bytes = rawPdf(['<< /Type /Catalog /Pages 2 0 R >>', ...PAGES, body]);
    expect(await pdfActiveContent(bytes)).toBe(
      `contains ${what} (/${name}), which is not kept with a calc; print it to a plain PDF first`,
    );
  });

  it('finds an XFA form, which the library would otherwise drop on load', async () => {
    const bytes = rawPdf([
      '<< /Type /Catalog /Pages 2 0 R /AcroForm << /Fields [] /XFA 4 0 R >> >>',
      ...PAGES,
      '<< /Length 0 >>\nstream\n\nendstream',
    ]);
    expect(await pdfActiveContent(bytes)).toMatch(/^contains an XFA form \(\/XFA\)/);
  });

  it('refuses what it cannot parse, and nesting too deep to walk', async () => {
    expect(await pdfActiveContent(Buffer.from('%PDF-1.4\nnot really a pdf\n%%EOF\n'))).toBe(
      'cannot be read as a PDF, so its content cannot be checked',
    );
    const deep = `<< /Type /Catalog /Pages 2 0 R /Deep ${'['.repeat(100)}${']'.repeat(100)} >>`;
    expect(await pdfActiveContent(rawPdf([deep, ...PAGES]))).toBe(
      'nests its objects too deeply to be checked',
    );
  });

  it('does not mistake a name inside a string for a key', async () => {
    const document = await letter();
    document.setTitle('How /JavaScript and /URI are refused (a title, not a name)');
    document.catalog.set(PDFName.of('Lang'), PDFString.of('en'));
    expect(await pdfActiveContent(await document.save())).toBeNull();
  });
});
