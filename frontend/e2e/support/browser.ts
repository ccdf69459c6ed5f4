import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { expect, inject } from 'vitest';

export const SCREENSHOTS = resolve(import.meta.dirname, '..', 'screenshots');
export const DEMO_PASSWORD = 'tiermode-demo';
export type DemoRole = 'admin' | 'designer' | 'reviewer' | 'student';

/**
 * Debian's chromium, never a downloaded browser, with the flags this machine needs. Playwright
 * gives each launch a new empty profile of its own.
 */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
    ],
  });
}

/**
 * A fresh context and page. `close()` fails the test if the page threw an uncaught error or
 * logged a console error meanwhile (a render loop, a failed script), so no journey passes over one.
 */
export async function newPage(
  browser: Browser,
  options: { bypassCSP?: boolean; viewport?: { width: number; height: number } } = {},
): Promise<{ context: BrowserContext; page: Page; close: () => Promise<void> }> {
  const context = await browser.newContext({
    // Only for injecting axe-core; every other journey runs under the app's real CSP.
    bypassCSP: options.bypassCSP ?? false,
    baseURL: inject('baseURL'),
    viewport: options.viewport ?? { width: 1366, height: 860 },
  });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  page.on('console', (message) => {
    // A refused request (401 for a wrong password, 400 for a refused form) is logged by the
    // browser itself; those are expected answers, not script errors.
    if (message.type() === 'error' && !message.text().startsWith('Failed to load resource')) {
      problems.push(`console error: ${message.text()}`);
    }
  });
  const close = async () => {
    await context.close();
    expect(problems).toEqual([]);
  };
  return { context, page, close };
}

/**
 * A fresh page signed in as `role` (or not signed in, for null), on the dashboard, for `job`;
 * closed after it, failing on any page error meanwhile (see newPage).
 */
export async function asRole<T>(
  browser: Browser,
  role: DemoRole | null,
  job: (page: Page) => Promise<T>,
  options: Parameters<typeof newPage>[1] = {},
): Promise<T> {
  const { page, close } = await newPage(browser, options);
  if (role) {
    await signIn(page, role);
    await page.getByRole('heading', { name: /^Welcome/ }).waitFor();
  }
  const result = await job(page);
  await close();
  return result;
}

export async function signIn(page: Page, role: DemoRole, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('Email').fill(`${role}@tiermode.test`);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOTS, { recursive: true });
  await page.screenshot({ path: join(SCREENSHOTS, `${name}.png`), fullPage: true });
}
