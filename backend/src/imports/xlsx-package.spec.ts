import JSZip from 'jszip';
import { lyingZipBomb } from '../../test/support/zip-bomb';
import { unpackXlsx, XLSX_LIMITS } from './xlsx-package';

describe('unpackXlsx', () => {
  it('packs again exactly the parts it unpacked, uncompressed', async () => {
    const zip = new JSZip();
    zip.file('[Content_Types].xml', '<Types/>');
    zip.file('xl/workbook.xml', '<workbook/>');
    zip.file('xl/worksheets/sheet1.xml', 'x'.repeat(10_000));
    const original = await zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
    const repacked = await JSZip.loadAsync(await unpackXlsx(original));
    const parts = Object.values(repacked.files).filter((f) => !f.dir);
    expect(parts.map((f) => f.name).sort()).toEqual([
      '[Content_Types].xml',
      'xl/workbook.xml',
      'xl/worksheets/sheet1.xml',
    ]);
    expect(await repacked.file('xl/worksheets/sheet1.xml')?.async('string')).toBe(
      'x'.repeat(10_000),
    );
  });

  it('stops a part that inflates past what its directory says, long before the limit', async () => {
    const bomb = await lyingZipBomb(200);
    expect(bomb.length).toBeLessThan(2 * 1024 * 1024);
    const before = process.memoryUsage().arrayBuffers;
    await expect(unpackXlsx(bomb)).rejects.toThrow(
      expect.objectContaining({
        response: expect.objectContaining({
          message: ['file has a part larger than its directory says: it is not a storey table'],
        }),
      }),
    );
    // The 200 MB never existed in this process: far less than the limit was ever held.
    expect(process.memoryUsage().arrayBuffers - before).toBeLessThan(XLSX_LIMITS.uncompressedBytes);
  });

  it('refuses parts whose honest sizes add up past the limit, before inflating them', async () => {
    const zip = new JSZip();
    zip.file('[Content_Types].xml', '<Types/>');
    zip.file('xl/workbook.xml', '<workbook/>');
    for (let i = 0; i < 3; i += 1) zip.file(`xl/part${i}.xml`, Buffer.alloc(9 * 1024 * 1024, 0x20));
    const packed = await zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
    await expect(unpackXlsx(packed)).rejects.toThrow(
      expect.objectContaining({
        response: expect.objectContaining({
          message: ['file would unpack to more than 25 MB: it is not a storey table'],
        }),
      }),
    );
  });
});
