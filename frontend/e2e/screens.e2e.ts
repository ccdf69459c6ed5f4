import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { expectAccessible } from './support/axe';
import { asRole, launchBrowser, screenshot, type DemoRole } from './support/browser';

/** A phone, a tablet upright, and a wide desktop. */
const SCREENS = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'tablet', width: 768, height: 1024 },
  { name: 'wide', width: 1440, height: 900 },
] as const;
type Screen = (typeof SCREENS)[number];

const SUBMITTED = 'Lateral modal analysis, east-west';
const LOCKED = 'Lateral modal analysis, north-south';

/**
 * Nothing on the page scrolls sideways: the page is no wider than the window, and nothing pokes
 * past its right edge unless a frame it sits in (a table's own scroller) clips it there.
 */
async function expectNoSidewaysScroll(page: Page, what: string) {
  const overflow = await page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    const clipped = (e: Element) => {
      for (let a = e.parentElement; a && a !== document.body; a = a.parentElement) {
        const x = getComputedStyle(a).overflowX;
        if ((x === 'auto' || x === 'scroll') && a.getBoundingClientRect().right <= width + 1) {
          return true;
        }
      }
      return false;
    };
    const wide = Array.from(document.querySelectorAll('body *'))
      .filter((e) => {
        const r = e.getBoundingClientRect();
        return r.width > 0 && r.height > 0 && r.right > width + 1 && !clipped(e);
      })
      // Report the outermost offenders only.
      .filter((e, _, all) => !all.some((o) => o !== e && o.contains(e)))
      .slice(0, 5)
      .map((e) => `${e.tagName.toLowerCase()}.${Array.from(e.classList).slice(0, 2).join('.')}`);
    return { scroll: document.documentElement.scrollWidth - width, wide };
  });
  expect({ what, ...overflow }).toEqual({ what, scroll: 0, wide: [] });
}

/** The grid cell holding a title shows all of it (its text is not cut with an ellipsis). */
async function wholeTitle(grid: Locator, title: string): Promise<boolean> {
  const cell = grid
    .getByRole('gridcell')
    .filter({ has: grid.page().getByRole('link', { name: title }) });
  // A cut title overflows its cell (shown with an ellipsis): wider content than the cell.
  return cell.evaluate((e) => e.scrollWidth <= e.clientWidth + 1);
}

/** Opens a page of the main navigation: from the drawer on a narrow screen. */
async function go(page: Page, screen: Screen, name: string) {
  if (screen.width < 900) {
    await page.getByRole('button', { name: 'Open the navigation' }).click();
  }
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name }).click();
  if (screen.width < 900) {
    await page.getByRole('navigation', { name: 'Main' }).waitFor({ state: 'hidden' });
  }
}

const as = (browser: Browser, role: DemoRole, screen: Screen, job: (page: Page) => Promise<void>) =>
  asRole(browser, role, job, { bypassCSP: true, viewport: screen });

async function check(page: Page, screen: Screen, what: string) {
  await page.waitForTimeout(150); // charts and grids settle
  await expectNoSidewaysScroll(page, `${what} at ${screen.width} px`);
  await expectAccessible(page, `${what} at ${screen.width} px`);
  await screenshot(
    page,
    `screens-${screen.name}-${what.replace(/[^a-z0-9]+/gi, '-').toLowerCase()}`,
  );
}

describe('Any screen: 390 px phones, 768 px tablets, 1440 px desktops', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  for (const screen of SCREENS) {
    it(`designer and reviewer at ${screen.width} px: dashboard, a calc's tabs, the seal`, async () => {
      await as(browser, 'reviewer', screen, async (page) => {
        await check(page, screen, 'dashboard');
        if (screen.width >= 1440) {
          // Titles are whole on a wide screen: no "Lateral modal analysis, east-w...".
          const waiting = page.getByRole('grid', { name: 'Waiting for my review' });
          expect(await wholeTitle(waiting, SUBMITTED)).toBe(true);
        }
        await page.getByRole('link', { name: SUBMITTED }).first().click();
        await page.getByRole('heading', { name: SUBMITTED }).waitFor();
        for (const tab of [
          'Storey table',
          'Design spectrum',
          'Results',
          'Checks',
          'Response history',
          'Review',
          'Audit trail',
        ]) {
          await page.getByRole('tab', { name: tab }).click();
          await page.getByRole('tab', { name: tab, selected: true }).waitFor();
          await check(page, screen, `calc ${tab}`);
        }
      });
    });

    it(`student at ${screen.width} px: the library and a sealed calc`, async () => {
      await as(browser, 'student', screen, async (page) => {
        await go(page, screen, 'Library');
        const library = page.getByRole('grid', { name: 'Library' });
        await library.waitFor();
        await check(page, screen, 'library');
        if (screen.width >= 1440) {
          // The key columns are in view on a wide screen, the title whole.
          for (const column of ['Calculation', 'Project', 'Revision', 'Status', 'Storeys']) {
            expect(await library.getByRole('columnheader', { name: column }).isVisible()).toBe(
              true,
            );
          }
          expect(await wholeTitle(library, LOCKED)).toBe(true);
        }
        await library.getByRole('link', { name: LOCKED }).click();
        await page.getByText('The seal is valid').waitFor();
        await check(page, screen, 'sealed calc');
      });
    });
  }
});
