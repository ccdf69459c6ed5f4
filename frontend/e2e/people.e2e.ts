import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, screenshot, signIn } from './support/browser';

describe('People (admin)', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('the admin adds a licensed reviewer, sees the server refuse a common password, and the new reviewer signs in', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'admin');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'People' })
      .click();
    await page.getByRole('heading', { name: 'People' }).waitFor();
    await page.getByRole('grid', { name: 'People' }).getByText('Tomas Hale').waitFor();
    await screenshot(page, 'people-list');

    await page.getByRole('button', { name: 'Add a person' }).click();
    const dialog = page.getByRole('dialog', { name: 'Add a person' });
    await dialog.getByLabel('Name').fill('Ines Varga');
    await dialog.getByLabel('Email').fill('ines.varga@tiermode.test');
    await dialog.getByLabel('Role').click();
    await page.getByRole('option', { name: 'Reviewer' }).click();
    await dialog.getByLabel('First password').fill('password123');
    await dialog.getByLabel('Licence number').fill('SE-77001');
    await dialog.getByLabel('Licence jurisdiction').fill('Invented State Board');
    await dialog.getByLabel('Licence valid through').fill('2030-06-30');
    await dialog.getByRole('button', { name: 'Save' }).click();
    const refusal = dialog.getByRole('alert');
    await refusal.waitFor();
    expect(await refusal.textContent()).toContain('password is one of the most common passwords');
    // Nothing typed is lost.
    expect(await dialog.getByLabel('Licence number').inputValue()).toBe('SE-77001');
    await screenshot(page, 'people-refused-password');

    await dialog.getByLabel('First password').fill('basalt-lintel-2031');
    await dialog.getByRole('button', { name: 'Save' }).click();
    await dialog.waitFor({ state: 'detached' });
    const row = page.getByRole('row', { name: /Ines Varga/ });
    await row.waitFor();
    expect(await row.textContent()).toContain('SE-77001');
    expect(await row.textContent()).toContain('Yes');
    await screenshot(page, 'people-added');

    // A reload on a client-side route serves the app.
    await page.reload();
    await page.getByRole('row', { name: /Ines Varga/ }).waitFor();
    await close();

    const second = await newPage(browser);
    await second.page.goto('/sign-in');
    await second.page.getByLabel('Email').fill('ines.varga@tiermode.test');
    await second.page.getByLabel('Password').fill('basalt-lintel-2031');
    await second.page.getByRole('button', { name: 'Sign in' }).click();
    await second.page.getByRole('heading', { name: 'Welcome, Ines Varga' }).waitFor();
    expect(await second.page.getByTestId('signed-in-user').textContent()).toContain(
      'Reviewer (licensed)',
    );
    await second.close();
  });
});
