import { execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, screenshot, SCREENSHOTS, signIn } from './support/browser';
import { download, typeIntoCell } from './support/calc-page';

/** An invented four-storey table as a designer keeps it, with one mistyped mass (row 3). */
async function workbook(): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  const sheet = book.addWorksheet('Storeys');
  [
    ['Label', 'Height (m)', 'Mass (t)', 'Stiffness (kN/m)'],
    ['Ground', 4.5, 510, 720000],
    ['Level 2', 3.6, '48O', 650000],
    ['Level 3', 3.6, 470, 580000],
    ['Roof', 3.6, 360, 430000],
  ].forEach((row) => sheet.addRow(row));
  return Buffer.from(await book.xlsx.writeBuffer());
}

/** Writes a calc package beside the screenshots and renders its first page with pdftoppm. */
function renderFirstPage(bytes: Buffer, name: string): string {
  mkdirSync(SCREENSHOTS, { recursive: true });
  const file = join(SCREENSHOTS, `${name}.pdf`);
  writeFileSync(file, bytes);
  execFileSync('pdftoppm', [
    '-png',
    '-r',
    '80',
    '-f',
    '1',
    '-l',
    '1',
    '-singlefile',
    file,
    join(SCREENSHOTS, `${name}-page-1`),
  ]);
  return join(SCREENSHOTS, `${name}-page-1.png`);
}

async function uploadWorkbook(page: Page) {
  await page.getByRole('button', { name: 'Upload a CSV or XLSX file' }).click();
  const dialog = page.getByRole('dialog', { name: 'Upload a storey table' });
  await dialog.getByLabel('Storey table file').setInputFiles({
    name: 'tower.xlsx',
    mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
    buffer: await workbook(),
  });
  await dialog
    .getByRole('alert', { name: 'Problems in the file' })
    .getByText('Row 3, Mass (t): "48O" is not a number')
    .waitFor();
  return dialog;
}

async function fixLevel2(page: Page) {
  const grid = page.getByRole('grid', { name: 'Storey table' });
  expect(await grid.getByRole('row').count()).toBe(5); // the header and four storeys
  await page
    .getByRole('alert', { name: 'Storey table problems' })
    .getByText('Storey 2: mass must be a positive number')
    .waitFor();
  await typeIntoCell(
    grid.getByRole('row').filter({ hasText: 'Level 2' }).locator('[data-field="mass"]'),
    '480',
  );
  await page.getByRole('alert', { name: 'Storey table problems' }).waitFor({ state: 'detached' });
}

describe('Uploading a storey table (designer)', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('uploads an XLSX table, sees the flagged cell, fixes it in the grid and analyses', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page.getByRole('navigation').getByRole('link', { name: 'Quick analysis' }).click();
    const dialog = await uploadWorkbook(page);
    await screenshot(page, 'imports-preview');
    await dialog.getByRole('button', { name: 'Replace the table' }).click();
    await dialog.waitFor({ state: 'detached' });
    await fixLevel2(page);
    await page.getByRole('table', { name: 'Modes' }).locator('tbody tr').nth(3).waitFor();
    await screenshot(page, 'imports-fixed-and-analysed');

    // A spectrum kept as a European CSV of period and Sa (invented values, semicolons and
    // decimal commas) replaces the points, read as it was written, and says so.
    await page.getByLabel('Spectrum file').setInputFiles({
      name: 'spectrum.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from('Period (s);Sa (g)\n0;0,3\n0,2;0,9\n0,8;0,9\n5;0,1\n'),
    });
    await expect
      .poll(() => page.getByRole('grid', { name: 'Spectrum points' }).getByRole('row').count())
      .toBe(5);
    expect(await page.getByTestId('spectrum-read-as').textContent()).toBe(
      'Read as: columns separated by semicolons, decimal comma (1.234,5).',
    );
    expect(
      await page
        .getByRole('grid', { name: 'Spectrum points' })
        .getByRole('row')
        .nth(2)
        .textContent(),
    ).toContain('0.2');
    await close();
  });

  it('on a saved calc: uploads the XLSX, fixes the flagged row, analyses and downloads the package', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page.getByRole('navigation').getByRole('link', { name: 'Projects' }).click();
    await page.getByRole('link', { name: 'Alder Court housing block' }).click();
    await page.getByRole('button', { name: 'New calculation' }).click();
    await page.getByLabel('Title').fill('Annex tower, uploaded storeys');
    await page.getByRole('button', { name: 'Create the draft' }).click();
    await page.getByRole('heading', { name: 'Annex tower, uploaded storeys' }).waitFor();
    const dialog = await uploadWorkbook(page);
    await dialog.getByRole('button', { name: 'Replace the table' }).click();
    await dialog.waitFor({ state: 'detached' });
    await fixLevel2(page);
    await page.getByRole('button', { name: 'Save and analyse' }).click();
    await page.getByRole('table', { name: 'Modes' }).locator('tbody tr').nth(3).waitFor();
    const pdf = await download(page, 'Calc package (PDF)');
    expect(pdf.name).toBe('Annex-tower-uploaded-storeys-rev1-calc-package.pdf');
    expect(pdf.bytes.subarray(0, 5).toString()).toBe('%PDF-');
    expect(existsSync(renderFirstPage(pdf.bytes, 'calc-package-draft'))).toBe(true);
    await close();
  });
});

describe('Downloads and a calc carried over as JSON (designer)', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('downloads the results and the whole calc, and imports the calc as a new draft', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page
      .getByRole('grid', { name: 'Recently locked' })
      .getByRole('link', { name: /north-south/ })
      .click();
    await page.getByText('The seal is valid').waitFor();

    const xlsx = await download(page, 'Results (XLSX)');
    expect(xlsx.name).toMatch(/-rev1-results\.xlsx$/);
    expect(xlsx.bytes.subarray(0, 2).toString()).toBe('PK');
    const pdf = await download(page, 'Calc package (PDF)');
    expect(pdf.name).toMatch(/-rev1-calc-package\.pdf$/);
    expect(pdf.bytes.subarray(0, 5).toString()).toBe('%PDF-');
    expect(existsSync(renderFirstPage(pdf.bytes, 'calc-package-locked'))).toBe(true);
    const json = await download(page, 'Whole calc (JSON)');
    const document = JSON.parse(json.bytes.toString('utf8')) as {
      calculation: { inputs: { storeys: unknown[] } };
    };
    expect(document.calculation.inputs.storeys).toHaveLength(7);

    await page.getByRole('link', { name: 'Alder Court housing block' }).click();
    await page.getByLabel('Calc file (JSON)').setInputFiles({
      name: json.name,
      mimeType: 'application/json',
      buffer: json.bytes,
    });
    await page.getByRole('note', { name: 'Preliminary' }).waitFor();
    await page.getByRole('heading', { level: 1, name: /north-south/ }).waitFor();
    const storeys = page.getByRole('grid', { name: 'Storey table' }).getByRole('row');
    await storeys.nth(7).waitFor();
    expect(await storeys.count()).toBe(8); // the header and seven storeys
    await screenshot(page, 'imports-json-draft');
    await close();
  });
});
