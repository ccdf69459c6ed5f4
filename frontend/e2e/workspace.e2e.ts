import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, screenshot, SCREENSHOTS, signIn } from './support/browser';
import { analyse, download, editStorey, nav, typeIntoCell } from './support/calc-page';

// An invented calc in the demo's invented laboratory project; every number is made up.
const PROJECT = 'Quarry Lane laboratory';
const CALC = 'Plant deck lateral study';

const tabParam = (page: Page) => new URL(page.url()).searchParams.get('tab');
const status = (page: Page) => page.getByRole('status').first().textContent();

const editSpectrumPeriod = (page: Page, point: number, value: string) =>
  typeIntoCell(
    page
      .getByRole('grid', { name: 'Spectrum points' })
      .locator(`[data-rowindex="${point - 1}"] [data-field="period"]`),
    value,
  );

describe("The designer's workspace", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('keeps the spectrum source, the tab and the edits; numbers for every response; the basis from the spectrum', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page.getByRole('heading', { name: /^Welcome/ }).waitFor();
    await nav(page, 'Projects');
    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('button', { name: 'New calculation' }).click();
    await page.getByLabel('Title').fill(CALC);
    await page.getByRole('button', { name: 'Create the draft' }).click();
    await page.getByRole('heading', { name: CALC }).waitFor();

    // The storey table keeps storey order: a header click does not sort it. Its row icons say
    // what they do on hover.
    const grid = page.getByRole('grid', { name: 'Storey table' });
    expect(
      await grid
        .getByRole('menuitem', { name: 'Delete storey 2' })
        .or(grid.getByRole('button', { name: 'Delete storey 2' }))
        .getAttribute('title'),
    ).toBe('Delete storey 2');
    await grid.getByRole('columnheader', { name: /Height/ }).click();
    await grid.getByRole('columnheader', { name: /Stiffness/ }).click();
    const numbers = await grid.locator('[data-field="number"]').allTextContents();
    expect(numbers.filter((n) => /^\d+$/.test(n))).toEqual(['1', '2', '3', '4', '5']);
    // Values show six significant figures at most (723,012 kN/m, not 723,012.267).
    const stiffnesses = await grid
      .locator('[data-field="stiffness"][role="gridcell"]')
      .allTextContents();
    expect(stiffnesses).toHaveLength(5);
    for (const text of stiffnesses) {
      expect(text.replace(/[^0-9]/g, '').replace(/^0+/, '').length).toBeLessThanOrEqual(6);
    }

    // A generated spectrum remembers its generator and parameters.
    await page.getByRole('tab', { name: 'Design spectrum' }).click();
    expect(tabParam(page)).toBe('spectrum');
    const generator = page.getByRole('form', { name: 'Spectrum generator' });
    await generator.getByLabel('SDS (g)').fill('0.9');
    await generator.getByLabel('SD1 (g)').fill('0.5');
    await generator.getByLabel('TL (s)').fill('6');
    await generator.getByLabel('S1 (g), for the checks').fill('0.45');
    await generator.getByRole('button', { name: 'Generate the table' }).click();
    await page
      .getByTestId('spectrum-source')
      .getByText('Source: ASCE 7 two-period (11.4.6): SDS 0.9 g, SD1 0.5 g, TL 6 s, S1 0.45 g.')
      .waitFor();
    await analyse(page);
    expect(tabParam(page)).toBe('results');

    // One date format: "2026-12-03 14:05 UTC".
    await page.getByText(/^Engine \d+\.\d+\.\d+, \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC\.$/).waitFor();
    // Every response as numbers: combined and any single mode, with units.
    const responses = page.getByRole('table', { name: 'Storey responses' });
    await responses.getByRole('columnheader', { name: 'Storey shear (kN)' }).waitFor();
    expect(await responses.getByRole('row').count()).toBe(1 + 5 + 1);
    await page.getByRole('combobox', { name: 'Values' }).click();
    await page.getByRole('option', { name: /^Mode 2 alone/ }).click();
    await responses.getByRole('columnheader', { name: 'Drift ratio' }).waitFor();
    await screenshot(page, 'workspace-storey-responses');

    // Reload: the tab is in the address, and the generator shows the spectrum's own values.
    await page.reload();
    await page.getByRole('table', { name: 'Storey responses' }).waitFor();
    await page.getByRole('tab', { name: 'Design spectrum' }).click();
    expect(await generator.getByLabel('SDS (g)').inputValue()).toBe('0.9');
    expect(await generator.getByLabel('S1 (g), for the checks').inputValue()).toBe('0.45');
    await page.goBack();
    await page.getByRole('table', { name: 'Storey responses' }).waitFor();
    expect(tabParam(page)).toBe('results');
    await page.goForward();
    await generator.waitFor();

    // The log period axis, and the modal periods on the curve as it stands.
    await page.getByLabel('Log period axis').check();
    await page
      .getByRole('img', { name: /Design spectrum: Sa against period \(log scale\)/ })
      .waitFor();
    await screenshot(page, 'workspace-spectrum-source-log');

    // An unsorted period is marked and said in the user's words; nothing can be saved meanwhile.
    await editSpectrumPeriod(page, 3, '0.01');
    const problems = page.getByRole('alert', { name: 'Spectrum problems' });
    await problems
      .getByText(/^Point 3: the period must be greater than [\d.]+ s above it$/)
      .waitFor();
    expect(await page.locator('.cell-invalid').count()).toBeGreaterThan(0);
    await expect
      .poll(() => status(page))
      .toBe('Unsaved changes; fix the marked inputs to save them');
    await screenshot(page, 'workspace-spectrum-unsorted');

    // Reloading or closing the tab asks too: the page cancels the browser's beforeunload.
    const asksBeforeUnload = () =>
      page.evaluate(() => {
        const event = new Event('beforeunload', { cancelable: true });
        window.dispatchEvent(event);
        return event.defaultPrevented;
      });
    expect(await asksBeforeUnload()).toBe(true);
    // Leaving asks first; staying keeps the edits.
    await nav(page, 'Projects');
    const leave = page.getByRole('dialog', { name: 'Leave without saving?' });
    await leave.waitFor();
    await screenshot(page, 'workspace-leave-dialog');
    await leave.getByRole('button', { name: 'Stay' }).click();
    await page.getByRole('heading', { name: CALC }).waitFor();
    await problems.waitFor();

    // Generating again puts the saved table back; switching units is not an edit.
    await generator.getByRole('button', { name: 'Generate the table' }).click();
    await expect.poll(() => status(page)).toBe('All changes saved');
    expect(await asksBeforeUnload()).toBe(false);
    await page.getByRole('button', { name: 'US (kip, ft, in)' }).click();
    await expect.poll(() => status(page)).toBe('All changes saved');

    // The basis takes SDS, SD1, S1 and TL from the spectrum; its labels follow the units.
    await page.getByRole('tab', { name: 'Checks' }).click();
    const basis = page.getByRole('form', { name: 'Code basis' });
    const sds = basis.getByLabel('SDS (g)', { exact: true });
    expect(await sds.inputValue()).toBe('0.9');
    expect(await sds.isDisabled()).toBe(true);
    await basis.getByLabel('Ct (hn in ft)').waitFor();
    await basis.getByLabel('Seismic weight per level (kip)').waitFor();
    await basis.getByRole('button', { name: 'Save the basis' }).click();
    await page.getByText('The checks are older than the inputs or the basis').waitFor();
    await analyse(page);
    expect(tabParam(page)).toBe('checks');
    const designTable = page.getByRole('table', { name: 'Design storey values' });
    await designTable.waitFor();
    await designTable.getByRole('columnheader', { name: 'Storey shear (kip)' }).waitFor();
    expect(
      await designTable.getByRole('columnheader', { name: 'elastic', exact: true }).count(),
    ).toBe(5);
    expect(
      await designTable.getByRole('columnheader', { name: 'design', exact: true }).count(),
    ).toBe(5);
    expect(await page.getByRole('alert', { name: 'Checks warnings' }).count()).toBe(0);
    await screenshot(page, 'workspace-checks-design-values');

    // The files come in the units on screen: kip, in, kip·ft.
    const design = (await download(page, 'Design storey values (CSV)')).bytes.toString('utf8');
    expect(design.split('\r\n')[0]).toContain('Storey shear, design (kip)');
    const combined = (await download(page, 'Combined responses (CSV)')).bytes.toString('utf8');
    expect(combined.split('\r\n')[0]).toContain('Overturning moment (kip·ft)');
    const pdf = (await download(page, 'Calc package (PDF)')).bytes;
    const file = join(tmpdir(), `workspace-${Date.now()}.pdf`);
    writeFileSync(file, pdf);
    const text = execFileSync('pdftotext', [file, '-']).toString('utf8');
    expect(text).toContain('Storey shear (kip)');
    expect(text).toContain('Storey values for design');
    expect(text).not.toContain('(kN)');

    // An edit, then signing out: asked first; leaving signs out.
    await page.getByRole('tab', { name: 'Storey table' }).click();
    await editStorey(page, 2, 'mass', '400');
    await expect.poll(() => status(page)).toBe('Unsaved changes');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await leave.waitFor();
    await leave.getByRole('button', { name: 'Leave and lose them' }).click();
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await close();
  });

  it('shows every step of the method for a 12-storey building, any mode shape, and the building swaying', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page.getByRole('heading', { name: /^Welcome/ }).waitFor();
    await nav(page, 'Projects');
    await page.getByRole('link', { name: PROJECT }).click();
    await page.getByRole('link', { name: 'Lateral modal analysis, east-west' }).click();
    await page.getByRole('tab', { name: 'Results' }).click();

    // M and K row by row, every row, for the twelve storeys.
    const band = page.getByRole('table', { name: 'M and K by row' });
    await band.waitFor();
    expect(await band.getByRole('row').count()).toBe(1 + 12);
    // Any mode worked level by level.
    await page.getByRole('combobox', { name: 'Mode worked step by step' }).click();
    await page.getByRole('option', { name: /^Mode 4 / }).click();
    const worked = page.getByRole('table', { name: 'Mode 4, level by level' });
    await worked.waitFor();
    expect(await worked.getByRole('row').count()).toBe(1 + 12 + 1);

    // Any mode shape: add mode 5 to the three shown.
    const chooser = page.getByRole('combobox', { name: 'Modes shown' });
    await chooser.click();
    await page.getByRole('option', { name: /^Mode 5 / }).click();
    await page.keyboard.press('Escape');
    const values = page.getByRole('table', { name: 'Mode shape values' });
    await values.getByRole('columnheader', { name: 'φ, mode 5' }).waitFor();
    expect(await values.getByRole('row').count()).toBe(1 + 12);

    // The building sways in the chosen modes: play, then pause.
    await page.getByRole('img', { name: /The building swaying in modes 1, 2, 3, 5/ }).waitFor();
    const time = page.getByTestId('sway-time');
    expect(await time.textContent()).toMatch(/^t = 0 s/);
    await page.getByRole('button', { name: 'Play' }).click();
    await expect.poll(() => time.textContent()).not.toMatch(/^t = 0 s/);
    await page.getByRole('button', { name: 'Pause' }).click();
    const paused = await time.textContent();
    await page.waitForTimeout(300);
    expect(await time.textContent()).toBe(paused);
    await page.getByRole('region', { name: 'Mode shapes' }).screenshot({
      path: `${SCREENSHOTS}/workspace-mode-shapes-sway.png`,
    });
    await close();
  });

  it('saves what the quick analysis shows as a new calc in a project', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page.getByRole('heading', { name: /^Welcome/ }).waitFor();
    await nav(page, 'Quick analysis');
    await page.getByRole('table', { name: 'Modes' }).waitFor();
    // An invented plant floor: 515 t at storey 2.
    await editStorey(page, 2, 'mass', '515');
    await page.getByRole('button', { name: 'Save as a calc' }).click();
    const dialog = page.getByRole('dialog', { name: 'New calculation' });
    await dialog.getByRole('button', { name: 'Create the draft' }).click();
    await dialog.getByText('Choose the project the calc belongs to').waitFor();
    await dialog.getByRole('combobox', { name: 'Project' }).click();
    await page.getByRole('option', { name: PROJECT }).click();
    await dialog.getByLabel('Title').fill('Plant floor, from the quick analysis');
    await screenshot(page, 'workspace-quick-analysis-save');
    await dialog.getByRole('button', { name: 'Create the draft' }).click();
    await page.getByRole('heading', { name: 'Plant floor, from the quick analysis' }).waitFor();
    const row = page
      .getByRole('grid', { name: 'Storey table' })
      .getByRole('row')
      .filter({ has: page.getByRole('gridcell', { name: '2', exact: true }) });
    expect(await row.locator('[data-field="mass"]').textContent()).toBe('515');
    expect(await status(page)).toBe('All changes saved');
    await close();
  });
});
