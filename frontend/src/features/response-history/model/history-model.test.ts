import { describe, expect, it } from 'vitest';
import {
  elevationsOf,
  frameAt,
  largestShift,
  levelsAt,
  peakInG,
  recordInG,
  startDisplacements,
} from './history-model';

describe('response history model', () => {
  it('reads a record in g from any units (g = 9.80665 m/s^2, CGPM 1901)', () => {
    const record = {
      timeStep: 0.01,
      units: 'cm/s2' as const,
      accelerations: [0, 980.665, -490.3325],
    };
    expect(recordInG(record)).toEqual([0, 1, -0.5].map((x) => expect.closeTo(x, 12) as number));
    expect(peakInG({ ...record, units: 'm/s2' })).toBeCloseTo(100, 9);
  });

  it('starts a free vibration from a mode shape times the amplitude, or the shape given', () => {
    const shapes = [
      [0.5, 1],
      [-1.6, 1],
    ];
    expect(startDisplacements({ kind: 'mode', mode: 2, amplitude: 0.05 }, shapes)).toEqual([
      expect.closeTo(-0.08, 12),
      0.05,
    ]);
    expect(startDisplacements({ kind: 'mode', mode: 3, amplitude: 0.05 }, shapes)).toBeNull();
    expect(startDisplacements({ kind: 'shape', displacements: [0.01, 0.02] }, shapes)).toEqual([
      0.01, 0.02,
    ]);
  });

  it('finds the frame at a time, and the extent of the motion', () => {
    const times = [0, 0.1, 0.2, 0.3];
    expect(frameAt(times, 0)).toBe(0);
    expect(frameAt(times, 0.15)).toBe(1);
    expect(frameAt(times, 0.3)).toBe(3);
    expect(frameAt(times, 9)).toBe(3);
    const u = [
      [0, 0.1, -0.3],
      [0, 0.2, 0.25],
    ];
    expect(largestShift(u)).toBe(0.3);
    expect(levelsAt(u, 2)).toEqual([-0.3, 0.25]);
  });

  it('stacks the storey heights into level elevations', () => {
    const storeys = [4, 3.5, 3.5].map((height) => ({ mass: 1, stiffness: 1, height }));
    expect(elevationsOf(storeys)).toEqual([4, 7.5, 11]);
  });
});
