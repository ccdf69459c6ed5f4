export type FileKind = 'xlsx' | 'pdf' | 'png' | 'jpeg' | 'text' | 'unknown';

/**
 * What a file is, by its first bytes, never by its name. Four signatures, written here because
 * the maintained detector (file-type) is published as an ES module only, which this CommonJS
 * backend and its Jest suite cannot load; the signatures are the formats' own: ZIP local header
 * "PK\x03\x04" (APPNOTE 4.3.7; an XLSX is a ZIP package, ECMA-376 part 2), "%PDF-" (ISO 32000-1,
 * 7.5.2), the PNG signature (ISO/IEC 15948, 5.2) and JPEG's SOI marker FF D8 FF (ITU T.81, B.1).
 * Text is UTF-8 without NUL bytes.
 */
export function detectKind(bytes: Buffer): FileKind {
  const starts = (signature: number[]) => signature.every((b, i) => bytes[i] === b);
  if (starts([0x50, 0x4b, 0x03, 0x04])) return 'xlsx';
  if (starts([0x25, 0x50, 0x44, 0x46, 0x2d])) return 'pdf';
  if (starts([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return 'png';
  if (starts([0xff, 0xd8, 0xff])) return 'jpeg';
  if (bytes.includes(0)) return 'unknown';
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    return 'text';
  } catch {
    return 'unknown';
  }
}

/**
 * Why an attachment that starts like a PDF, PNG or JPEG is still refused, or null when it is
 * what it says. A polyglot is a file that is valid as two formats at once (an image that is also
 * a ZIP or an HTML page, a PDF with a script or another file tucked inside); browsers, mail
 * scanners and PDF readers may each take it for the other thing. So: no markup a browser would
 * sniff as HTML in the first kilobyte (WHATWG MIME Sniffing, 7.1), nothing after the format's own
 * end (PNG: the IEND chunk, ISO/IEC 15948 5.3 and 11.2.5; JPEG: the EOI marker, ITU T.81 B.2.1;
 * PDF: the last %%EOF, ISO 32000-1 7.5.5). A PDF's objects are then walked for active content
 * by pdfActiveContent (pdf-active-content.ts).
 */
export function polyglotProblem(kind: 'pdf' | 'png' | 'jpeg', bytes: Buffer): string | null {
  const head = bytes.subarray(0, 1024).toString('latin1').toLowerCase();
  const markup = ['<!doctype', '<html', '<head', '<body', '<script', '<iframe', '<svg', '<?php'];
  const found = markup.find((tag) => head.includes(tag));
  if (found) return `carries web-page markup (${found}…) near its start`;
  const end = kind === 'png' ? pngEnd(bytes) : kind === 'jpeg' ? jpegEnd(bytes) : pdfEnd(bytes);
  if (end === null) return `is not a complete ${kind.toUpperCase()} file`;
  if (bytes.subarray(end).some((b) => !TRAILING_PADDING.has(b))) {
    return `has other data after the end of the ${kind.toUpperCase()}`;
  }
  return null;
}

// Whitespace and NUL padding, which writers leave after a file's end.
const TRAILING_PADDING = new Set([0x00, 0x09, 0x0a, 0x0d, 0x20]);

/** The offset just past the IEND chunk, or null when the chunk chain is broken. */
function pngEnd(bytes: Buffer): number | null {
  let at = 8;
  while (at + 12 <= bytes.length) {
    const length = bytes.readUInt32BE(at);
    const type = bytes.toString('latin1', at + 4, at + 8);
    const next = at + 12 + length;
    if (next > bytes.length) return null;
    if (type === 'IEND') return next;
    at = next;
  }
  return null;
}

/** The offset just past the EOI marker, walking the marker segments; null when it is cut short. */
function jpegEnd(bytes: Buffer): number | null {
  let at = 2;
  while (at + 1 < bytes.length) {
    if (bytes[at] !== 0xff) return null;
    const marker = bytes[at + 1];
    if (marker === 0xd9) return at + 2;
    if (marker === 0xff) {
      at += 1; // fill byte
      continue;
    }
    if ((marker >= 0xd0 && marker <= 0xd7) || marker === 0x01) {
      at += 2; // markers without a length
      continue;
    }
    if (at + 4 > bytes.length) return null;
    at += 2 + bytes.readUInt16BE(at + 2);
    if (marker === 0xda) {
      // Entropy-coded data runs to the next marker that is neither a stuffed 00 nor a restart.
      while (at + 1 < bytes.length) {
        if (
          bytes[at] === 0xff &&
          bytes[at + 1] !== 0x00 &&
          !(bytes[at + 1] >= 0xd0 && bytes[at + 1] <= 0xd7)
        ) {
          break;
        }
        at += 1;
      }
    }
  }
  return null;
}

/** The offset just past the last %%EOF marker, or null when there is none. */
function pdfEnd(bytes: Buffer): number | null {
  const at = bytes.lastIndexOf('%%EOF', undefined, 'latin1');
  return at < 0 ? null : at + 5;
}
