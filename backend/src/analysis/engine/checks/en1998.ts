import type { CheckResult } from './result';

/** The non-structural elements a building has, which set its EN 1998-1 4.4.3.2 drift limit. */
export type DriftLimitClass = 'brittle' | 'ductile' | 'none';

/**
 * EN 1998-1:2004 4.4.3.2(1): d_r nu <= 0.005 h (a: brittle non-structural elements attached),
 * 0.0075 h (b: ductile ones), 0.010 h (c: none fixed so as to interfere).
 */
export function en1998DriftLimitRatio(kind: DriftLimitClass): number {
  return kind === 'brittle' ? 0.005 : kind === 'ductile' ? 0.0075 : 0.01;
}

export function en1998DriftCheck(
  designDrift: number,
  nu: number,
  storeyHeight: number,
  kind: DriftLimitClass,
): CheckResult<{ ratio: number; limit: number }> {
  const ratio = (designDrift * nu) / storeyHeight;
  const limit = en1998DriftLimitRatio(kind);
  const clause = `EN 1998-1:2004 4.4.3.2(1)${kind === 'brittle' ? 'a' : kind === 'ductile' ? 'b' : 'c'}`;
  return { value: { ratio, limit }, pass: ratio <= limit, clause };
}

/**
 * EN 1998-1:2004 4.3.3.3.1 as a check: the modes used must be at least the fewest that reach 90%
 * of the mass with every mode above 5%.
 */
export function en1998ModeCountCheck(
  effectiveMassRatios: readonly number[],
  modesUsed: number,
): CheckResult<{ needed: number | null; used: number }> {
  const needed = en1998ModesNeeded(effectiveMassRatios);
  return {
    value: { needed, used: modesUsed },
    pass: needed !== null && modesUsed >= needed,
    clause: 'EN 1998-1:2004 4.3.3.3.1',
  };
}

/**
 * EN 1998-1:2004 4.3.3.3.2: modes i and j are independent when T_j <= 0.9 T_i. Lists the pairs
 * of consecutive modes that are not; SRSS may not combine those, CQC may.
 */
export function en1998CloselySpaced(
  periods: readonly number[],
  combination: 'cqc' | 'srss',
): CheckResult<{ pairs: [number, number][] }> {
  const pairs: [number, number][] = [];
  for (let i = 1; i < periods.length; i += 1) {
    if (periods[i] > 0.9 * periods[i - 1]) pairs.push([i, i + 1]);
  }
  return {
    value: { pairs },
    pass: pairs.length === 0 || combination === 'cqc',
    clause: 'EN 1998-1:2004 4.3.3.3.2',
  };
}

/**
 * EN 1998-1:2004 4.3.3.3.1: the modes kept must have effective masses summing to at least 90% of
 * the total, and every mode with more than 5% must be kept. Returns the fewest first modes that
 * do both, or null when even all of them do not.
 */
export function en1998ModesNeeded(effectiveMassRatios: readonly number[]): number | null {
  const lastAbove5 = effectiveMassRatios.reduce((last, r, i) => (r > 0.05 ? i : last), -1);
  let sum = 0;
  for (let i = 0; i < effectiveMassRatios.length; i += 1) {
    sum += effectiveMassRatios[i];
    if (sum >= 0.9 && i >= lastAbove5) return i + 1;
  }
  return null;
}
