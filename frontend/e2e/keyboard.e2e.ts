import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, launchBrowser, newPage, screenshot } from './support/browser';

/**
 * Keyboard alone: no click, no mouse. Tab moves between controls as a person would press it
 * (tabTo presses Tab until the wanted control has the focus, and fails if it never does).
 */
async function focusedName(page: Page): Promise<string> {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el) return '';
    const labelled = el.getAttribute('aria-label');
    if (labelled) return labelled;
    const id = el.id;
    const label = id ? document.querySelector(`label[for="${id}"]`)?.textContent : null;
    if (label) return label.trim();
    // A control's own text names it; a focused container (a grid, the page) has no one name.
    const control = ['BUTTON', 'A'].includes(el.tagName) || el.getAttribute('role') === 'tab';
    return control ? (el.textContent ?? '').trim() : `<${el.tagName.toLowerCase()}>`;
  });
}

async function tabTo(page: Page, name: RegExp, limit = 60): Promise<void> {
  for (let i = 0; i < limit; i += 1) {
    await page.keyboard.press('Tab');
    if (name.test(await focusedName(page))) return;
  }
  throw new Error(`Tab never reached ${name}; last focus: ${await focusedName(page)}`);
}

async function signInByKeyboard(page: Page): Promise<void> {
  await page.goto('/sign-in');
  await tabTo(page, /^Email/);
  await page.keyboard.type('designer@tiermode.test');
  await tabTo(page, /^Password/);
  await page.keyboard.type(DEMO_PASSWORD);
  await page.keyboard.press('Enter');
  await page.getByRole('heading', { name: /^Welcome/ }).waitFor();
}

const activeCell = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement?.closest('[role="gridcell"], [role="columnheader"]');
    return el
      ? {
          field: el.getAttribute('data-field'),
          row: el.closest('[role="row"]')?.getAttribute('aria-rowindex'),
          text: el.textContent,
        }
      : null;
  });

const rowCount = (page: Page) =>
  page.getByRole('grid', { name: 'Storey table' }).locator('[role="row"][data-rowindex]').count();

describe('Keyboard only (designer)', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('signs in, reaches the storey table, edits a mass, adds and deletes a storey, and uses a dialog', async () => {
    const { page, close } = await newPage(browser);
    await signInByKeyboard(page);

    await tabTo(page, /^Quick analysis$/);
    await page.keyboard.press('Enter');
    await page.getByRole('table', { name: 'Modes' }).waitFor();
    const before = await rowCount(page);

    // Into the grid: Tab lands on one cell; the arrows move; Enter edits; Enter commits.
    for (let i = 0; i < 40 && !(await activeCell(page)); i += 1) await page.keyboard.press('Tab');
    expect(await activeCell(page)).not.toBeNull();
    await page.keyboard.press('Control+Home'); // the first cell of the first row
    for (let i = 0; i < 6; i += 1) {
      const cell = await activeCell(page);
      if (cell?.field === 'mass') break;
      await page.keyboard.press('ArrowRight');
    }
    await page.keyboard.press('ArrowDown');
    expect((await activeCell(page))?.field).toBe('mass');
    // Storey 1 (the header row is row 1 of the grid for assistive technology).
    expect((await activeCell(page))?.row).toBe('2');
    await page.keyboard.press('Enter');
    await page.keyboard.press('Control+A');
    await page.keyboard.type('777');
    await page.keyboard.press('Enter'); // commits, and moves down to storey 2
    const massCells = page
      .getByRole('grid', { name: 'Storey table' })
      .locator('[role="row"][data-rowindex="0"] [data-field="mass"]');
    await expect.poll(() => massCells.textContent()).toContain('777');

    // The row's actions are reached with the arrows too: insert a storey below this one.
    for (let i = 0; i < 6; i += 1) {
      if ((await activeCell(page))?.field === 'actions') break;
      await page.keyboard.press('ArrowRight');
    }
    expect((await activeCell(page))?.field).toBe('actions');
    // The grid hands the focus to the cell's first action once it has rendered.
    await expect.poll(() => focusedName(page)).toBe('Stiffness of storey 2 from its columns');
    await page.keyboard.press('ArrowRight'); // from "stiffness from columns" to "insert below"
    await expect.poll(() => focusedName(page)).toBe('Insert a storey below storey 2');
    await page.keyboard.press('Enter');
    await expect.poll(() => rowCount(page)).toBe(before + 1);
    await expect.poll(() => focusedName(page)).toMatch(/^Insert a storey below storey \d+$/);
    await page.keyboard.press('ArrowRight'); // "delete"
    await expect.poll(() => focusedName(page)).toMatch(/^Delete storey \d+$/);
    await page.keyboard.press('Enter');
    await expect.poll(() => rowCount(page)).toBe(before);

    // A dialog: opened with Enter, the focus inside it, Escape closes it and the focus comes
    // back to the button that opened it.
    await tabTo(page, /^Paste from a spreadsheet$/);
    await page.keyboard.press('Enter');
    await page.getByRole('dialog').waitFor();
    const inDialog = await page.evaluate(
      () => !!document.activeElement?.closest('[role="dialog"]'),
    );
    expect(inDialog).toBe(true);
    await screenshot(page, 'keyboard-01-dialog');
    await page.keyboard.press('Escape');
    await page.getByRole('dialog').waitFor({ state: 'detached' });
    await expect.poll(() => focusedName(page)).toBe('Paste from a spreadsheet');
    await close();
  });

  it('creates a project through its dialog by keyboard alone', async () => {
    const { page, close } = await newPage(browser);
    await signInByKeyboard(page);
    await tabTo(page, /^Projects$/);
    await page.keyboard.press('Enter');
    // Wait (without touching anything) for the list to load, so no re-render moves the focus.
    await page.getByRole('grid').getByRole('link').first().waitFor();
    await tabTo(page, /^New project$/);
    await page.keyboard.press('Enter');
    await page.getByRole('dialog').waitFor();
    await tabTo(page, /^Name/);
    await page.keyboard.type('Keyboard Lane depot');
    await page.keyboard.press('Enter'); // submits the form
    await page.getByRole('heading', { name: 'Keyboard Lane depot' }).waitFor();
    await close();
  });
});
