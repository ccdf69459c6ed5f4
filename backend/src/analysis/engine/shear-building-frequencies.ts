import type { Storey } from './shear-building';

/**
 * The natural circular frequencies of a shear building to high relative accuracy: every omega_j
 * to a few units in the last place of its own size, however far apart the storeys' masses and
 * stiffnesses are, where an eigensolver on A = M^-1/2 K M^-1/2 is only accurate to
 * eps * ||A|| in omega^2 (so the low modes of a building with a very stiff or very light storey
 * lose digits in proportion to ||A|| / omega_1^2).
 *
 * The structure gives it: A = G^T G with G = diag(sqrt k) L M^-1/2, where L is the storey
 * difference operator ((L u)_i = u_i - u_{i-1}, u_0 = 0). G is lower bidiagonal,
 *   G_ii = sqrt(k_i / m_i),  G_(i+1),i = -sqrt(k_(i+1) / m_i),
 * so omega_j are its singular values. Each entry comes from the data with one rounding, and the
 * singular values of a bidiagonal matrix change only by O(n eps) relatively when its entries do
 * (Demmel & Kahan, "Accurate singular values of bidiagonal matrices", SIAM J. Sci. Stat. Comput.
 * 11(5), 1990). Bisection on the Golub-Kahan form of G (the 2n x 2n tridiagonal with a zero
 * diagonal and off-diagonals d_1, e_1, d_2, ..., d_n) with the Sturm count on the squared entries
 * keeps that relative accuracy (same paper, section on bisection; LAPACK's dbdsvdx takes this
 * route). The count reads only the squares k_i/m_i and k_(i+1)/m_i, so no square root rounds.
 *
 * Written here because no maintained npm package computes bidiagonal singular values (or any
 * tridiagonal eigenvalues) to relative accuracy.
 */

const EPS = Number.EPSILON;
/** Where bisection stops: the bracket's width over its lower end (about 450 eps). */
const RELATIVE_WIDTH = 1e-13;

/**
 * @param storeys checked already (assertStoreys)
 * @param estimates omega^2 ascending from an absolute-accuracy eigensolver on A, used only to
 *   bracket each value; every bracket is confirmed by Sturm counts before it is used
 * @param norm an upper bound of ||A|| (e.g. its infinity norm)
 * @returns omega_j ascending, rad/s
 */
export function shearBuildingFrequencies(
  storeys: readonly Storey[],
  estimates: readonly number[],
  norm: number,
): number[] {
  const { count, ceiling } = sturmCounts(storeys, norm);
  return estimates.map((estimate, j) => {
    const [lo, hi] = bracket(estimate, j, norm, ceiling, count);
    return middle(bisect(lo, hi, j, count));
  });
}

/**
 * The lowest `modes` frequencies alone, omega_1 first, to the same relative accuracy, by
 * bisection with Sturm counts from the bracket [omega_(j-1), sqrt(2 ||A||)], without solving for
 * the others: what a truncated analysis needs (O(modes n) work where all modes take O(n^2)).
 */
export function lowestFrequencies(
  storeys: readonly Storey[],
  modes: number,
  norm: number,
): number[] {
  const n = storeys.length;
  const { count, ceiling } = sturmCounts(storeys, norm);
  const omegas: number[] = [];
  // count(below) <= j holds: below is the lower end of omega_(j-1)'s final bracket, or zero.
  let below = 0;
  for (let j = 0; j < Math.min(modes, n); j += 1) {
    const final = bisect(below, ceiling, j, count);
    omegas.push(middle(final));
    below = final[0];
  }
  return omegas;
}

/**
 * The final bracket of sigma_j, from one with count(lo) <= j < count(hi). Bisects arithmetically where the
 * bracket is narrow, geometrically where it spans more than a factor of two (each step then halves
 * the exponent range), so a value far below the bracket's top still converges in relative terms.
 * It stops at RELATIVE_WIDTH: the data's own rounding moves the values by more than the last few
 * bisections would gain.
 */
function bisect(
  lo: number,
  hi: number,
  j: number,
  count: (sigma: number) => number,
): [number, number] {
  for (;;) {
    if (hi - lo <= RELATIVE_WIDTH * lo) break;
    const mid = lo === 0 ? hi * 1e-3 : hi > 2 * lo ? Math.sqrt(lo * hi) : lo + (hi - lo) / 2;
    if (!(mid > lo && mid < hi)) break;
    if (count(mid) > j) hi = mid;
    else lo = mid;
  }
  return [lo, hi];
}

/** The value a final bracket stands for. */
function middle([lo, hi]: [number, number]): number {
  return lo === 0 ? hi / 2 : lo + (hi - lo) / 2;
}

/**
 * The Sturm count of the building's frequencies below sigma, and sqrt(2 ||A||), above them all
 * (Gershgorin: every omega^2 is at most ||A||_inf).
 */
function sturmCounts(storeys: readonly Storey[], norm: number) {
  const n = storeys.length;
  const squares = golubKahanSquares(storeys);
  return {
    count: (sigma: number) => singularValuesBelow(squares, n, sigma),
    ceiling: Math.sqrt(2 * norm) || 1,
  };
}

/** The squared off-diagonals of the Golub-Kahan form: d_1^2, e_1^2, d_2^2, ..., d_n^2. */
function golubKahanSquares(storeys: readonly Storey[]): Float64Array {
  const n = storeys.length;
  const squares = new Float64Array(2 * n - 1);
  for (let i = 0; i < n; i += 1) {
    squares[2 * i] = storeys[i].stiffness / storeys[i].mass;
    if (i + 1 < n) squares[2 * i + 1] = storeys[i + 1].stiffness / storeys[i].mass;
  }
  return squares;
}

/**
 * How many singular values lie below sigma (> 0): the Golub-Kahan matrix T has eigenvalues
 * +-sigma_j, so the negative pivots of T - sigma I (Sturm's count) number n plus those below.
 */
function singularValuesBelow(squares: Float64Array, n: number, sigma: number): number {
  let q = -sigma;
  let negative = 1;
  for (let i = 0; i < squares.length; i += 1) {
    q = -sigma - squares[i] / q;
    // A zero pivot is taken as a tiny negative one: the count of a sigma perturbed by eps.
    if (q === 0) q = -EPS * sigma;
    if (q < 0) negative += 1;
  }
  return negative - n;
}

/** [lo, hi] with sigma_j in it, confirmed by counts: count(lo) <= j < count(hi). */
function bracket(
  estimate: number,
  j: number,
  norm: number,
  ceiling: number,
  count: (sigma: number) => number,
): [number, number] {
  let delta = 64 * EPS * norm;
  for (let attempt = 0; attempt < 12; attempt += 1) {
    const lo = Math.sqrt(Math.max(estimate - delta, 0));
    const hi = Math.sqrt(Math.max(estimate + delta, 0));
    if (hi > 0 && (lo === 0 || count(lo) <= j) && count(hi) > j) return [lo, hi];
    delta *= 16;
  }
  // Gershgorin: every omega^2 is at most ||A||_inf, so [0, sqrt(2 ||A||)] holds them all.
  return [0, ceiling];
}
