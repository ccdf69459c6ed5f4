import type { Storey } from '../shear-building';

/** A uniform building: every storey with mass m, stiffness k and height h. */
export function uniformBuilding(n: number, mass = 1e5, stiffness = 1e8, height = 3): Storey[] {
  return Array.from({ length: n }, () => ({ mass, stiffness, height }));
}

/** A deterministic pseudo-random generator (Park & Miller minimal standard), for repeatable tests. */
export function seededRandom(seed: number): () => number {
  let state = seed % 2147483647 || 1;
  return () => {
    state = (state * 16807) % 2147483647;
    return (state - 1) / 2147483646;
  };
}

/** Storey values spread over a factor of ten, as real buildings vary. */
export function randomBuilding(n: number, random: () => number): Storey[] {
  return Array.from({ length: n }, () => ({
    mass: 5e4 * (1 + 9 * random()),
    stiffness: 5e7 * (1 + 9 * random()),
    height: 2.8 + 2 * random(),
  }));
}

/**
 * Closed-form circular frequencies of a uniform N-storey shear building (fixed base, free top):
 * omega_j = 2 sqrt(k/m) sin((2j - 1) pi / (2 (2N + 1))), j = 1..N, the eigenvalues of the
 * fixed-free spring-mass chain (common practice; e.g. Chopra, Dynamics of Structures, chapter
 * 10 problems on uniform shear frames; from memory, and checked here against an independent
 * eigensolver as well).
 */
export function uniformFrequencies(n: number, mass: number, stiffness: number): number[] {
  return Array.from(
    { length: n },
    (_, j) =>
      2 * Math.sqrt(stiffness / mass) * Math.sin(((2 * j + 1) * Math.PI) / (2 * (2 * n + 1))),
  );
}

/**
 * An ill-conditioned building: storey values drawn log-uniformly over `ratio`, so neighbours
 * differ by up to that factor in mass and in stiffness.
 */
export function contrastedBuilding(n: number, ratio: number, seed: number): Storey[] {
  const random = seededRandom(seed);
  return Array.from({ length: n }, () => ({
    mass: 1e4 * ratio ** random(),
    stiffness: 1e7 * ratio ** random(),
    height: 3,
  }));
}
