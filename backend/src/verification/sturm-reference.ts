import Decimal from 'decimal.js';
import type { Storey } from '../analysis/engine/shear-building';

/**
 * A reference natural frequency of a shear building computed a different way from the engine, in
 * 60-digit decimal arithmetic: bisection on K - lambda M itself, counting the eigenvalues below
 * lambda by the Sturm sequence property (the negative pivots of the LDL^T factors of K - lambda M
 * number the eigenvalues below lambda: Bathe, Finite Element Procedures, 1996, the Sturm sequence
 * property in the chapter preparing the solution of eigenproblems; Wilkinson, The Algebraic
 * Eigenvalue Problem, 1965, chapter 5). At 60 digits no rounding in it reaches the 1e-9 the
 * engine is held to. Slow (decimal arithmetic): for the tests and the Verification page only.
 */
const D = Decimal.clone({ precision: 60 });
type Dec = InstanceType<typeof D>;

function eigenvaluesBelow(storeys: readonly Storey[], lambda: Dec): number {
  const n = storeys.length;
  let negative = 0;
  let previous: Dec | null = null;
  for (let i = 0; i < n; i += 1) {
    const below = new D(storeys[i].stiffness);
    const above = i + 1 < n ? new D(storeys[i + 1].stiffness) : new D(0);
    let pivot = below.plus(above).minus(lambda.times(storeys[i].mass));
    if (previous !== null) pivot = pivot.minus(below.times(below).dividedBy(previous));
    if (pivot.isZero()) pivot = new D('-1e-55').times(lambda);
    if (pivot.isNegative()) negative += 1;
    previous = pivot;
  }
  return negative;
}

/**
 * omega_j (j 0-based, rad/s) to about 1e-25 relative, bracketed from an estimate that only has
 * to be within a few per cent (the bracket is confirmed by counts before it is used).
 */
export function referenceOmega(storeys: readonly Storey[], j: number, estimate: number): number {
  const squared = new D(estimate).times(estimate);
  let width = new D('1e-6');
  let lo: Dec;
  let hi: Dec;
  for (;;) {
    lo = squared.times(new D(1).minus(width));
    hi = squared.times(new D(1).plus(width));
    if (eigenvaluesBelow(storeys, lo) <= j && eigenvaluesBelow(storeys, hi) > j) break;
    width = width.times(100);
    if (width.greaterThan(0.5)) throw new Error(`no bracket for mode ${j + 1}`);
  }
  while (hi.minus(lo).dividedBy(lo).greaterThan('1e-25')) {
    const mid = lo.plus(hi).dividedBy(2);
    if (eigenvaluesBelow(storeys, mid) > j) hi = mid;
    else lo = mid;
  }
  return lo.plus(hi).dividedBy(2).sqrt().toNumber();
}
