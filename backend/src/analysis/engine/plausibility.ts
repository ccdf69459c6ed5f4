import type { CombinedResponse, PlausibilityFlag } from '@tiermode/shared-types';
import type { Storey } from './shear-building';

/**
 * Design spectra stop by 10 to 16 s (ASCE 7 TL maps reach 16 s; EN 1998-1 tables are drawn to
 * 4 s), and no building's fundamental period comes near 20 s (common practice).
 */
export const MAX_PLAUSIBLE_PERIOD = 20;
/** A storey drift of a tenth of its height is far past collapse (common practice). */
export const MAX_PLAUSIBLE_DRIFT_RATIO = 0.1;

const percent = (ratio: number) => `${(ratio * 100).toFixed(ratio < 10 ? 1 : 0)}%`;

/**
 * Results no real building gives, each with the storey that causes it: a fundamental period
 * past every design spectrum (pointing at the storey that drifts most in that mode), and storey
 * drifts past a tenth of the height (pointing at the worst storey). Usually a units slip: a
 * stiffness in kN/m entered as N/m, a second moment in cm^4 entered as m^4.
 */
export function plausibilityFlags(
  storeys: readonly Storey[],
  fundamental: { period: number; shape: readonly number[] },
  combined: Pick<CombinedResponse, 'driftRatio'>,
): PlausibilityFlag[] {
  const flags: PlausibilityFlag[] = [];
  if (fundamental.period > MAX_PLAUSIBLE_PERIOD) {
    const storey = worst(
      storeys.map(
        (s, i) =>
          Math.abs(fundamental.shape[i] - (i > 0 ? fundamental.shape[i - 1] : 0)) / s.height,
      ),
    );
    flags.push({
      storey,
      message: `The fundamental period T1 = ${fundamental.period.toPrecision(4)} s is longer than any design spectrum reaches (no building comes near ${MAX_PLAUSIBLE_PERIOD} s). Storey ${storey} is the most flexible: check the units of its stiffness (N/m) and of the masses (kg).`,
    });
  }
  const over = combined.driftRatio
    .map((ratio, i) => ({ ratio, storey: i + 1 }))
    .filter(({ ratio }) => ratio > MAX_PLAUSIBLE_DRIFT_RATIO);
  if (over.length > 0) {
    const storey = worst(combined.driftRatio);
    const others =
      over.length > 1
        ? ` (${over.length} storeys drift more than ${percent(MAX_PLAUSIBLE_DRIFT_RATIO)})`
        : '';
    flags.push({
      storey,
      message: `Storey ${storey} drifts ${percent(combined.driftRatio[storey - 1])} of its height${others}: no building stands at that. Check the units of its stiffness and height.`,
    });
  }
  return flags;
}

/** The 1-based number of the largest value. */
function worst(values: readonly number[]): number {
  let best = 0;
  values.forEach((v, i) => {
    if (v > values[best]) best = i;
  });
  return best + 1;
}
