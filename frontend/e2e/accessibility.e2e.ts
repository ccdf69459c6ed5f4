import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, it } from 'vitest';
import { expectAccessible } from './support/axe';
import { asRole, launchBrowser, type DemoRole } from './support/browser';
import { nav } from './support/calc-page';

/**
 * axe-core on every main page, signed in as the role that uses it, with no serious or critical
 * violation allowed. The demo data gives each page something to show.
 */
const DRAFT = 'Loading-dock storey study, north-south';
const SUBMITTED = 'Lateral modal analysis, east-west';
const LOCKED = 'Lateral modal analysis, north-south';

const as = (browser: Browser, role: DemoRole | null, job: (page: Page) => Promise<void>) =>
  asRole(browser, role, job, { bypassCSP: true });

async function eachTab(page: Page, label: string, tabs: string[]) {
  for (const tab of tabs) {
    await page.getByRole('tab', { name: tab }).click();
    await page.getByRole('tab', { name: tab, selected: true }).waitFor();
    await page.waitForTimeout(150); // charts and grids settle
    await expectAccessible(page, `${label}, ${tab} tab`);
  }
}

describe('Accessibility (axe-core, WCAG 2.1 AA): no serious or critical violation', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('the sign-in and set-password pages', async () => {
    await as(browser, null, async (page) => {
      await page.goto('/sign-in');
      await page.getByRole('button', { name: 'Sign in' }).waitFor();
      await expectAccessible(page, 'sign-in');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByText(/email/i).first().waitFor();
      await expectAccessible(page, 'sign-in with errors');
      await page.goto('/set-password?token=made-up');
      await page.getByRole('heading').first().waitFor();
      await expectAccessible(page, 'set-password');
    });
  });

  it('the designer’s pages: start, projects, a project, a draft calc on every tab, quick analysis, verification', async () => {
    await as(browser, 'designer', async (page) => {
      await expectAccessible(page, 'start (designer)');
      await nav(page, 'Projects');
      await page.getByRole('grid').first().waitFor();
      await expectAccessible(page, 'projects');
      await page.getByRole('button', { name: /new project/i }).click();
      await page.getByRole('dialog').waitFor();
      await expectAccessible(page, 'new project dialog');
      await page.keyboard.press('Escape');
      await page
        .getByRole('link', { name: /Quarry Lane/ })
        .first()
        .click();
      await page
        .getByRole('heading', { name: /Quarry Lane/ })
        .first()
        .waitFor();
      await expectAccessible(page, 'project page');
      await page.getByRole('link', { name: DRAFT }).first().click();
      await page.getByRole('heading', { name: DRAFT }).waitFor();
      await eachTab(page, 'draft calc', [
        'Storey table',
        'Design spectrum',
        'Results',
        'Checks',
        'Response history',
        'Review',
        'Audit trail',
      ]);
      await nav(page, 'Quick analysis');
      await page.getByRole('table', { name: 'Modes' }).waitFor();
      await page
        .getByRole('progressbar', { name: 'Updating the results' })
        .waitFor({ state: 'detached' });
      await expectAccessible(page, 'quick analysis');
      await nav(page, 'Verification');
      await page.getByRole('table').first().waitFor();
      await expectAccessible(page, 'verification');
    });
  });

  it('the reviewer’s pages: start and a submitted calc’s review', async () => {
    await as(browser, 'reviewer', async (page) => {
      await expectAccessible(page, 'start (reviewer)');
      await page.getByRole('link', { name: SUBMITTED }).first().click();
      await page.getByRole('tab', { name: 'Review' }).waitFor();
      await eachTab(page, 'submitted calc', ['Results', 'Review']);
      for (const action of ['Return to the designer', 'Lock as the calc of record']) {
        await page.getByRole('button', { name: action }).click();
        await page.getByRole('dialog').waitFor();
        await expectAccessible(page, `${action} dialog`);
        await page.keyboard.press('Escape');
        await page.getByRole('dialog').waitFor({ state: 'detached' });
      }
    });
  });

  it('the student’s pages: the library and a calc of record', async () => {
    await as(browser, 'student', async (page) => {
      await nav(page, 'Library');
      await page.getByRole('grid').first().waitFor();
      await expectAccessible(page, 'library');
      await page.getByRole('link', { name: LOCKED }).first().click();
      await page.getByRole('tab', { name: 'Results' }).waitFor();
      await eachTab(page, 'locked calc', [
        'Storey table',
        'Results',
        'Response history',
        'Audit trail',
      ]);
    });
  });

  it('the admin’s pages: people, the new-person dialog and the outbox', async () => {
    await as(browser, 'admin', async (page) => {
      await nav(page, 'People');
      await page.getByRole('grid').first().waitFor();
      await expectAccessible(page, 'people');
      await page
        .getByRole('button', { name: /add|new/i })
        .first()
        .click();
      await page.getByRole('dialog').waitFor();
      await expectAccessible(page, 'new person dialog');
      await page.keyboard.press('Escape');
      await nav(page, 'Outbox');
      await page.getByRole('grid').first().waitFor();
      await expectAccessible(page, 'outbox');
    });
  });
});
