import { BadRequestException } from '@nestjs/common';
import * as yauzl from 'yauzl';

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

export const XLSX_LIMITS = { entries: 500, uncompressedBytes: 25 * 1024 * 1024 };

/**
 * Reads an XLSX package's central directory, before anything is unpacked, and refuses it when
 * it has too many entries or would unpack to too much (a zip bomb), or is not a workbook.
 */
export async function inspectXlsx(bytes: Buffer): Promise<void> {
  const refuse = (why: string) => new BadRequestException([`file ${why}`]);
  const zip = await new Promise<yauzl.ZipFile>((resolve, reject) =>
    yauzl.fromBuffer(bytes, { lazyEntries: true, validateEntrySizes: true }, (error, file) =>
      error || !file ? reject(refuse('is not a readable XLSX workbook')) : resolve(file),
    ),
  );
  const names: string[] = [];
  let total = 0;
  await new Promise<void>((resolve, reject) => {
    zip.on('entry', (entry: yauzl.Entry) => {
      names.push(entry.fileName);
      total += entry.uncompressedSize;
      if (names.length > XLSX_LIMITS.entries) {
        zip.close();
        reject(refuse(`has more than ${XLSX_LIMITS.entries} parts: it is not a storey table`));
      } else if (total > XLSX_LIMITS.uncompressedBytes) {
        zip.close();
        reject(refuse('would unpack to more than 25 MB: it is not a storey table'));
      } else {
        zip.readEntry();
      }
    });
    zip.on('end', () => resolve());
    zip.on('error', () => reject(refuse('is not a readable XLSX workbook')));
    zip.readEntry();
  });
  if (!names.includes('xl/workbook.xml') || !names.includes('[Content_Types].xml')) {
    throw refuse('is a ZIP archive but not an XLSX workbook');
  }
}
