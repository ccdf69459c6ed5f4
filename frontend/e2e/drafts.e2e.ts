import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DEMO_PASSWORD, launchBrowser, newPage, screenshot, signIn } from './support/browser';

/** A designer throws away a scratch draft; the project no longer lists it. */
describe('Scratch drafts', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('the author deletes a draft that never went to review, after confirming', async () => {
    const base = inject('baseURL');
    const login = await fetch(`${base}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'designer@tiermode.test', password: DEMO_PASSWORD }),
    });
    const { accessToken } = (await login.json()) as { accessToken: string };
    const headers = { Authorization: `Bearer ${accessToken}`, 'Content-Type': 'application/json' };
    const projectRes = await fetch(`${base}/api/projects`, {
      method: 'POST',
      headers,
      body: JSON.stringify({ name: 'Scratch studies (invented)' }),
    });
    expect(projectRes.status).toBe(201);
    const project = (await projectRes.json()) as { id: string };
    const calcRes = await fetch(`${base}/api/projects/${project.id}/calculations`, {
      method: 'POST',
      headers,
      body: JSON.stringify({
        title: 'Trial stiffness, storey 1',
        inputs: {
          storeys: [
            { mass: 300000, stiffness: 4e8, height: 4 },
            { mass: 250000, stiffness: 3e8, height: 3.5 },
          ],
          spectrum: {
            points: [
              { period: 0, sa: 0.4 },
              { period: 4, sa: 0.2 },
            ],
          },
          dampingRatio: 0.05,
        },
      }),
    });
    expect(calcRes.status).toBe(201);
    const calc = (await calcRes.json()) as { id: string };

    const { page, close } = await newPage(browser);
    await signIn(page, 'designer');
    await page.getByRole('heading', { name: /^Welcome/ }).waitFor();
    await page.goto(`/calculations/${calc.id}`);
    await page.getByRole('heading', { name: 'Trial stiffness, storey 1' }).waitFor();
    await page.getByRole('button', { name: 'Delete draft' }).click();
    const dialog = page.getByRole('dialog', { name: 'Delete this draft?' });
    await dialog.waitFor();
    await screenshot(page, 'draft-delete-confirm');
    await dialog.getByRole('button', { name: 'Delete draft' }).click();
    await page.waitForURL(new RegExp(`/projects/${project.id}$`));
    await page.getByRole('heading', { name: 'Scratch studies (invented)' }).waitFor();
    expect(await page.getByText('Trial stiffness, storey 1').count()).toBe(0);
    expect((await fetch(`${base}/api/calculations/${calc.id}`, { headers })).status).toBe(404);
    await close();
  });
});
