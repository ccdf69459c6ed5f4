import { assertStoreys, stiffnessTridiagonal, type Storey } from './shear-building';
import { lowestFrequencies, shearBuildingFrequencies } from './shear-building-frequencies';
import { assertModeSelection, selectModeCount, type ModeSelection } from './mode-selection';
import {
  symmetricTridiagonalEigenvalues,
  tridiagonalEigenvectors,
  tridiagonalNorm,
} from './symmetric-tridiagonal';

const TOO_EXTREME =
  'the storey masses and stiffnesses are too far apart in size to analyse in double precision';

/** One natural mode of the shear building. */
export interface Mode {
  /** 1 = the fundamental (longest period). */
  number: number;
  /** omega, rad/s */
  circularFrequency: number;
  /** f = omega / (2 pi), Hz */
  frequency: number;
  /** T = 2 pi / omega, s */
  period: number;
  /**
   * Normalised to +1 at the roof (index N-1), or, where the roof barely moves in this mode
   * (`shapeNormalisation` 'largest'), to +1 at its largest component.
   */
  shape: number[];
  shapeNormalisation: 'roof' | 'largest';
  /** 1-based level where `shape` is +1. */
  normalisationLevel: number;
  /** Normalised so that phi^T M phi = 1 (same sign as `shape`). */
  massNormalisedShape: Float64Array;
  /** Gamma = phi^T M r / phi^T M phi for `shape`, r = ones. */
  participationFactor: number;
  /** M* = (phi^T M r)^2 / (phi^T M phi), kg; independent of the normalisation. */
  effectiveMass: number;
  /** M* / total mass */
  effectiveMassRatio: number;
  /** Sum of the effective mass ratios of this mode and all below it. */
  cumulativeMassRatio: number;
}

/**
 * All N natural modes of the shear building, fundamental first.
 *
 * Solves K phi = omega^2 M phi through the symmetric standard form A = M^-1/2 K M^-1/2 (A is
 * tridiagonal because K is and M is diagonal): A x = omega^2 x, phi = M^-1/2 x, so the unit x
 * gives the mass-normalised phi. Gamma and M* as in Chopra, Dynamics of Structures, chapter 13
 * (earthquake analysis of linear systems): Gamma_n = L_n / M_n with L_n = phi_n^T M r and
 * M_n = phi_n^T M phi_n, M*_n = L_n^2 / M_n.
 */
export function naturalModes(storeys: readonly Storey[]): Mode[] {
  const { a, b, rootMass } = standardForm(storeys);
  // omega^2 to eps * ||A|| first, then each omega to high relative accuracy from the bidiagonal
  // factor of A (shear-building-frequencies.ts), and the vectors from those values.
  const norm = tridiagonalNorm(a, b);
  const omegas = shearBuildingFrequencies(storeys, symmetricTridiagonalEigenvalues(a, b), norm);
  const values = omegas.map((omega) => omega * omega);
  // The vectors from K - omega^2 M itself (see tridiagonalEigenvectors): a level of negligible
  // mass makes A huge but leaves K and M as they are.
  const { diagonal, offDiagonal } = stiffnessTridiagonal(storeys);
  const vectors = tridiagonalEigenvectors(diagonal, offDiagonal, values, rootMass);
  return modesFromEigenpairs(storeys, rootMass, values, vectors, omegas);
}

/**
 * Only the modes a truncated analysis keeps, fundamental first: the first `modeCount`, or the
 * fewest whose cumulative effective mass ratio reaches `targetMassRatio` (all of them if none
 * does). Each frequency by bisection with Sturm counts (lowestFrequencies), each vector by inverse
 * iteration, so the work grows with the modes kept, not with all N; the modes are those
 * naturalModes gives, to rounding (lowest-modes.spec.ts checks it). For a mass target the batch
 * doubles until the target is reached.
 */
export function lowestModes(storeys: readonly Storey[], selection: ModeSelection): Mode[] {
  const n = storeys.length;
  assertModeSelection(selection, n);
  const { a, b, rootMass } = standardForm(storeys);
  const norm = tridiagonalNorm(a, b);
  const { diagonal, offDiagonal } = stiffnessTridiagonal(storeys);
  const solve = (count: number) => {
    const omegas = lowestFrequencies(storeys, count, norm);
    const values = omegas.map((omega) => omega * omega);
    const vectors = tridiagonalEigenvectors(diagonal, offDiagonal, values, rootMass);
    return modesFromEigenpairs(storeys, rootMass, values, vectors, omegas);
  };
  if (selection.modeCount !== undefined) return solve(selection.modeCount);
  // Double the batch until the target is reached: at most twice the work of knowing the count.
  for (let count = Math.min(4, n); ; count = Math.min(2 * count, n)) {
    const modes = solve(count);
    const kept = selectModeCount(modes, selection);
    const reached = modes[kept - 1].cumulativeMassRatio >= (selection.targetMassRatio ?? 1) - 1e-12;
    // The first `kept` of a larger solve are exactly what solving for `kept` gives: each
    // frequency's bisection stands alone, and inverse iteration only looks back at lower modes.
    if (reached || count === n) return modes.slice(0, kept);
  }
}

/** A = M^-1/2 K M^-1/2 as its diagonal a and off-diagonal b, and the square roots of the masses. */
export function standardForm(storeys: readonly Storey[]): {
  a: number[];
  b: number[];
  rootMass: number[];
} {
  assertStoreys(storeys);
  const { diagonal, offDiagonal } = stiffnessTridiagonal(storeys);
  const rootMass = storeys.map((s) => Math.sqrt(s.mass));
  const a = diagonal.map((k, i) => k / storeys[i].mass);
  const b = offDiagonal.map((k, i) => k / (rootMass[i] * rootMass[i + 1]));
  if (![...a, ...b].every(Number.isFinite)) throw new RangeError(TOO_EXTREME);
  return { a, b, rootMass };
}

/**
 * Below this ratio of the roof component to the largest, a shape is not divided by its roof
 * component: the quotient would reach 1e6 or more (a mode confined to the lower storeys of a
 * building with a stiff, light base and heavy, soft top can have a roof component of 1e-43 of
 * its largest), and Gamma would be as large the other way, both meaningless on their own.
 */
export const ROOF_NORMALISATION_LIMIT = 1e-6;

/**
 * The modes from the eigenpairs of A (values ascending, unit vectors x): phi = M^-1/2 x is the
 * mass-normalised shape, with its sign chosen to make the roof (or the reference level of a
 * shape normalised to its largest component) move positive.
 */
export function modesFromEigenpairs(
  storeys: readonly Storey[],
  rootMass: readonly number[],
  values: readonly number[],
  vectors: readonly ArrayLike<number>[],
  /** omega_j where known more accurately than sqrt(values[j]). */
  omegas?: readonly number[],
): Mode[] {
  const n = storeys.length;
  const totalMass = storeys.reduce((sum, s) => sum + s.mass, 0);

  const masses = storeys.map((s) => s.mass);
  let cumulative = 0;
  return values.map((omegaSquared, j) => {
    if (!(omegaSquared > 0) || !Number.isFinite(omegaSquared)) {
      throw new RangeError(TOO_EXTREME);
    }
    const x = vectors[j];
    const massNormalisedShape = new Float64Array(n);
    let largest = 0;
    for (let i = 0; i < n; i += 1) {
      massNormalisedShape[i] = x[i] / rootMass[i];
      if (Math.abs(massNormalisedShape[i]) > Math.abs(massNormalisedShape[largest])) largest = i;
    }
    // The roof component of an eigenvector of an unreduced tridiagonal matrix is never zero,
    // but it can be too small to divide by (ROOF_NORMALISATION_LIMIT).
    const byRoof =
      Math.abs(massNormalisedShape[n - 1]) >=
      ROOF_NORMALISATION_LIMIT * Math.abs(massNormalisedShape[largest]);
    const reference = byRoof ? n - 1 : largest;
    // The sign that makes the reference component (the roof, as a rule) move positive.
    if (massNormalisedShape[reference] < 0) {
      for (let i = 0; i < n; i += 1) massNormalisedShape[i] = -massNormalisedShape[i];
    }
    const roof = massNormalisedShape[reference];
    const shape = new Array<number>(n);
    let l = 0; // phi^T M r
    let mn = 0; // phi^T M phi
    for (let i = 0; i < n; i += 1) {
      const p = massNormalisedShape[i] / roof;
      shape[i] = p;
      l += masses[i] * p;
      mn += masses[i] * p * p;
    }
    const effectiveMass = (l * l) / mn;
    const effectiveMassRatio = effectiveMass / totalMass;
    cumulative += effectiveMassRatio;
    const circularFrequency = omegas?.[j] ?? Math.sqrt(omegaSquared);
    return {
      number: j + 1,
      circularFrequency,
      frequency: circularFrequency / (2 * Math.PI),
      period: (2 * Math.PI) / circularFrequency,
      shape,
      shapeNormalisation: byRoof ? 'roof' : 'largest',
      normalisationLevel: reference + 1,
      massNormalisedShape,
      participationFactor: l / mn,
      effectiveMass,
      effectiveMassRatio,
      cumulativeMassRatio: cumulative,
    };
  });
}
