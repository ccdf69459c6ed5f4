import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, screenshot, signIn } from './support/browser';
import { typeIntoCell } from './support/calc-page';

// An invented five-storey building, storey 1 first: label, height (m), mass (t), stiffness (kN/m).
const PASTED = [
  'Label\tHeight\tMass\tStiffness',
  'L1\t4.0\t350\t520000',
  'L2\t3.5\t340\t480000',
  'L3\t3.5\t340\t450000',
  'L4\t3.5\t330\t400000',
  'Roof\t3.5\t260\t320000',
].join('\n');

const firstPeriod = async (page: Page) =>
  page
    .getByRole('table', { name: 'Modes' })
    .locator('tbody tr')
    .first()
    .locator('td')
    .nth(1)
    .textContent();

async function waitForResults(page: Page) {
  await page
    .getByRole('progressbar', { name: 'Updating the results' })
    .waitFor({ state: 'detached' });
}

const storeyRow = (page: Page, text: string) =>
  page.getByRole('grid', { name: 'Storey table' }).getByRole('row').filter({ hasText: text });

const editCell = (page: Page, rowText: string, field: string, value: string) =>
  typeIntoCell(storeyRow(page, rowText).locator(`[data-field="${field}"]`), value);

describe('The analysis page (designer)', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('pastes and types a five-storey building, generates a spectrum, and switches units', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Quick analysis' })
      .click();
    await page.getByRole('table', { name: 'Modes' }).waitFor();
    await waitForResults(page);

    // Paste a block copied from a spreadsheet, replacing the starting building.
    await page.getByRole('button', { name: 'Paste from a spreadsheet' }).click();
    const dialog = page.getByRole('dialog', { name: 'Paste storeys from a spreadsheet' });
    await dialog.getByLabel('Pasted cells').fill(PASTED);
    expect(await dialog.getByRole('status').textContent()).toContain('5 storey(s) read.');
    await dialog.getByRole('button', { name: 'Replace the table' }).click();
    await storeyRow(page, 'Roof').waitFor();
    await waitForResults(page);
    const pastedPeriod = await firstPeriod(page);
    expect(await page.getByRole('table', { name: 'Modes' }).locator('tbody tr').count()).toBe(5);
    await screenshot(page, 'analysis-pasted');

    // Add a storey on top by typing its label, then take it away again.
    await page.getByRole('button', { name: 'Add a storey on top' }).click();
    const sixth = page.getByRole('grid', { name: 'Storey table' }).locator('[data-rowindex="5"]');
    await sixth.waitFor();
    await typeIntoCell(sixth.locator('[data-field="label"]'), 'Plant room');
    await storeyRow(page, 'Plant room').waitFor();
    await waitForResults(page);
    expect(await page.getByRole('table', { name: 'Modes' }).locator('tbody tr').count()).toBe(6);
    await storeyRow(page, 'Plant room').getByRole('button', { name: 'Delete storey 6' }).click();
    await storeyRow(page, 'Plant room').waitFor({ state: 'detached' });
    await waitForResults(page);
    expect(await page.getByRole('table', { name: 'Modes' }).locator('tbody tr').count()).toBe(5);
    expect(await firstPeriod(page)).toBe(pastedPeriod);

    // Type a bad value: the cell is flagged by storey, nothing else is lost, then fix it by typing.
    await editCell(page, 'L3', 'mass', '-340');
    const problems = page.getByRole('alert', { name: 'Storey table problems' });
    await problems.waitFor();
    expect(await problems.textContent()).toBe('Storey 3: mass must be a positive number');
    expect(await firstPeriod(page)).toBe(pastedPeriod);
    await screenshot(page, 'analysis-flagged-cell');
    await editCell(page, 'L3', 'mass', '500');
    await problems.waitFor({ state: 'detached' });
    await expect.poll(() => firstPeriod(page), { timeout: 10_000 }).not.toBe(pastedPeriod);
    await waitForResults(page);

    // A units slip: storey 2's stiffness typed 1e8 times too small. The results are flagged in
    // red, naming storey 2, and the flag goes once the value is put right.
    await editCell(page, 'L2', 'stiffness', '0.0048');
    const implausible = page.getByRole('alert', { name: 'Implausible results' });
    await implausible.waitFor();
    expect(await implausible.textContent()).toMatch(/Storey 2 is the most flexible/);
    expect(await implausible.textContent()).toMatch(/Storey 2 drifts \d+% of its height/);
    // The storey table marks the row of the storey to look at.
    await page
      .getByRole('grid', { name: 'Storey table' })
      .getByRole('img', { name: /^Storey 2: / })
      .first()
      .waitFor();
    await screenshot(page, 'analysis-implausible');
    await editCell(page, 'L2', 'stiffness', '480000');
    await implausible.waitFor({ state: 'detached' });
    await waitForResults(page);

    // Storey 1's stiffness from four 400 mm square columns fixed at both ends, E = 30 GPa, h = 4 m:
    // I = 0.4^4 / 12 = 213,333 cm^4; k = 4 x 12 x 30e9 x 2.13333e-3 / 4^3 = 48,000 kN/m (by hand).
    await storeyRow(page, 'L1')
      .getByRole('button', { name: 'Stiffness of storey 1 from its columns' })
      .click();
    const columns = page.getByRole('dialog', { name: 'Stiffness of storey 1 from its columns' });
    await columns.getByLabel('I (cm⁴)').fill('213333.3333');
    await columns.getByRole('button', { name: 'Compute' }).click();
    await columns.getByRole('status').waitFor();
    expect(await columns.getByRole('status').textContent()).toContain('k = 48,000 kN/m');
    await screenshot(page, 'analysis-column-stiffness');
    await columns.getByRole('button', { name: 'Use this stiffness' }).click();
    await columns.waitFor({ state: 'detached' });
    expect(await storeyRow(page, 'L1').locator('[data-field="stiffness"]').textContent()).toBe(
      '48,000',
    );
    await waitForResults(page);

    // Generate the ASCE 7 two-period spectrum: SDS = 1.0 g, SD1 = 0.6 g, TL = 8 s.
    const generator = page.getByRole('form', { name: 'Spectrum generator' });
    await generator.getByRole('button', { name: 'Generate the table' }).click();
    const points = page.getByRole('grid', { name: 'Spectrum points' });
    await points.getByRole('row').filter({ hasText: '0.12' }).first().waitFor();
    await waitForResults(page);
    const sa = await page
      .getByRole('table', { name: 'Modes' })
      .locator('tbody tr')
      .first()
      .locator('td')
      .nth(6)
      .textContent();
    expect(Number(sa)).toBeGreaterThan(0);
    await screenshot(page, 'analysis-generated-spectrum');

    // US customary units and back: the same storey, shown in ft, kip of weight and kip/in.
    await page.getByRole('button', { name: 'US (kip, ft, in)' }).click();
    await page.getByRole('columnheader', { name: 'Seismic weight (kip)' }).waitFor();
    const roofUs = storeyRow(page, 'Roof');
    // 3.5 m = 11.48 ft; 260 t x g = 573.2 kip; 320,000 kN/m = 1,827 kip/in
    expect(await roofUs.locator('[data-field="height"]').textContent()).toMatch(/^11\.48/);
    expect(await roofUs.locator('[data-field="mass"]').textContent()).toMatch(/^573\.2/);
    expect(await roofUs.locator('[data-field="stiffness"]').textContent()).toMatch(/^1,827/);
    await screenshot(page, 'analysis-us-units');
    await page.getByRole('button', { name: 'SI (t, kN, m)' }).click();
    await page.getByRole('columnheader', { name: 'Mass (t)' }).waitFor();
    const roofSi = storeyRow(page, 'Roof');
    expect(await roofSi.locator('[data-field="mass"]').textContent()).toBe('260');
    expect(await roofSi.locator('[data-field="stiffness"]').textContent()).toBe('320,000');
    await close();
  });

  it('reads pasted numbers as the person wrote them, says how, and pastes into the grid', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Quick analysis' })
      .click();
    await page.getByRole('table', { name: 'Modes' }).waitFor();
    await waitForResults(page);

    // A European block: semicolons and decimal commas, thousands grouped with points.
    await page.getByRole('button', { name: 'Paste from a spreadsheet' }).click();
    const dialog = page.getByRole('dialog', { name: 'Paste storeys from a spreadsheet' });
    await dialog
      .getByLabel('Pasted cells')
      .fill('Niveau 1;4,5;640;780.000,5\nNiveau 2;3,5;620;700000\nToit;3,5;400;500000');
    expect(await dialog.getByTestId('read-as').textContent()).toBe(
      'Read as: columns separated by semicolons, decimal comma (1.234,5).',
    );
    expect(await dialog.getByRole('status').textContent()).toContain('3 storey(s) read.');
    await screenshot(page, 'paste-read-as');
    // A comma-separated row split by a thousands separator is refused, naming the row.
    await dialog.getByLabel('Pasted cells').fill('L1,4.5,640,780000\nL2,3.5,1,020,700000');
    expect(await dialog.getByRole('status').textContent()).toContain(
      'Row 2: 5 cells where the first row has 4',
    );
    // A cell nothing settles is refused until the person says how to read it.
    await dialog.getByLabel('Pasted cells').fill('L1\t4\t640\t780,000');
    expect(await dialog.getByRole('status').textContent()).toContain(
      'Row 1, stiffness: "780,000" reads as 780000 with a decimal point or 780 with a decimal comma',
    );
    await dialog.getByLabel('Numbers').click();
    await page.getByRole('option', { name: 'decimal point (1,234.5)' }).click();
    expect(await dialog.getByRole('status').textContent()).toContain('1 storey(s) read.');
    await screenshot(page, 'paste-ambiguous-chosen');
    await dialog.getByRole('button', { name: 'Cancel' }).click();

    // Ctrl+V on a selected cell: two storeys' mass and stiffness from storey 2's mass cell. The
    // thousands separators are the grid's own (it shows 780,000), so they read as the grid does.
    const grid = page.getByRole('grid', { name: 'Storey table' });
    const massCell = grid.locator('[data-rowindex="1"] [data-field="mass"]');
    await massCell.click();
    await page.evaluate(() => {
      const data = new DataTransfer();
      data.setData('text/plain', '410\t555,000\n390\t444,000');
      document.activeElement?.dispatchEvent(
        new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }),
      );
    });
    await page
      .getByText(
        'Pasted from storey 2, mass, read as decimal point (1,234.5), as the grid shows numbers.',
      )
      .waitFor();
    expect(await massCell.textContent()).toBe('410');
    expect(await grid.locator('[data-rowindex="2"] [data-field="stiffness"]').textContent()).toBe(
      '444,000',
    );
    await waitForResults(page);
    await screenshot(page, 'grid-paste');
    await close();
  });

  it('shows the reference cases on the Verification page, all passing', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'student');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Verification' })
      .click();
    await page
      .getByRole('heading', { name: 'Two-storey frame, m1 = 2m, m2 = m, k1 = 2k, k2 = k' })
      .waitFor();
    expect(await page.getByText('Fail', { exact: true }).count()).toBe(0);
    expect(await page.getByText('Pass', { exact: true }).count()).toBeGreaterThanOrEqual(25);
    await screenshot(page, 'verification');
    await close();
  });
});
