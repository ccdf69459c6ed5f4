/** What the benchmarks share: the building they time and the timing itself. */
import type { Storey } from '../src/analysis/engine/shear-building';

/** A building of n storeys, mass and stiffness tapering up the height as in a real tower. */
export function building(n: number): Storey[] {
  return Array.from({ length: n }, (_, i) => ({
    mass: 4e5 * (1 - (0.4 * i) / n),
    stiffness: 8e8 * (1 - (0.6 * i) / n),
    height: i === 0 ? 4.5 : 3.5,
  }));
}

export function median(values: number[]): number {
  const sorted = [...values].sort((x, y) => x - y);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/**
 * The median of `repetitions` timed runs, after `warmUp` untimed ones: V8 compiles a function in
 * tiers as it gets hot, so the first few runs measure the compiler rather than the engine.
 */
export function time(run: () => void, repetitions: number, warmUp = 10): number {
  for (let w = 0; w < warmUp; w += 1) run();
  const samples: number[] = [];
  for (let r = 0; r < repetitions; r += 1) {
    const start = performance.now();
    run();
    samples.push(performance.now() - start);
  }
  return median(samples);
}

export const round = (ms: number) => Math.round(ms * 100) / 100;
