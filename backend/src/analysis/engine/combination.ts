import { CQC_KERNEL_WASM_BASE64 } from './cqc-kernel.wasm';

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
  // Checked once here, so the pair loop below can use the formula without re-checking.
  circularFrequencies.forEach((omega) => correlationCoefficient(omega, omega, zeta));
  const z2 = zeta * zeta;
  const rho: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i += 1) {
    rho[i][i] = 1;
    for (let j = i + 1; j < n; j += 1) {
      // The formula of correlationCoefficient, with beta^(3/2) as beta sqrt(beta).
      const beta = circularFrequencies[j] / circularFrequencies[i];
      const onePlusBeta = 1 + beta;
      const oneMinusBeta2 = 1 - beta * beta;
      const value =
        (8 * z2 * onePlusBeta * beta * Math.sqrt(beta)) /
        (oneMinusBeta2 * oneMinusBeta2 + 4 * z2 * beta * onePlusBeta * onePlusBeta);
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

/** The next multiple of four: the kernel below works on tiles of four rows. */
export const paddedToFour = (n: number): number => (n + 3) & ~3;

/**
 * Strict-upper products of `count` row-major blocks, each `rows` x `stride` (multiples of four),
 * against the symmetric correlation matrix rho (modes x modes, modes <= stride): `fill` writes the
 * rows of each block x_c (all zero beforehand, so padding stays zero), and the result t_c has
 * t_i = sum_{j<i} rho_ij x_j for every row x of x_c, i.e. x_c times the strict upper triangle of
 * rho. Then x^T rho x = sum_i x_i (x_i + 2 t_i) (see cqcOfRow), each pair of modes counted once.
 * The blocks live in the kernel's scratch memory and are overwritten by the next call.
 *
 * CQC of N storey quantities over N modes is N^3 / 2 multiply-adds, the bulk of a tall
 * building's analysis, so this runs as a small WebAssembly kernel with 128-bit SIMD
 * (cqc-kernel.wat): about three times the speed of the best blocked JavaScript measured here,
 * and no maintained npm package offers a dense Float64Array product for Node without native code.
 * Writing the blocks straight into the kernel's memory also spares the garbage collector several
 * megabytes of typed arrays per analysis of a tall building.
 */
export function strictUpperProducts(
  count: number,
  rows: number,
  stride: number,
  rho: readonly (readonly number[])[],
  fill: (blocks: Float64Array[]) => void,
): { x: Float64Array[]; t: Float64Array[] } {
  if (rows % 4 !== 0 || stride % 4 !== 0 || rho.length > stride) {
    throw new RangeError('strictUpperProducts needs blocks padded to fours, as wide as rho');
  }
  const kernel = cqcKernel();
  const block = rows * stride;
  const rhoDoubles = stride * stride;
  const doubles = rhoDoubles + 2 * count * block;
  const pages = Math.ceil((doubles * 8) / WASM_PAGE_BYTES);
  const current = kernel.memory.buffer.byteLength / WASM_PAGE_BYTES;
  if (pages > current) kernel.memory.grow(pages - current);
  const heap = new Float64Array(kernel.memory.buffer, 0, doubles);
  heap.fill(0, 0, rhoDoubles + count * block);
  rho.forEach((row, i) => heap.set(row, i * stride));
  const view = (c: number) => heap.subarray(rhoDoubles + c * block, rhoDoubles + (c + 1) * block);
  const x = Array.from({ length: count }, (_, c) => view(c));
  const t = Array.from({ length: count }, (_, c) => view(count + c));
  fill(x);
  for (let c = 0; c < count; c += 1) {
    const xAt = (rhoDoubles + c * block) * 8;
    const tAt = (rhoDoubles + (count + c) * block) * 8;
    kernel.strictUpperProducts(xAt, rows, stride, 0, tAt);
  }
  return { x, t };
}

const WASM_PAGE_BYTES = 65536;

interface CqcKernel {
  memory: WebAssembly.Memory;
  strictUpperProducts(x: number, rows: number, stride: number, rho: number, t: number): void;
}

let kernelInstance: CqcKernel | undefined;

/** Compiled on first use (under a millisecond; the module is under 1 kB). */
function cqcKernel(): CqcKernel {
  if (!kernelInstance) {
    const bytes = Uint8Array.from(atob(CQC_KERNEL_WASM_BASE64), (c) => c.charCodeAt(0));
    const instance = new WebAssembly.Instance(new WebAssembly.Module(bytes), {});
    kernelInstance = instance.exports as unknown as CqcKernel;
  }
  return kernelInstance;
}

/**
 * sqrt(x^T rho x) for the row of `x` starting at `offset`, from its strict-upper products `t`
 * (same offset); a sum that rounding leaves a hair below zero is read as zero.
 */
export function cqcOfRow(
  x: ArrayLike<number>,
  t: ArrayLike<number>,
  offset: number,
  width: number,
): number {
  let sum = 0;
  for (let i = offset; i < offset + width; i += 1) sum += x[i] * (x[i] + 2 * t[i]);
  return Math.sqrt(Math.max(0, sum));
}

/**
 * CQC: r = sqrt(sum_i sum_j rho_ij r_i r_j), per entry, each entry combined from its own modal
 * values (modal[n][k] is mode n's value at k).
 */
export function combineCqc(modal: ModalRows, rho: readonly (readonly number[])[]): number[] {
  const modes = modal.length;
  const width = modal[0]?.length ?? 0;
  const stride = paddedToFour(modes);
  const { x, t } = strictUpperProducts(1, paddedToFour(width), stride, rho, ([block]) => {
    // One row per entry, the modes along it.
    modal.forEach((row, n) => {
      for (let k = 0; k < width; k += 1) block[k * stride + n] = row[k];
    });
  });
  return Array.from({ length: width }, (_, k) => cqcOfRow(x[0], t[0], k * stride, stride));
}
