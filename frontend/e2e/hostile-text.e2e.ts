import type { Browser } from 'playwright-core';
import { inject } from 'vitest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, launchBrowser, newPage, screenshot, signIn } from './support/browser';

/**
 * Script tags and SQL fragments typed into projects and calcs are stored as text and shown as
 * text: nothing of them runs in the browser, under the app's real Content-Security-Policy.
 */
const SCRIPT = '<script>window.__tiermodeXss = 1</script>';
const IMG = '"><img src=x onerror="window.__tiermodeXss = 2">';
const SQL = "Robert'); DROP TABLE calculations; --";
const SVG = '<svg onload="window.__tiermodeXss=3">';

async function api(path: string, token: string | null, body: unknown) {
  const res = await fetch(`${inject('baseURL')}${path}`, {
    method: 'POST',
    headers: {
      'Content-Type': 'application/json',
      ...(token ? { Authorization: `Bearer ${token}` } : {}),
    },
    body: JSON.stringify(body),
  });
  expect(res.status).toBeLessThan(300);
  return (await res.json()) as Record<string, unknown>;
}

describe('Hostile text (designer)', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('shows script tags and SQL fragments as plain text, and runs none of them', async () => {
    const { accessToken } = (await api('/api/auth/login', null, {
      email: 'designer@tiermode.test',
      password: DEMO_PASSWORD,
    })) as { accessToken: string };
    const project = await api('/api/projects', accessToken, {
      name: `${SCRIPT} depot`,
      site: IMG,
      structuralSystem: SQL,
    });
    await api(`/api/projects/${String(project.id)}/calculations`, accessToken, {
      title: `${SQL} ${IMG}`,
      inputs: {
        storeys: [
          { label: SVG, mass: 300000, stiffness: 4e8, height: 4 },
          { label: SCRIPT, mass: 280000, stiffness: 3.6e8, height: 3.5 },
        ],
        spectrum: {
          points: [
            { period: 0, sa: 0.4 },
            { period: 4, sa: 0.2 },
          ],
        },
        dampingRatio: 0.05,
      },
    });

    const { page, close } = await newPage(browser);
    const dialogs: string[] = [];
    page.on('dialog', (dialog) => {
      dialogs.push(dialog.message());
      void dialog.dismiss();
    });
    await signIn(page, 'designer');
    await page.getByRole('heading', { name: /^Welcome/ }).waitFor();
    // The dashboard lists the new draft by its title.
    await page.getByText(`${SQL} ${IMG}`, { exact: true }).first().waitFor();
    await page.goto(`/projects/${String(project.id)}`);
    await page.getByRole('heading', { name: `${SCRIPT} depot` }).waitFor();
    await page.getByText(IMG, { exact: true }).first().waitFor();
    await page.getByText(SQL).first().waitFor();
    await page
      .getByRole('link', { name: `${SQL} ${IMG}` })
      .first()
      .click();
    await page.getByRole('heading', { name: `${SQL} ${IMG}` }).waitFor();
    const grid = page.getByRole('grid', { name: 'Storey table' });
    await grid.getByText(SVG, { exact: true }).waitFor();
    await grid.getByText(SCRIPT, { exact: true }).waitFor();
    await screenshot(page, 'hostile-text-01-calc');

    const ran = await page.evaluate(
      () => (window as unknown as { __tiermodeXss?: number }).__tiermodeXss,
    );
    expect(ran).toBeUndefined();
    expect(dialogs).toEqual([]);
    // None of it became markup: no injected script, image or svg with a handler.
    expect(await page.locator('script:not([src])').count()).toBe(0);
    expect(await page.locator('img[src="x"], svg[onload], [onerror]').count()).toBe(0);
    await close();
  });
});
