import { isArray } from './guards';
/**
 * The planar shear building (method.md, "Model"). Storeys are numbered 1..N from the base up;
 * index 0 of every array is storey 1 / level 1. Storey i lies between level i-1 (level 0 is the
 * ground) and level i, with lateral stiffness k_i (N/m) and height h_i (m); level i carries the
 * lumped mass m_i (kg).
 */
export interface Storey {
  /** kg */
  mass: number;
  /** N/m */
  stiffness: number;
  /** m */
  height: number;
}

export const MAX_STOREYS = 500;

/**
 * Checks a storey table: 1 to MAX_STOREYS storeys, each mass, stiffness and height a finite
 * number > 0. Throws TypeError or RangeError naming the field and the storey.
 */
export function assertStoreys(storeys: readonly Storey[]): void {
  if (!isArray(storeys)) throw new TypeError('storeys must be an array');
  if (storeys.length < 1 || storeys.length > MAX_STOREYS) {
    throw new RangeError(`storeys must have 1 to ${MAX_STOREYS} storeys (got ${storeys.length})`);
  }
  storeys.forEach((storey, i) => {
    for (const field of ['mass', 'stiffness', 'height'] as const) {
      const value: unknown = storey?.[field];
      if (typeof value !== 'number') {
        throw new TypeError(`storeys[${i}].${field} (storey ${i + 1}) must be a number`);
      }
      if (!Number.isFinite(value) || value <= 0) {
        throw new RangeError(`storeys[${i}].${field} (storey ${i + 1}) must be a positive number`);
      }
    }
  });
}

/** The symmetric tridiagonal stiffness matrix as its diagonal and off-diagonal. */
export interface Tridiagonal {
  /** K_ii = k_i + k_{i+1} (k_{N+1} = 0) */
  diagonal: number[];
  /** K_{i,i+1} = K_{i+1,i} = -k_{i+1}; length N-1 */
  offDiagonal: number[];
}

/**
 * K of the shear building: K_ii = k_i + k_{i+1} with k_{N+1} = 0, K_{i,i+1} = -k_{i+1}
 * (Chopra, Dynamics of Structures, chapter 9, the shear-building stiffness matrix).
 */
export function stiffnessTridiagonal(storeys: readonly Storey[]): Tridiagonal {
  assertStoreys(storeys);
  const n = storeys.length;
  const diagonal = storeys.map((s, i) => s.stiffness + (i + 1 < n ? storeys[i + 1].stiffness : 0));
  const offDiagonal = storeys.slice(1).map((s) => -s.stiffness);
  return { diagonal, offDiagonal };
}

/** K as a dense matrix, for showing the method on small buildings. */
export function stiffnessMatrix(storeys: readonly Storey[]): number[][] {
  const { diagonal, offDiagonal } = stiffnessTridiagonal(storeys);
  return diagonal.map((d, i) =>
    diagonal.map((_, j) => (i === j ? d : Math.abs(i - j) === 1 ? offDiagonal[Math.min(i, j)] : 0)),
  );
}

/** M = diag(m_1..m_N) as a dense matrix, for showing the method on small buildings. */
export function massMatrix(storeys: readonly Storey[]): number[][] {
  assertStoreys(storeys);
  return storeys.map((s, i) => storeys.map((_, j) => (i === j ? s.mass : 0)));
}

/** Elevation of each level above the ground: H_i = h_1 + ... + h_i (m). */
export function levelElevations(storeys: readonly Storey[]): number[] {
  let elevation = 0;
  return storeys.map((s) => (elevation += s.height));
}
