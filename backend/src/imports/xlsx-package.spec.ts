import JSZip from 'jszip';
import { lyingZipBomb } from '../../test/support/zip-bomb';
import { unpackXlsx } from './xlsx-package';

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
    // 40 MB, past the 25 MB limit too; the part is stopped at the 1,000 bytes it declares.
    const bomb = await lyingZipBomb(40);
    expect(bomb.length).toBeLessThan(2 * 1024 * 1024);
    await expect(unpackXlsx(bomb)).rejects.toThrow(
      expect.objectContaining({
        response: expect.objectContaining({
          message: ['file has a part larger than its directory says: it is not a storey table'],
        }),
      }),
    );
  }, 30_000); // making the bomb deflates 40 MB: a few seconds on a busy machine

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
  }, 30_000); // deflating 27 MB: a few seconds on a busy machine
});
