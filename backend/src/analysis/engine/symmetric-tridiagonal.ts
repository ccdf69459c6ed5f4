/**
 * Eigenvalues and eigenvectors of a real symmetric tridiagonal matrix.
 *
 * Written here rather than taken from npm because the general eigensolvers there (mathjs `eigs`,
 * ml-matrix's dense decomposition) are O(n^3) on the full matrix and miss the speed target by one
 * to three orders of magnitude (see `npm run bench`), and no maintained npm package offers the
 * tridiagonal algorithms LAPACK has.
 *
 * Eigenvalues: the implicit QL algorithm with Wilkinson's shift, without accumulating vectors
 * (Bowdler, Martin, Reinsch & Wilkinson, "The QR and QL algorithms for symmetric matrices",
 * in Wilkinson & Reinsch, Handbook for Automatic Computation vol. II, 1971, procedure tql1).
 * Eigenvectors: inverse iteration on the tridiagonal matrix with partial pivoting, with
 * reorthogonalisation inside clusters of close eigenvalues (the method of LAPACK's dstein, with
 * a tighter cluster rule: see tridiagonalEigenvectors).
 * Both are O(n^2) in all, against O(n^3) for accumulating the QL rotations.
 */
export interface TridiagonalEigen {
  /** Ascending. */
  values: number[];
  /**
   * vectors[j] is the unit eigenvector of values[j]: views into one typed block, which the
   * garbage collector never has to copy (it is hundreds of thousands of numbers for a tall building).
   */
  vectors: Float64Array[];
}

const EPS = Number.EPSILON;
const MAX_QL_ITERATIONS = 60;
/**
 * From an eigenvalue accurate to eps*norm one solve already reduces every other component by
 * gap/(eps*norm); the second is the extra step dstein takes after its growth test passes.
 */
const INVERSE_ITERATIONS = 2;

/**
 * @param diagonal a_1..a_n
 * @param offDiagonal b_1..b_{n-1}, the entries beside the diagonal
 */
export function symmetricTridiagonalEigen(
  diagonal: readonly number[],
  offDiagonal: readonly number[],
): TridiagonalEigen {
  const n = diagonal.length;
  if (n < 1) throw new RangeError('diagonal must have at least one entry');
  if (offDiagonal.length !== n - 1) {
    throw new RangeError(`offDiagonal must have ${n - 1} entries (got ${offDiagonal.length})`);
  }
  if (![...diagonal, ...offDiagonal].every(Number.isFinite)) {
    throw new RangeError('the matrix entries must be finite numbers');
  }
  const values = symmetricTridiagonalEigenvalues(diagonal, offDiagonal);
  const vectors = tridiagonalEigenvectors(diagonal, offDiagonal, values);
  return { values, vectors };
}

/** The infinity norm of the symmetric tridiagonal matrix (largest absolute row sum). */
export function tridiagonalNorm(
  diagonal: readonly number[],
  offDiagonal: readonly number[],
): number {
  const n = diagonal.length;
  let norm = 0;
  // Reads stay inside the arrays, which V8 needs to keep this loop fast.
  for (let i = 0; i < n; i += 1) {
    const before = i > 0 ? Math.abs(offDiagonal[i - 1]) : 0;
    const after = i < n - 1 ? Math.abs(offDiagonal[i]) : 0;
    norm = Math.max(norm, Math.abs(diagonal[i]) + before + after);
  }
  return norm;
}

/**
 * sqrt(a^2 + b^2) without overflow or underflow: the plain formula where the squares are safely
 * in range (Math.hypot is several times slower in V8, and this sits in the innermost QL loop).
 */
function radius(a: number, b: number): number {
  const squares = a * a + b * b;
  return squares > 1e-290 && squares < 1e290 ? Math.sqrt(squares) : Math.hypot(a, b);
}

/** The eigenvalues alone, ascending (accurate to about eps * ||T|| each). */
export function symmetricTridiagonalEigenvalues(
  diagonal: readonly number[],
  offDiagonal: readonly number[],
): number[] {
  const n = diagonal.length;
  const d = Float64Array.from(diagonal);
  const e = new Float64Array(n);
  e.set(offDiagonal);
  for (let l = 0; l < n; l += 1) {
    let iterations = 0;
    let m: number;
    do {
      for (m = l; m < n - 1; m += 1) {
        const dd = Math.abs(d[m]) + Math.abs(d[m + 1]);
        if (Math.abs(e[m]) <= EPS * dd) break;
      }
      if (m !== l) {
        if (iterations++ === MAX_QL_ITERATIONS) {
          throw new RangeError('the eigenvalue iteration did not converge');
        }
        let g = (d[l + 1] - d[l]) / (2 * e[l]);
        let r = radius(g, 1);
        g = d[m] - d[l] + e[l] / (g + (g >= 0 ? Math.abs(r) : -Math.abs(r)));
        let s = 1;
        let c = 1;
        let p = 0;
        let i: number;
        for (i = m - 1; i >= l; i -= 1) {
          const f = s * e[i];
          const b = c * e[i];
          r = radius(f, g);
          e[i + 1] = r;
          if (r === 0) {
            d[i + 1] -= p;
            e[m] = 0;
            break;
          }
          s = f / r;
          c = g / r;
          g = d[i + 1] - p;
          r = (d[i] - g) * s + 2 * c * b;
          p = s * r;
          d[i + 1] = g + p;
          g = c * r - b;
        }
        if (r === 0 && i >= l) continue;
        d[l] -= p;
        e[l] = g;
        e[m] = 0;
      }
    } while (m !== l);
  }
  return Array.from(d).sort((a, b) => a - b);
}

/**
 * Unit eigenvectors for the given eigenvalues (ascending), by inverse iteration; the more
 * accurate the values, the better the vectors.
 *
 * With `rootWeights` (sqrt of the diagonal of a positive diagonal W) the matrix given is T of the
 * pencil T v = lambda W v, and the vectors returned are the unit x = W^1/2 v: the eigenvectors of
 * W^-1/2 T W^-1/2 as before, but each solve factors T - lambda W itself. Its rounding is then
 * relative to the size of T and W, not to that of W^-1/2 T W^-1/2, which a very light level of a
 * building (a tiny w_i) makes huge; the vectors of the low modes keep their digits.
 */
export function tridiagonalEigenvectors(
  diagonal: readonly number[],
  offDiagonal: readonly number[],
  values: readonly number[],
  rootWeights?: readonly number[],
): Float64Array[] {
  const n = diagonal.length;
  if (n === 1) return values.map(() => Float64Array.of(1));
  const weights = Float64Array.from(rootWeights ?? diagonal.map(() => 1), (r) => r * r);
  const solverNorm = tridiagonalNorm(diagonal, offDiagonal);
  // The scale of the standard-form matrix that sets the cluster rule: its norm, or for a pencil
  // the pencil's norm over a typical weight (the median), which a few tiny weights do not inflate.
  const sortedWeights = Float64Array.from(weights).sort();
  const norm = rootWeights ? solverNorm / sortedWeights[n >> 1] : solverNorm;
  // Inverse iteration from an eigenvalue accurate to eps*norm gives a vector whose angle to its
  // neighbours' is about eps*norm/gap. Vectors whose eigenvalues lie closer than 1e-6*norm are
  // reorthogonalised, so the loss of orthogonality stays below about 1e-10. (dstein uses the
  // stricter 1e-3*norm, which turns the many close eigenvalues of a tall uniform building into
  // one large cluster and the work into O(n^3).)
  const clusterGap = 1e-6 * norm;
  const solver = new ShiftedTridiagonalSolver(diagonal, offDiagonal, weights, solverNorm);
  // One vector per value given: all n, or the lowest few of a truncated analysis.
  const block = new Float64Array(values.length * n);
  const vectors: Float64Array[] = [];
  let clusterStart = 0;
  for (let j = 0; j < values.length; j += 1) {
    if (j > 0 && values[j] - values[j - 1] > clusterGap) clusterStart = j;
    // Perturb equal eigenvalues apart so each gets its own vector (dstein does the same).
    const shift =
      j > clusterStart && values[j] - values[j - 1] < 10 * EPS * norm
        ? values[j - 1] + 10 * EPS * norm
        : values[j];
    solver.factor(shift);
    const x = block.subarray(j * n, (j + 1) * n);
    startingVector(x, j);
    for (let iteration = 0; iteration < INVERSE_ITERATIONS; iteration += 1) {
      if (rootWeights) {
        // (A - lambda I)^-1 x = W^1/2 (T - lambda W)^-1 W^1/2 x
        for (let i = 0; i < n; i += 1) x[i] *= rootWeights[i];
        solver.solveInPlace(x);
        for (let i = 0; i < n; i += 1) x[i] *= rootWeights[i];
      } else {
        solver.solveInPlace(x);
      }
      for (let k = clusterStart; k < j; k += 1) subtractProjection(x, vectors[k]);
      normalise(x);
    }
    vectors.push(x);
  }
  return vectors;
}

/** A deterministic start with no special relation to any eigenvector. */
function startingVector(x: Float64Array, seed: number): void {
  const n = x.length;
  let state = (seed * 2654435761 + 12345) >>> 0;
  for (let i = 0; i < n; i += 1) {
    state = (state * 1664525 + 1013904223) >>> 0;
    x[i] = 0.5 + state / 2 ** 32;
  }
}

function subtractProjection(x: Float64Array, unit: Float64Array): void {
  let dot = 0;
  for (let i = 0; i < x.length; i += 1) dot += x[i] * unit[i];
  for (let i = 0; i < x.length; i += 1) x[i] -= dot * unit[i];
}

function normalise(x: Float64Array): void {
  let sum = 0;
  for (let i = 0; i < x.length; i += 1) sum += x[i] * x[i];
  if (!(sum > 1e-290 && sum < 1e290)) {
    // Out of the range where squares are safe: scale by the largest entry first.
    let largest = 0;
    for (let i = 0; i < x.length; i += 1) largest = Math.max(largest, Math.abs(x[i]));
    if (largest === 0 || !Number.isFinite(largest)) {
      throw new RangeError('inverse iteration produced a zero or unbounded vector');
    }
    for (let i = 0; i < x.length; i += 1) x[i] /= largest;
    sum = 0;
    for (let i = 0; i < x.length; i += 1) sum += x[i] * x[i];
  }
  const factor = 1 / Math.sqrt(sum);
  for (let i = 0; i < x.length; i += 1) x[i] *= factor;
}

/**
 * LU factors, with row interchanges, of T - shift W for a symmetric tridiagonal T and a positive
 * diagonal W (the identity for the standard problem); a zero pivot
 * is replaced by a tiny one, as inverse iteration wants (the solve then grows the eigenvector).
 */
class ShiftedTridiagonalSolver {
  private readonly n: number;
  private readonly u1: Float64Array; // diagonal of U
  private readonly u2: Float64Array; // first superdiagonal of U
  private readonly u3: Float64Array; // second superdiagonal of U (from interchanges)
  private readonly multipliers: Float64Array;
  private readonly swapped: Uint8Array;
  /** 1 / the diagonal of U, a pivot below `tiny` taken as `tiny`: the solve then multiplies. */
  private readonly inversePivots: Float64Array;
  private readonly tiny: number;

  constructor(
    private readonly diagonal: readonly number[],
    private readonly offDiagonal: readonly number[],
    private readonly weights: Float64Array,
    norm: number,
  ) {
    this.n = diagonal.length;
    this.u1 = new Float64Array(this.n);
    this.u2 = new Float64Array(this.n);
    this.u3 = new Float64Array(this.n);
    this.multipliers = new Float64Array(this.n);
    this.swapped = new Uint8Array(this.n);
    this.inversePivots = new Float64Array(this.n);
    this.tiny = EPS * norm || EPS;
  }

  factor(shift: number): void {
    const { n, u1, u2, u3, multipliers, swapped, diagonal, offDiagonal, weights } = this;
    // Row i of the working matrix: [a, b, c] in columns i, i+1, i+2.
    let a = diagonal[0] - shift * weights[0];
    let b = n > 1 ? offDiagonal[0] : 0;
    let c = 0;
    for (let i = 0; i < n - 1; i += 1) {
      const below = offDiagonal[i]; // T[i+1][i]
      const nextDiagonal = diagonal[i + 1] - shift * weights[i + 1];
      const nextUpper = i + 1 < n - 1 ? offDiagonal[i + 1] : 0;
      if (Math.abs(a) >= Math.abs(below)) {
        swapped[i] = 0;
        const pivot = a === 0 ? this.tiny : a;
        const l = below / pivot;
        multipliers[i] = l;
        u1[i] = pivot;
        u2[i] = b;
        u3[i] = c;
        a = nextDiagonal - l * b;
        b = nextUpper - l * c;
        c = 0;
      } else {
        swapped[i] = 1;
        const l = a / below;
        multipliers[i] = l;
        u1[i] = below;
        u2[i] = nextDiagonal;
        u3[i] = nextUpper;
        const newA = b - l * nextDiagonal;
        const newB = c - l * nextUpper;
        a = newA;
        b = newB;
        c = 0;
      }
    }
    u1[n - 1] = a === 0 ? this.tiny : a;
    // Divisions here are independent of each other and overlap; in the solve they would not.
    const { inversePivots, tiny } = this;
    for (let i = 0; i < n; i += 1) inversePivots[i] = 1 / (Math.abs(u1[i]) < tiny ? tiny : u1[i]);
  }

  /** Overwrites y with (T - shift W)^-1 y. */
  solveInPlace(y: Float64Array): void {
    const { n, u2, u3, multipliers, swapped, inversePivots } = this;
    for (let i = 0; i < n - 1; i += 1) {
      if (swapped[i]) {
        const t = y[i];
        y[i] = y[i + 1];
        y[i + 1] = t - multipliers[i] * y[i];
      } else {
        y[i + 1] -= multipliers[i] * y[i];
      }
    }
    y[n - 1] *= inversePivots[n - 1];
    if (n > 1) y[n - 2] = (y[n - 2] - u2[n - 2] * y[n - 1]) * inversePivots[n - 2];
    for (let i = n - 3; i >= 0; i -= 1) {
      y[i] = (y[i] - u2[i] * y[i + 1] - u3[i] * y[i + 2]) * inversePivots[i];
    }
  }
}
