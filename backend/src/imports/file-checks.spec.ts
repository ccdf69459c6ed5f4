import PDFDocument from 'pdfkit';
import { polyglotProblem } from './file-checks';

// A complete 1 x 1 PNG: signature, IHDR, IDAT, IEND (ISO/IEC 15948, 5.2 and 11.2).
const PNG = Buffer.from(
  '89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000b49444154789c6360000200000500017a5eab3f0000000049454e44ae426082',
  'hex',
);
// A JPEG's marker structure (ITU T.81, B.2): SOI, APP0 (JFIF), SOS with entropy-coded bytes
// holding a stuffed FF 00 and a restart marker, then EOI.
const JPEG = Buffer.from(
  'ffd8' +
    'ffe000104a46494600010100000100010000' +
    'ffda000801010000003f00' +
    '1234ff0056ffd07890' +
    'ffd9',
  'hex',
);
const PDF = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');
// The end-of-central-directory record of an empty ZIP (APPNOTE 4.3.16): what makes a file a ZIP too.
const ZIP_TAIL = Buffer.from('504b0506000000000000000000000000000000000000', 'hex');

function pdfkitFile(): Promise<Buffer> {
  return new Promise((resolve) => {
    const doc = new PDFDocument();
    const parts: Buffer[] = [];
    doc.on('data', (part: Buffer) => parts.push(part));
    doc.on('end', () => resolve(Buffer.concat(parts)));
    doc.text('Geotechnical letter');
    doc.end();
  });
}

describe('polyglotProblem: attachments that are two formats at once are refused', () => {
  it('passes complete PNG, JPEG and PDF files, and a PDF as a real writer makes it', async () => {
    expect(polyglotProblem('png', PNG)).toBeNull();
    expect(polyglotProblem('jpeg', JPEG)).toBeNull();
    expect(polyglotProblem('pdf', PDF)).toBeNull();
    expect(polyglotProblem('pdf', Buffer.concat([PDF, Buffer.from('\r\n\0\0')]))).toBeNull();
    expect(polyglotProblem('pdf', await pdfkitFile())).toBeNull();
  });

  it.each([
    ['png', PNG],
    ['jpeg', JPEG],
    ['pdf', PDF],
  ] as const)('refuses a %s with a ZIP archive after its end', (kind, bytes) => {
    expect(polyglotProblem(kind, Buffer.concat([bytes, ZIP_TAIL]))).toBe(
      `has other data after the end of the ${kind.toUpperCase()}`,
    );
  });

  it('refuses an image or PDF that a browser would sniff as a web page', () => {
    const png = Buffer.concat([
      PNG.subarray(0, 33),
      Buffer.from('<script>alert(1)</script>'),
      PNG.subarray(33),
    ]);
    expect(polyglotProblem('png', png)).toBe('carries web-page markup (<script…) near its start');
    const pdf = Buffer.from('%PDF-1.4\n%<html><body>hello</body></html>\n%%EOF\n');
    expect(polyglotProblem('pdf', pdf)).toBe('carries web-page markup (<html…) near its start');
  });

  it('refuses files cut short', () => {
    expect(polyglotProblem('png', PNG.subarray(0, 40))).toBe('is not a complete PNG file');
    expect(polyglotProblem('jpeg', JPEG.subarray(0, JPEG.length - 2))).toBe(
      'is not a complete JPEG file',
    );
    expect(polyglotProblem('pdf', Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\n'))).toBe(
      'is not a complete PDF file',
    );
  });
});
