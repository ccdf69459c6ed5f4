import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asRole, launchBrowser, screenshot, SCREENSHOTS, type DemoRole } from './support/browser';
import { analyse, editStorey, nav } from './support/calc-page';

// An invented project for this journey; every name and number is made up.
const PROJECT = 'Birch Row offices';
const CALC = 'Birch Row lateral analysis';
const SCRATCH = 'Scratch draft';

const as = <T>(browser: Browser, role: DemoRole, job: (page: Page) => Promise<T>) =>
  asRole(browser, role, job);

async function openTab(page: Page, name: string) {
  await page.getByRole('tab', { name }).click();
}

async function openFromDashboard(page: Page, list: string) {
  await page.getByRole('grid', { name: list }).getByRole('link', { name: CALC }).click();
  await page.getByRole('heading', { name: CALC }).waitFor();
}

describe('The review workflow, across the four roles', () => {
  let browser: Browser;
  let calcUrl = '';
  let scratchUrl = '';

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('designer: creates a project and a calc, enters storeys, analyses and submits', async () => {
    await as(browser, 'designer', async (page) => {
      await nav(page, 'Projects');
      await page.getByRole('button', { name: 'New project' }).click();
      const dialog = page.getByRole('dialog', { name: 'New project' });
      await dialog.getByRole('button', { name: 'Create the project' }).click();
      await dialog.getByText('Give the project a name').waitFor();
      await dialog.getByLabel('Name').fill(PROJECT);
      await dialog.getByLabel('Site').fill('Invented: a corner plot on medium-dense sand');
      await dialog.getByLabel('Structural system').fill('Steel braced frames');
      await screenshot(page, 'workflow-01-new-project');
      await dialog.getByRole('button', { name: 'Create the project' }).click();
      await page.getByRole('heading', { name: PROJECT, level: 1 }).waitFor();

      await page.getByRole('button', { name: 'New calculation' }).click();
      await page.getByLabel('Title').fill(SCRATCH);
      await page.getByRole('button', { name: 'Create the draft' }).click();
      await page.getByRole('heading', { name: SCRATCH }).waitFor();
      scratchUrl = new URL(page.url()).pathname;

      await page.goBack();
      await page.getByRole('button', { name: 'New calculation' }).click();
      await page.getByLabel('Title').fill(CALC);
      await page.getByRole('button', { name: 'Create the draft' }).click();
      await page.getByRole('heading', { name: CALC }).waitFor();
      calcUrl = new URL(page.url()).pathname;
      await page.getByRole('note', { name: 'Preliminary' }).waitFor();
      expect(await page.getByTestId('preliminary-watermark').count()).toBe(1);

      await editStorey(page, 2, 'mass', '455');
      await expect
        .poll(() => page.getByRole('status').first().textContent())
        .toBe('Unsaved changes');
      await screenshot(page, 'workflow-02-storeys-edited');
      // The calc is kept in US customary units for this office; values stay SI on the server.
      await page.getByRole('button', { name: 'US (kip, ft, in)' }).click();
      await page.getByRole('columnheader', { name: /Seismic weight \(kip/ }).waitFor();
      await analyse(page);
      await screenshot(page, 'workflow-03-results');

      await openTab(page, 'Review');
      // An invented geotechnical letter kept with the calc; its hash will be sealed with it.
      await page.getByLabel('Attachment file').setInputFiles({
        name: 'geotechnical-letter.pdf',
        mimeType: 'application/pdf',
        buffer: Buffer.from(
          '%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj\n' +
            '3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 595 842]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
        ),
      });
      const attachments = page.getByRole('grid', { name: 'Attachments' });
      await attachments
        .getByRole('button', { name: 'geotechnical-letter.pdf', exact: true })
        .waitFor();
      // A file added by mistake is taken back before submitting (the author may, on a draft).
      await page.getByLabel('Attachment file').setInputFiles({
        name: 'wrong-sketch.pdf',
        mimeType: 'application/pdf',
        buffer: Buffer.from(
          '%PDF-1.4\n1 0 obj<</Type/Catalog/Pages 2 0 R>>endobj\n2 0 obj<</Type/Pages/Kids[3 0 R]/Count 1>>endobj\n' +
            '3 0 obj<</Type/Page/Parent 2 0 R/MediaBox[0 0 420 297]>>endobj\ntrailer<</Root 1 0 R>>\n%%EOF\n',
        ),
      });
      await attachments.getByRole('button', { name: 'wrong-sketch.pdf', exact: true }).waitFor();
      await screenshot(page, 'workflow-03b-attachments');
      await attachments.getByRole('button', { name: 'Remove wrong-sketch.pdf' }).click();
      await attachments
        .getByRole('button', { name: 'wrong-sketch.pdf', exact: true })
        .waitFor({ state: 'detached' });
      await page.getByRole('button', { name: 'Submit for review' }).click();
      await page.getByText('Submitted for review', { exact: true }).first().waitFor();
      await screenshot(page, 'workflow-04-submitted');
    });
  });

  it('reviewer: comments on a storey and returns the calc', async () => {
    await as(browser, 'reviewer', async (page) => {
      await openFromDashboard(page, 'Waiting for my review');
      await openTab(page, 'Review');
      await page.getByLabel('About').click();
      await page.getByRole('option', { name: 'Storey 2' }).click();
      await page
        .getByLabel('Comment', { exact: true })
        .fill('The mass of storey 2 looks high for an office floor: check the plant load.');
      await page.getByRole('button', { name: 'Add the comment' }).click();
      await page
        .getByRole('list', { name: 'Review comments' })
        .getByText('check the plant load')
        .waitFor();

      await page.getByRole('button', { name: 'Return to the designer' }).click();
      const dialog = page.getByRole('dialog', { name: 'Return to the designer' });
      await dialog.getByRole('button', { name: 'Return the calc' }).click();
      await dialog.getByText('Say what the designer should change').waitFor();
      await dialog.getByLabel('What should change').fill('Please revisit storey 2, see comment.');
      await screenshot(page, 'workflow-05-return-dialog');
      await dialog.getByRole('button', { name: 'Return the calc' }).click();
      await dialog.waitFor({ state: 'detached' });
      // The storey comment and the return's own: both open.
      await page.getByText('Returned with comments (2)', { exact: true }).first().waitFor();
    });
  });

  it('designer: resolves the comment, fixes the storey and resubmits', async () => {
    await as(browser, 'designer', async (page) => {
      await page
        .getByRole('grid', { name: 'My drafts' })
        .getByText('Returned with comments (2)')
        .waitFor();
      await openFromDashboard(page, 'My drafts');
      // The reviewer's storey comment is marked on storey 2's row.
      await page.getByRole('img', { name: 'Storey 2: 1 open comment' }).waitFor();
      await screenshot(page, 'workflow-05a-storey-comment-marked');
      await openTab(page, 'Review');
      const thread = page.getByRole('list', { name: 'Review comments' });
      await thread.getByText('check the plant load').waitFor();
      // The designer answers the comment before fixing it.
      await thread.getByRole('button', { name: 'Reply' }).first().click();
      await page
        .getByLabel('Reply', { exact: true })
        .fill('Plant moved to the roof; mass revised.');
      await page.getByRole('button', { name: 'Send the reply' }).click();
      await thread
        .getByRole('list', { name: /^Replies to / })
        .getByText('Plant moved to the roof; mass revised.')
        .waitFor();
      // The box follows the saved state, so it turns once the server has the change.
      await thread.getByRole('checkbox', { name: 'Resolved' }).first().click();
      await expect
        .poll(() => thread.getByRole('checkbox', { name: 'Resolved' }).first().isChecked())
        .toBe(true);

      await openTab(page, 'Storey table');
      // The calc is kept in US units now: 880 kip of seismic weight is about 399 t.
      await page.getByRole('columnheader', { name: /Seismic weight \(kip/ }).waitFor();
      await editStorey(page, 2, 'mass', '880');
      // Submitting needs the edits saved and analysed first; the page says so.
      await openTab(page, 'Review');
      await page.getByText('Save your changes first.').waitFor();
      await analyse(page);
      // The audit trail names what the edit changed.
      await openTab(page, 'Audit trail');
      await page
        .getByRole('grid')
        .getByText('Inputs or title changed: storey 2 mass')
        .first()
        .waitFor();
      await openTab(page, 'Review');
      await page.getByRole('button', { name: 'Submit for review' }).click();
      await page.getByText('Submitted for review: waiting for a reviewer.').waitFor();
      await screenshot(page, 'workflow-06-resubmitted');
    });
  });

  it('reviewer: locks it with a statement, and the seal is valid', async () => {
    await as(browser, 'reviewer', async (page) => {
      await openFromDashboard(page, 'Waiting for my review');
      await openTab(page, 'Review');
      // What changed since the last submission: storey 2's weight, marked old -> new.
      const changes = page.getByRole('table', { name: 'Changes by storey' });
      await changes.waitFor();
      const changed = changes.locator('[data-changed="true"]');
      expect(await changed.count()).toBe(1);
      expect(await changed.textContent()).toMatch(/^[\d,.]+ → 880$/);
      await page.getByRole('region', { name: 'What changed' }).screenshot({
        path: `${SCREENSHOTS}/workflow-06a-what-changed.png`,
      });
      await page.getByRole('button', { name: 'Lock as the calc of record' }).click();
      const dialog = page.getByRole('dialog', { name: 'Lock as the calc of record' });
      await expect
        .poll(() => dialog.getByRole('alert', { name: 'Your licence' }).textContent())
        .toContain('Tomas Hale');
      await dialog
        .getByLabel('Statement of acceptance')
        .fill('Accepted as the lateral analysis of record for the permit set.');
      await screenshot(page, 'workflow-07-lock-dialog');
      await dialog.getByRole('button', { name: 'Lock and seal' }).click();
      await dialog.waitFor({ state: 'detached' });
      await page.getByText('The seal is valid').waitFor();
      expect(await page.getByTestId('preliminary-watermark').count()).toBe(0);
      await screenshot(page, 'workflow-08-locked');
    });
  });

  it('student: finds it in the library, reads it, and cannot reach a draft', async () => {
    await as(browser, 'student', async (page) => {
      await nav(page, 'Library');
      await page.getByRole('combobox', { name: 'Code basis' }).click();
      await page.getByRole('option', { name: 'ASCE 7-22' }).click();
      const library = page.getByRole('grid', { name: 'Library' });
      await library.getByRole('link', { name: CALC }).waitFor();
      expect(await library.getByRole('link', { name: /Alder Court/ }).count()).toBe(0);
      await screenshot(page, 'workflow-09-library');
      await library.getByRole('link', { name: CALC }).click();
      await page.getByText('The seal is valid').waitFor();
      expect(
        await page.getByRole('button', { name: 'US (kip, ft, in)' }).getAttribute('aria-pressed'),
      ).toBe('true');
      await openTab(page, 'Results');
      await page.getByRole('region', { name: 'Method, step by step' }).waitFor();
      expect(await page.getByRole('button', { name: 'Save' }).count()).toBe(0);
      await screenshot(page, 'workflow-10-student-reads');

      await page.goto(scratchUrl);
      await page.getByRole('heading', { name: 'Not available to your role' }).waitFor();
      expect(await page.getByText(SCRATCH).count()).toBe(0);
      await screenshot(page, 'workflow-11-student-refused-draft');
    });
    expect(calcUrl).toMatch(/^\/calculations\//);
  });

  it('admin: sees the mail of each step in the outbox', async () => {
    await as(browser, 'admin', async (page) => {
      await nav(page, 'Outbox');
      const outbox = page.getByRole('grid', { name: 'Outbox' });
      await outbox.getByText(`Locked as the calc of record: ${CALC} (revision 1)`).waitFor();
      // Each message once (the catcher's copy is not listed again); submitted twice, so two.
      expect(await outbox.getByText(`Submitted for review: ${CALC} (revision 1)`).count()).toBe(2);
      expect(await outbox.getByText(`Returned with comments: ${CALC} (revision 1)`).count()).toBe(
        1,
      );
      await outbox.getByText(`Returned with comments: ${CALC} (revision 1)`).click();
      const message = page.getByRole('region', { name: 'Message' });
      await message.getByText('Please revisit storey 2').waitFor();
      await message
        .getByText(/Open the calc: http:\/\/[^ ]+\/calculations\/[^ ]+\?tab=review/)
        .waitFor();
      await message.getByText(/the engineer of record decides/).waitFor();
      await screenshot(page, 'workflow-12-outbox');
    });
  });

  it('designer: starts revision 2, and revision 1 then links to it', async () => {
    await as(browser, 'designer', async (page) => {
      await page.goto(calcUrl);
      await openTab(page, 'Review');
      await page.getByRole('button', { name: 'Start revision 2' }).click();
      await page.getByText('Revision 2 ·').waitFor();
      await page.goto(calcUrl);
      await openTab(page, 'Review');
      const next = page.getByRole('alert', { name: 'Next revision' });
      await next.getByRole('link', { name: 'open revision 2' }).waitFor();
      expect(await page.getByRole('button', { name: 'Start revision 2' }).count()).toBe(0);
      await next.getByRole('link', { name: 'open revision 2' }).click();
      await page.getByText('Revision 2 ·').waitFor();
    });
  });
});
