import type { Locator, Page } from 'playwright-core';
import { expect } from 'vitest';

/** Follows a link of the main navigation. */
export const nav = (page: Page, name: string) =>
  page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name }).click();

/** Types a value into a grid cell as a person does: double-click, type, Enter. */
export async function typeIntoCell(cell: Locator, value: string) {
  await cell.dblclick();
  await cell.locator('input').fill(value);
  await cell.locator('input').press('Enter');
}

/** Types a value into one cell of the storey table (storey 1 = the base). */
export async function editStorey(page: Page, storey: number, field: string, value: string) {
  const row = page
    .getByRole('grid', { name: 'Storey table' })
    .getByRole('row')
    .filter({ has: page.getByRole('gridcell', { name: String(storey), exact: true }) });
  await typeIntoCell(row.locator(`[data-field="${field}"]`), value);
}

/**
 * Presses Analyse (or Save and analyse) and waits until the new results are in the page: the
 * analysis answered and the calc was read again. The page stays on its tab unless it was on
 * the inputs, which go on to Results.
 */
export async function analyse(page: Page) {
  const analysed = page.waitForResponse(
    (r) => r.request().method() === 'POST' && /\/analyse$/.test(new URL(r.url()).pathname),
  );
  await page.getByRole('button', { name: /^(Save and analyse|Analyse)$/ }).click();
  expect((await analysed).status()).toBe(200);
  await expect.poll(() => page.getByRole('progressbar', { name: 'Working' }).count()).toBe(0);
  await expect.poll(() => page.getByRole('status').first().textContent()).toBe('All changes saved');
}

/** Chooses an item of the calc page's Download menu and returns the file the browser saves. */
export async function download(page: Page, item: string) {
  await page.getByRole('button', { name: 'Download' }).click();
  const [saved] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('menuitem', { name: item }).click(),
  ]);
  const chunks: Buffer[] = [];
  for await (const chunk of await saved.createReadStream()) chunks.push(chunk as Buffer);
  return { name: saved.suggestedFilename(), bytes: Buffer.concat(chunks) };
}
