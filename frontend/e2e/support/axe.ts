import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';
import { expect } from 'vitest';

const axePath = createRequire(import.meta.url).resolve('axe-core/axe.min.js');

interface AxeViolation {
  id: string;
  impact: 'minor' | 'moderate' | 'serious' | 'critical' | null;
  help: string;
  nodes: { target: string[]; failureSummary?: string }[];
}

/**
 * Runs axe-core (WCAG 2.1 A and AA rules, and axe's best practices) on the page as it is now
 * and fails on any serious or critical violation, naming the rule and the elements. The page's
 * context must be made with `bypassCSP: true`, since axe is injected as a script of its own.
 */
export async function expectAccessible(page: Page, what: string): Promise<void> {
  // A dialog fading in is half transparent: contrast is judged once every transition has ended.
  // (Endless ones, a progress bar's, are left alone; a cancelled one counts as ended.)
  await page.evaluate(() =>
    Promise.all(
      document
        .getAnimations()
        .filter((a) => a.effect?.getComputedTiming().endTime !== Infinity)
        .map((a) => a.finished.catch(() => undefined)),
    ),
  );
  await page.addScriptTag({ path: axePath });
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (...a: unknown[]) => Promise<unknown> } }).axe;
    const result = (await axe.run(document, {
      runOnly: {
        type: 'tag',
        values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'],
      },
      resultTypes: ['violations'],
    })) as { violations: AxeViolation[] };
    return result.violations;
  });
  const bad = violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map(
      (v) =>
        `${v.impact} ${v.id}: ${v.help} — ${v.nodes
          .slice(0, 4)
          .map((n) => n.target.join(' '))
          .join(' | ')}`,
    );
  expect({ page: what, violations: bad }).toEqual({ page: what, violations: [] });
}
