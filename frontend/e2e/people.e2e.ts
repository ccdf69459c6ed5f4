import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { receivedMail } from '../../backend/test/support/server-process';
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

describe('The account mail (new person)', () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('opens the mailed set-password link, chooses a password and signs in with it', async () => {
    const base = inject('baseURL');
    const login = await fetch(`${base}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'admin@tiermode.test', password: 'tiermode-demo' }),
    });
    const { accessToken } = (await login.json()) as { accessToken: string };
    const headers = { Authorization: `Bearer ${accessToken}`, 'Content-Type': 'application/json' };
    const created = await fetch(`${base}/api/users`, {
      method: 'POST',
      headers,
      body: JSON.stringify({
        email: 'lena.moss@tiermode.test',
        name: 'Lena Moss',
        role: 'student',
        password: 'first-one-2026-x',
      }),
    });
    expect(created.status).toBe(201);
    // The outbox page shows set-password links masked: read the mail as Lena got it.
    const mail = await receivedMail(inject('databasePath'), 'lena.moss@tiermode.test');
    const link = /\/set-password\?token=[A-Za-z0-9_-]+/.exec(mail.text)?.[0];
    expect(link).toBeTruthy();

    const { page, close } = await newPage(browser);
    await page.goto(link as string);
    await page.getByLabel('New password').fill('basalt-gusset-3030');
    await page.getByLabel('The same again').fill('basalt-gusset-3030');
    await screenshot(page, 'set-password');
    await page.getByRole('button', { name: 'Save my password' }).click();
    await page.waitForURL(/\/sign-in\?passwordSet=1/);
    expect(await page.getByRole('status').textContent()).toBe(
      'Your password is saved. Sign in with it.',
    );
    await page.getByLabel('Email').fill('lena.moss@tiermode.test');
    await page.getByLabel('Password').fill('basalt-gusset-3030');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Welcome, Lena Moss' }).waitFor();
    await close();

    // Lena forgets it: the admin mails her a new link, and the first one stays dead.
    const admin = await newPage(browser);
    await signIn(admin.page, 'admin');
    await admin.page.getByRole('heading', { name: /^Welcome/ }).waitFor();
    await admin.page.goto('/users');
    await admin.page
      .getByRole('grid', { name: 'People' })
      .getByRole('button', { name: 'Mail Lena Moss a new set-password link' })
      .click();
    const sent = admin.page.getByRole('status').filter({ hasText: 'A new set-password link' });
    await sent.waitFor();
    expect(await sent.textContent()).toContain('lena.moss@tiermode.test');
    await screenshot(admin.page, 'people-link-sent');
    // The outbox shows the mail, its link masked.
    await admin.page.goto('/outbox');
    await admin.page.getByText('Choose a new Tiermode password').first().click();
    await admin.page
      .getByText(/set-password\?token=\(hidden\)/)
      .first()
      .waitFor();
    await screenshot(admin.page, 'outbox-masked-link');
    await admin.close();
    const resent = await receivedMail(inject('databasePath'), 'lena.moss@tiermode.test');
    expect(resent.subject).toBe('Choose a new Tiermode password');
    const third = await newPage(browser);
    await third.page.goto(link as string);
    await third.page.getByLabel('New password').fill('granite-corbel-4040');
    await third.page.getByLabel('The same again').fill('granite-corbel-4040');
    await third.page.getByRole('button', { name: 'Save my password' }).click();
    await third.page
      .getByRole('alert')
      .filter({ hasText: 'not valid, was used already' })
      .waitFor();
    await third.close();
  });
});
