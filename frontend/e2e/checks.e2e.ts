import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, screenshot, signIn } from './support/browser';
import { analyse, editStorey } from './support/calc-page';

const CALC = 'Loading-dock storey study, north-south';

// The laboratory's site and frame, as invented for the demo: a steel moment frame (R 8, Cd 5.5,
// Ct 0.0724, x 0.8) in risk category III (Ie 1.25). SDS, SD1, S1 and TL come from the generated
// spectrum (0.8 g, 0.45 g, 0.4 g, 6 s) and cannot be typed apart from it.
const BASIS: Record<string, string> = {
  R: '8',
  Cd: '5.5',
  Ie: '1.25',
  'Ct (hn in m)': '0.0724',
  x: '0.8',
};
const FROM_SPECTRUM: Record<string, string> = {
  'SDS (g)': '0.8',
  'SD1 (g)': '0.45',
  'S1 (g)': '0.4',
  'TL (s)': '6',
};

async function analyseAndOpenChecks(page: Page) {
  await analyse(page);
  await page.getByRole('tab', { name: 'Checks' }).click();
  await page.getByRole('table', { name: 'Storey checks' }).waitFor();
}

describe('Code-basis checks (designer)', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('sets the ASCE 7-22 basis on the demo laboratory, sees the scale factor and a failing drift, stiffens the storey and sees it pass', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page.getByRole('grid', { name: 'My drafts' }).getByRole('link', { name: CALC }).click();
    await page.getByRole('heading', { name: CALC }).waitFor();
    await page.getByRole('tab', { name: 'Checks' }).click();
    const form = page.getByRole('form', { name: 'Code basis' });
    for (const [label, value] of Object.entries(FROM_SPECTRUM)) {
      const field = form.getByLabel(label, { exact: true });
      expect(await field.inputValue()).toBe(value);
      expect(await field.isDisabled()).toBe(true);
    }
    await form
      .getByTestId('basis-from-spectrum')
      .getByText('From the design spectrum: SDS 0.8 g, SD1 0.45 g, S1 0.4 g, TL 6 s.')
      .waitFor();
    for (const [label, value] of Object.entries(BASIS)) {
      await form.getByLabel(label, { exact: true }).fill(value);
    }
    await form.getByRole('combobox', { name: 'Risk category' }).click();
    await page.getByRole('option', { name: 'III', exact: true }).click();
    await form.getByRole('button', { name: 'Save the basis' }).click();
    await page.getByText('The checks are older than the inputs or the basis').waitFor();

    await analyseAndOpenChecks(page);
    const scale = Number(
      await page.getByRole('cell', { name: 'Scale factor', exact: true }).textContent(),
    );
    expect(scale).toBeGreaterThan(1);
    await page
      .getByRole('alert', { name: 'Drift check' })
      .getByText('The design drift exceeds the limit at storey 1.')
      .waitFor();
    await page.getByText(/Extreme soft storey \(1b\): storey 1/).waitFor();
    await screenshot(page, 'checks-failing-drift');

    // Stiffen storey 1 (braced bays at the loading dock): 1,400,000 kN/m.
    await page.getByRole('tab', { name: 'Storey table' }).click();
    await editStorey(page, 1, 'stiffness', '1400000');
    await analyseAndOpenChecks(page);
    await page
      .getByRole('alert', { name: 'Drift check' })
      .getByText("Every storey's design drift is within the limit.")
      .waitFor();
    expect(await page.getByText(/soft storey/).count()).toBe(0);
    await screenshot(page, 'checks-passing');
    await close();
  });
});
