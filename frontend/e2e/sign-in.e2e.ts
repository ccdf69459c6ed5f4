import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, newPage, screenshot, signIn, type DemoRole } from './support/browser';

const NAVIGATION: Record<DemoRole, string[]> = {
  admin: ['Start', 'Projects', 'Library', 'Quick analysis', 'Verification', 'People', 'Outbox'],
  designer: ['Start', 'Projects', 'Library', 'Quick analysis', 'Verification'],
  reviewer: ['Start', 'Projects', 'Library', 'Quick analysis', 'Verification'],
  student: ['Start', 'Library', 'Quick analysis', 'Verification'],
};
const NAMES: Record<DemoRole, string> = {
  admin: 'Rowan Pike',
  designer: 'Mira Castell',
  reviewer: 'Tomas Hale',
  student: 'Jun Okafor',
};

describe('Signing in', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it.each(Object.keys(NAVIGATION) as DemoRole[])(
    'the %s signs in and sees the navigation its role allows',
    async (role) => {
      const { page, close } = await newPage(browser);
      await signIn(page, role);
      await expect
        .poll(() => page.getByRole('heading', { level: 1 }).textContent())
        .toBe(`Welcome, ${NAMES[role]}`);
      const nav = page.getByRole('navigation', { name: 'Main' });
      expect(await nav.getByRole('link').allTextContents()).toEqual(NAVIGATION[role]);
      expect(await page.getByTestId('signed-in-user').textContent()).toContain(NAMES[role]);
      expect(await page.getByRole('note', { name: 'Caution' }).textContent()).toContain(
        'locally adopted building code governs',
      );
      if (role === 'reviewer') {
        expect(await page.getByText('You may lock calcs you did not author').count()).toBe(1);
      }
      await screenshot(page, `sign-in-${role}`);
      await close();
    },
  );

  it('a wrong password shows a clear error and stays on the sign-in page', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer', 'not-the-password');
    const alert = page.getByRole('alert');
    await alert.waitFor();
    expect(await alert.textContent()).toBe('Email or password is incorrect');
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    expect(await page.getByLabel('Email').inputValue()).toBe('designer@tiermode.test');
    await screenshot(page, 'sign-in-wrong-password');
    await close();
  });

  it('a signed-out visitor is sent to sign-in and comes back to the page asked for', async () => {
    const { page, close } = await newPage(browser);
    await page.goto('/users');
    await page.waitForURL(/\/sign-in\?redirectTo=%2Fusers/);
    await page.getByLabel('Email').fill('admin@tiermode.test');
    await page.getByLabel('Password').fill('tiermode-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'People' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/users');
    await close();
  });

  it('a student who types the admin address of a page sees that it is not for its role', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'student');
    await page.getByRole('heading', { name: 'Welcome, Jun Okafor' }).waitFor();
    await page.goto('/users');
    await page.getByRole('heading', { name: 'Not available to your role' }).waitFor();
    await close();
  });

  it('signing out returns to the sign-in page and the old session no longer opens pages', async () => {
    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page.getByRole('heading', { name: 'Welcome, Mira Castell' }).waitFor();
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/sign-in/);
    await page.goto('/');
    await page.waitForURL(/\/sign-in/);
    await close();
  });
});
