import { Readable } from 'node:stream';
import JSZip from 'jszip';

/**
 * An XLSX-looking ZIP whose central directory lies: the sheet part says it unpacks to 1,000
 * bytes but inflates to `megabytes` MB of spaces. Made from a stream, so the test itself never
 * holds the inflated part in memory.
 */
export async function lyingZipBomb(megabytes: number): Promise<Buffer> {
  const zip = new JSZip();
  zip.file('[Content_Types].xml', '<Types/>');
  zip.file('xl/workbook.xml', '<workbook/>');
  const chunk = Buffer.alloc(1024 * 1024, 0x20);
  let left = megabytes;
  const sheet = new Readable({
    read() {
      this.push(left-- > 0 ? chunk : null);
    },
  });
  zip.file('xl/worksheets/sheet1.xml', sheet);
  const chunks: Buffer[] = [];
  await new Promise<void>((resolve, reject) =>
    zip
      .generateNodeStream({ type: 'nodebuffer', compression: 'DEFLATE', streamFiles: true })
      .on('data', (c: Buffer) => chunks.push(c))
      .on('end', resolve)
      .on('error', reject),
  );
  const packed = Buffer.concat(chunks);
  // Central directory headers (PK\1\2): the uncompressed size sits at offset 24, the name at 46.
  for (
    let at = packed.indexOf('PK\u0001\u0002');
    at >= 0;
    at = packed.indexOf('PK\u0001\u0002', at + 4)
  ) {
    const nameLength = packed.readUInt16LE(at + 28);
    const name = packed.toString('utf8', at + 46, at + 46 + nameLength);
    if (name === 'xl/worksheets/sheet1.xml') packed.writeUInt32LE(1000, at + 24);
  }
  return packed;
}
