/**
 * Combining modal maxima (method.md, "Combining modal maxima"). Each response quantity is
 * combined on its own, from the modal values of that quantity.
 */

/**
 * The CQC correlation coefficient for equal modal damping zeta and beta = omega_j / omega_i:
 * rho_ij = 8 zeta^2 (1 + beta) beta^(3/2) / ((1 - beta^2)^2 + 4 zeta^2 beta (1 + beta)^2).
 * Source: Der Kiureghian, "Structural response to stationary excitation", J. Eng. Mech. Div.
 * ASCE 106 (1980); Wilson, Der Kiureghian & Bayo, Earthquake Eng. Struct. Dyn. 9 (1981) 187-194.
 */
export function correlationCoefficient(omegaI: number, omegaJ: number, zeta: number): number {
  if (!(omegaI > 0) || !(omegaJ > 0) || !Number.isFinite(omegaI) || !Number.isFinite(omegaJ)) {
    throw new RangeError('circular frequencies must be positive numbers');
  }
  if (!(zeta > 0 && zeta < 1)) throw new RangeError('dampingRatio must be between 0 and 1');
  const beta = omegaJ / omegaI;
  const z2 = zeta * zeta;
  const num = 8 * z2 * (1 + beta) * beta ** 1.5;
  const den = (1 - beta * beta) ** 2 + 4 * z2 * beta * (1 + beta) ** 2;
  return num / den;
}

/** rho_ij for every pair of the given modes; symmetric with ones on the diagonal. */
export function correlationMatrix(
  circularFrequencies: readonly number[],
  zeta: number,
): number[][] {
  const n = circularFrequencies.length;
  const rho: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i += 1) {
    rho[i][i] = 1;
    for (let j = i + 1; j < n; j += 1) {
      const value = correlationCoefficient(circularFrequencies[i], circularFrequencies[j], zeta);
      rho[i][j] = value;
      rho[j][i] = value;
    }
  }
  return rho;
}

/** Mode n's values of every response quantity side by side: modal[n][k]. */
export type ModalRows = readonly ArrayLike<number>[];

/** SRSS (Rosenblueth): r = sqrt(sum r_n^2), per entry; modal[n][k] is mode n's value at k. */
export function combineSrss(modal: ModalRows): number[] {
  const width = modal[0]?.length ?? 0;
  const out = new Array<number>(width).fill(0);
  for (const row of modal) for (let k = 0; k < width; k += 1) out[k] += row[k] * row[k];
  return out.map(Math.sqrt);
}

/** ABS: the sum of absolute modal values, an upper bound shown for comparison only. */
export function combineAbs(modal: ModalRows): number[] {
  const width = modal[0]?.length ?? 0;
  const out = new Array<number>(width).fill(0);
  for (const row of modal) for (let k = 0; k < width; k += 1) out[k] += Math.abs(row[k]);
  return out;
}

/**
 * CQC: r = sqrt(sum_i sum_j rho_ij r_i r_j), per entry. For each entry k the modal values v = r[., k]
 * are gathered into one contiguous vector and r^2 = sum_i v_i (v_i + 2 sum_{j>i} rho_ij v_j): each
 * pair once, as dot products over rows of rho, which JavaScript runs several times faster than
 * the same sum taken pair by pair across all entries. A sum that rounding leaves a hair below zero
 * is read as zero.
 */
export function combineCqc(modal: ModalRows, rho: readonly (readonly number[])[]): number[] {
  const modes = modal.length;
  const width = modal[0]?.length ?? 0;
  const rhoFlat = new Float64Array(modes * modes);
  for (let i = 0; i < modes; i += 1) rhoFlat.set(rho[i], i * modes);
  const v = new Float64Array(modes);
  const out = new Array<number>(width);
  for (let k = 0; k < width; k += 1) {
    for (let i = 0; i < modes; i += 1) v[i] = modal[i][k];
    let sum = 0;
    for (let i = 0; i < modes; i += 1) {
      const base = i * modes;
      // Four partial sums let the loop run without waiting on one accumulator.
      let d0 = 0;
      let d1 = 0;
      let d2 = 0;
      let d3 = 0;
      let j = i + 1;
      for (; j + 3 < modes; j += 4) {
        d0 += rhoFlat[base + j] * v[j];
        d1 += rhoFlat[base + j + 1] * v[j + 1];
        d2 += rhoFlat[base + j + 2] * v[j + 2];
        d3 += rhoFlat[base + j + 3] * v[j + 3];
      }
      for (; j < modes; j += 1) d0 += rhoFlat[base + j] * v[j];
      sum += v[i] * (v[i] + 2 * (d0 + d1 + d2 + d3));
    }
    out[k] = Math.sqrt(Math.max(0, sum));
  }
  return out;
}
