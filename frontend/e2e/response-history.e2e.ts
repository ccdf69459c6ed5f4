import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asRole, launchBrowser, screenshot, SCREENSHOTS } from './support/browser';
import { analyse, download, nav } from './support/calc-page';

// An invented calc in the demo's invented laboratory project; the record is an invented pulse.
const PROJECT = 'Quarry Lane laboratory';
const CALC = 'Tank hall response history';

/** An invented record in cm/s^2 at 0.01 s: a two-cycle sine pulse of 150 cm/s^2, then rest. */
const pulse = () =>
  Array.from({ length: 1201 }, (_, k) =>
    k <= 100 ? (150 * Math.sin((2 * Math.PI * k) / 50)).toFixed(4) : '0',
  ).join('\n');

const section = (page: Page, name: string) => page.getByRole('region', { name, exact: true });
const motionTime = (page: Page, within: string) =>
  section(page, within).getByTestId('motion-time').textContent();
/** The numbers of a table row's cells (thousands separators dropped). */
const rowNumbers = async (page: Page, table: string, row: number) =>
  (
    await page
      .getByRole('region', { name: table })
      .getByRole('row')
      .nth(row)
      .getByRole('cell')
      .allTextContents()
  ).map((text) => Number(text.replaceAll(',', '').split(' ')[0]));

describe('Response history, in the browser', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('designer: reads a record file, scales it, keeps it, analyses, animates, reads the peaks and compares them with the spectrum', async () => {
    await asRole(browser, 'designer', async (page) => {
      await nav(page, 'Projects');
      await page.getByRole('link', { name: PROJECT }).click();
      await page.getByRole('button', { name: 'New calculation' }).click();
      await page.getByLabel('Title').fill(CALC);
      await page.getByRole('button', { name: 'Create the draft' }).click();
      await page.getByRole('heading', { name: CALC }).waitFor();
      await analyse(page);

      await page.getByRole('tab', { name: 'Response history' }).click();
      expect(new URL(page.url()).searchParams.get('tab')).toBe('response-history');
      const record = section(page, 'Ground-motion record');
      await record.getByRole('button', { name: 'A record file' }).click();
      await record.getByLabel('Accelerations in').click();
      await page.getByRole('option', { name: 'cm/s² (gal)' }).click();
      await record.getByLabel('Time step (s), for one column').fill('0.01');

      // A bad value is refused, naming its row; nothing is taken.
      await page.getByLabel('Record file').setInputFiles({
        name: 'bad.txt',
        mimeType: 'text/plain',
        buffer: Buffer.from('0\n12.5\nabc\n0\n'),
      });
      await record
        .getByRole('alert')
        .getByText(/Row 3, acceleration/)
        .waitFor();
      await record.getByText('No record yet').waitFor();

      await page.getByLabel('Record file').setInputFiles({
        name: 'tank-hall-pulse.txt',
        mimeType: 'text/plain',
        buffer: Buffer.from(pulse()),
      });
      await record.getByText('Read 1201 values, time step as given: 0.01 s.').waitFor();
      await record.getByTestId('record-summary').getByText('tank-hall-pulse').waitFor();
      // The largest sample, 150 sin(86.4 deg) = 149.70 cm/s^2 (sample 12), over 980.665 cm/s^2
      // per g (g = 9.80665 m/s^2, CGPM 1901): 0.15266 g, shown to four figures.
      expect(await record.getByTestId('record-summary').textContent()).toContain(
        'peak 0.1527 g as given',
      );

      // Scaled by a factor of two; the spectrum preview says so.
      await record.getByLabel('Scale the record').click();
      await page.getByRole('option', { name: 'By a factor I give' }).click();
      await record.getByLabel('Factor').fill('2');
      await record
        .getByTestId('scale-preview')
        .getByText(/^Scale factor 2\./)
        .waitFor();

      await page.getByRole('button', { name: 'Keep with the calc' }).click();
      await page.getByText('Kept with the calc; Analyse makes its response history').waitFor();
      await analyse(page);
      await screenshot(page, 'response-history-record');

      // The stored response: peaks for every storey, their times, and the comparison.
      const results = section(page, 'Response to the record');
      await results
        .getByTestId('history-scaling')
        .getByText(/multiplied by 2/)
        .waitFor();
      const peaks = 'Peak responses to the record, storey by storey';
      await expect
        .poll(() => page.getByRole('region', { name: peaks }).getByRole('row').count())
        .toBe(6);
      const roof = await rowNumbers(page, peaks, 5);
      expect(roof[1]).toBeGreaterThan(0); // displacement (mm)
      expect(roof[2]).toBeGreaterThan(0); // its time (s)
      expect(roof[2]).toBeLessThanOrEqual(12);
      // Each ratio is the history's peak over the CQC value shown beside it.
      const compare = 'Response history peaks against the CQC spectrum results, storey by storey';
      for (const row of [1, 3, 5]) {
        const [, history, cqc, ratio] = await rowNumbers(page, compare, row);
        expect(ratio).toBeCloseTo(history / cqc, 2);
      }

      // The building moves under the record: play, then the slider to the end.
      await results.getByRole('button', { name: 'Play' }).waitFor();
      const start = await motionTime(page, 'Response to the record');
      expect(start).toMatch(/^t = 0 s/);
      await results.getByRole('button', { name: 'Play' }).click();
      await expect.poll(() => motionTime(page, 'Response to the record')).not.toBe(start);
      await results.getByRole('button', { name: 'Pause' }).click();
      await results.getByRole('slider', { name: 'Time (s)' }).focus();
      await page.keyboard.press('End');
      await expect.poll(() => motionTime(page, 'Response to the record')).toMatch(/^t = 12 s/);
      await screenshot(page, 'response-history-results');
      await results.screenshot({ path: `${SCREENSHOTS}/response-history-results-section.png` });

      // Free vibration from the second mode's shape: that mode alone takes part.
      const free = section(page, 'Free vibration');
      await free.getByLabel('Mode', { exact: true }).click();
      await page.getByRole('option', { name: /^Mode 2 / }).click();
      await free.getByText(/mode 2 alone/).waitFor();
      await expect
        .poll(() =>
          free
            .getByRole('region', { name: "Free vibration: each mode's start" })
            .getByRole('row')
            .count(),
        )
        .toBe(2);
      await free.getByRole('button', { name: 'Play' }).click();
      await expect.poll(() => motionTime(page, 'Free vibration')).not.toMatch(/^t = 0 s/);
      await free.screenshot({ path: `${SCREENSHOTS}/response-history-free-vibration.png` });

      // The peaks as CSV, in the units on screen, and the calc package carries it all.
      const csv = (await download(page, 'Response history peaks (CSV)')).bytes.toString('utf8');
      expect(csv.split(/\r?\n/)[0]).toContain('Displacement (mm),Displacement at (s)');
      expect(Number(csv.trim().split(/\r?\n/).at(-1)!.split(',')[2])).toBeCloseTo(roof[1], 0);
      const pdf = (await download(page, 'Calc package (PDF)')).bytes;
      const file = join(tmpdir(), `response-history-${Date.now()}.pdf`);
      writeFileSync(file, pdf);
      const text = execFileSync('pdftotext', [file, '-']).toString('utf8');
      expect(text).toContain('Response history');
      expect(text).toContain('tank-hall-pulse');
      expect(text).toContain('Peak responses to the record, storey by storey');
      expect(text).toContain('Response history against the response spectrum (CQC)');

      await page.getByRole('tab', { name: 'Review' }).click();
      await page.getByRole('button', { name: 'Submit for review' }).click();
      await page.getByText('Submitted for review: waiting for a reviewer.').waitFor();
    });
  });

  it('reviewer: reads the response history of the submitted calc, without changing it', async () => {
    await asRole(browser, 'reviewer', async (page) => {
      await page
        .getByRole('grid', { name: 'Waiting for my review' })
        .getByRole('link', { name: CALC })
        .click();
      await page.getByRole('heading', { name: CALC }).waitFor();
      await page.getByRole('tab', { name: 'Response history' }).click();
      await section(page, 'Response to the record').getByTestId('history-scaling').waitFor();
      expect(await page.getByRole('button', { name: 'Keep with the calc' }).count()).toBe(0);
      expect(await page.getByLabel('Scale the record').isDisabled()).toBe(true);
      await section(page, 'Ground-motion record').getByText('tank-hall-pulse').waitFor();
    });
  });

  it('student: reads the response history of the calc of record in the library, and lets the building go from any mode', async () => {
    await asRole(browser, 'student', async (page) => {
      await nav(page, 'Library');
      await page
        .getByRole('link', { name: /north-south/ })
        .first()
        .click();
      await page.getByRole('tab', { name: 'Response history' }).click();
      await section(page, 'Ground-motion record')
        .getByText(/^Invented demo record/)
        .waitFor();
      const results = section(page, 'Response to the record');
      await results
        .getByTestId('history-scaling')
        .getByText(/design spectrum's mean/)
        .waitFor();
      const peaks = 'Peak responses to the record, storey by storey';
      expect(await page.getByRole('region', { name: peaks }).getByRole('row').count()).toBe(8);
      // Nothing to save for a student, but the free vibration answers any start.
      expect(await page.getByRole('button', { name: 'Keep with the calc' }).count()).toBe(0);
      const free = section(page, 'Free vibration');
      await free.getByText(/The calc keeps the free vibration from mode 1 shape, 0.05 m/).waitFor();
      await free.getByLabel('Mode', { exact: true }).click();
      await page.getByRole('option', { name: /^Mode 3 / }).click();
      await free.getByText(/mode 3 alone/).waitFor();
      await screenshot(page, 'response-history-student');
    });
  });
});
