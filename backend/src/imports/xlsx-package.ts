import { BadRequestException } from '@nestjs/common';
import JSZip from 'jszip';
import * as yauzl from 'yauzl';

export const XLSX_LIMITS = { entries: 500, uncompressedBytes: 25 * 1024 * 1024 };

const refuse = (why: string) => new BadRequestException([`file ${why}`]);
const TOO_BIG = 'would unpack to more than 25 MB: it is not a storey table';

/**
 * Unpacks an XLSX package with a hard limit on what it may become, and returns it packed again
 * from exactly what was unpacked, for the workbook library to read.
 *
 * The ZIP central directory states each part's size, but it can lie: a 1.9 MB file once
 * declared small parts and inflated to 1.9 GB inside the workbook library. So every part is
 * inflated here (yauzl, which also refuses a part longer than it declares), the bytes actually
 * produced are counted across all parts, and unpacking stops the moment the total passes the
 * limit. The workbook library then sees only these counted bytes, stored uncompressed, so it
 * cannot inflate anything more.
 */
export async function unpackXlsx(bytes: Buffer): Promise<Buffer> {
  const zip = await new Promise<yauzl.ZipFile>((resolve, reject) =>
    yauzl.fromBuffer(bytes, { lazyEntries: true, validateEntrySizes: true }, (error, file) =>
      error || !file ? reject(refuse('is not a readable XLSX workbook')) : resolve(file),
    ),
  );
  const parts = new Map<string, Buffer>();
  let total = 0;
  try {
    await new Promise<void>((resolve, reject) => {
      const fail = (error: BadRequestException) => {
        zip.close();
        reject(error);
      };
      zip.on('entry', (entry: yauzl.Entry) => {
        if (parts.size >= XLSX_LIMITS.entries) {
          return fail(
            refuse(`has more than ${XLSX_LIMITS.entries} parts: it is not a storey table`),
          );
        }
        // The declared sizes first: a cheap refusal of an honest bomb.
        if (total + entry.uncompressedSize > XLSX_LIMITS.uncompressedBytes)
          return fail(refuse(TOO_BIG));
        if (/\/$/.test(entry.fileName)) {
          zip.readEntry();
          return;
        }
        zip.openReadStream(entry, (error, stream) => {
          if (error || !stream) return fail(refuse('is not a readable XLSX workbook'));
          const chunks: Buffer[] = [];
          stream.on('data', (chunk: Buffer) => {
            total += chunk.length;
            if (total > XLSX_LIMITS.uncompressedBytes) {
              stream.destroy();
              fail(refuse(TOO_BIG));
              return;
            }
            chunks.push(chunk);
          });
          stream.on('error', (streamError: Error) =>
            fail(
              refuse(
                /too many bytes|expected \d+/i.test(streamError.message)
                  ? 'has a part larger than its directory says: it is not a storey table'
                  : 'is not a readable XLSX workbook',
              ),
            ),
          );
          stream.on('end', () => {
            parts.set(entry.fileName, Buffer.concat(chunks));
            zip.readEntry();
          });
        });
      });
      zip.on('end', () => resolve());
      zip.on('error', () => fail(refuse('is not a readable XLSX workbook')));
      zip.readEntry();
    });
  } finally {
    zip.close();
  }
  if (!parts.has('xl/workbook.xml') || !parts.has('[Content_Types].xml')) {
    throw refuse('is a ZIP archive but not an XLSX workbook');
  }
  const repacked = new JSZip();
  for (const [name, content] of parts) repacked.file(name, content);
  return repacked.generateAsync({ type: 'nodebuffer', compression: 'STORE' });
}
