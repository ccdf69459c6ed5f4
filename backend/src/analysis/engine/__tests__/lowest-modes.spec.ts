import type { AnalysisRequest } from '@tiermode/shared-types';
import { referenceOmega } from '../../../verification/sturm-reference';
import { analyse } from '../analyse';
import { lowestModes, naturalModes, type Mode } from '../modes';
import {
  contrastedBuilding,
  randomBuilding,
  seededRandom,
  uniformBuilding,
  uniformFrequencies,
} from './buildings';

// A truncated analysis solves only the modes it keeps (issue 16): bisection with Sturm counts
// for each frequency, inverse iteration for each vector. What it gives must be what solving all
// the modes and keeping the first few gives.

function expectSameModes(kept: readonly Mode[], all: readonly Mode[]): void {
  kept.forEach((mode, j) => {
    const full = all[j];
    expect(mode.number).toBe(full.number);
    expect(Math.abs(mode.circularFrequency / full.circularFrequency - 1)).toBeLessThan(1e-12);
    // Gamma = L / M_n carries meaningful digits only where the mode moves some mass: for a mode
    // with an effective mass of 1e-20 of the total (ill-conditioned buildings have many), L is a
    // sum that cancels to rounding noise in either solution. The mass ratios are compared for all.
    if (full.effectiveMassRatio > 1e-6) {
      expect(Math.abs(mode.participationFactor / full.participationFactor - 1)).toBeLessThan(1e-9);
    }
    expect(Math.abs(mode.effectiveMassRatio - full.effectiveMassRatio)).toBeLessThan(1e-12);
    expect(Math.abs(mode.cumulativeMassRatio - full.cumulativeMassRatio)).toBeLessThan(1e-12);
    expect(mode.normalisationLevel).toBe(full.normalisationLevel);
    const largest = Math.max(...full.shape.map(Math.abs));
    mode.shape.forEach((value, i) => {
      expect(Math.abs(value - full.shape[i])).toBeLessThan(1e-9 * largest);
    });
  });
}

const SPECTRUM: AnalysisRequest['spectrum'] = {
  points: [
    { period: 0, sa: 0.4 },
    { period: 0.15, sa: 1 },
    { period: 0.6, sa: 1 },
    { period: 8, sa: 0.075 },
  ],
};

describe('lowestModes: only the modes kept', () => {
  it('gives the first modeCount modes of the full solution, for ordinary and ill-conditioned buildings', () => {
    const buildings = [
      uniformBuilding(30),
      randomBuilding(80, seededRandom(7)),
      contrastedBuilding(60, 1e4, 12),
      Array.from({ length: 40 }, (_, i) => ({
        mass: i % 2 ? 1e1 : 1e5,
        stiffness: i % 2 ? 1e11 : 1e8,
        height: 3,
      })),
    ];
    for (const storeys of buildings) {
      const all = naturalModes(storeys);
      for (const modeCount of [1, 3, 10]) {
        const kept = lowestModes(storeys, { modeCount });
        expect(kept).toHaveLength(modeCount);
        expectSameModes(kept, all);
      }
    }
  });

  it('meets the closed form of the uniform building (Chopra, Dynamics of Structures, ch. 10 problems; from memory) and the 60-digit reference', () => {
    const storeys = uniformBuilding(200, 2e5, 3e8);
    const exact = uniformFrequencies(200, 2e5, 3e8);
    const kept = lowestModes(storeys, { modeCount: 5 });
    kept.forEach((mode, j) => {
      expect(Math.abs(mode.circularFrequency / exact[j] - 1)).toBeLessThan(1e-12);
      const reference = referenceOmega(storeys, j, mode.circularFrequency);
      expect(Math.abs(mode.circularFrequency / reference - 1)).toBeLessThan(1e-12);
    });
  });

  it('stops at the fewest modes reaching the mass target, as selecting from all modes does', () => {
    const storeys = randomBuilding(120, seededRandom(3));
    const all = naturalModes(storeys);
    for (const targetMassRatio of [0.5, 0.9, 0.95, 0.99, 1]) {
      const kept = lowestModes(storeys, { targetMassRatio });
      const expected = all.findIndex((m) => m.cumulativeMassRatio >= targetMassRatio - 1e-12) + 1;
      expect(kept).toHaveLength(expected || all.length);
      expectSameModes(kept, all);
    }
  });

  it('refuses a selection the building cannot give, naming the field', () => {
    const storeys = uniformBuilding(4);
    expect(() => lowestModes(storeys, { modeCount: 5 })).toThrow(
      'modeCount must be a whole number from 1 to 4 (the number of storeys)',
    );
    expect(() => lowestModes(storeys, { modeCount: 1.5 })).toThrow(/modeCount must be/);
    expect(() => lowestModes(storeys, { targetMassRatio: 1.2 })).toThrow(
      'targetMassRatio must be greater than 0 and at most 1',
    );
  });
});

describe('analyse with a mass target or a mode count', () => {
  it('gives the results of solving every mode and keeping the first few', () => {
    const storeys = randomBuilding(150, seededRandom(21));
    for (const selection of [{ targetMassRatio: 0.9 }, { modeCount: 12 }]) {
      const request: AnalysisRequest = {
        storeys,
        spectrum: SPECTRUM,
        dampingRatio: 0.05,
        ...selection,
      };
      const truncated = analyse(request);
      const everyMode = analyse(request, naturalModes);
      expect(truncated.availableModes).toBe(150);
      expect(truncated.modes).toHaveLength(everyMode.modes.length);
      expect(truncated.warnings).toEqual(everyMode.warnings);
      for (const method of ['srss', 'cqc', 'abs'] as const) {
        const a = truncated.combined[method];
        const b = everyMode.combined[method];
        expect(Math.abs(a.baseShear / b.baseShear - 1)).toBeLessThan(1e-9);
        a.storeyShear.forEach((v, i) => {
          expect(Math.abs(v - b.storeyShear[i])).toBeLessThan(1e-9 * b.baseShear);
        });
        a.displacement.forEach((v, i) => {
          expect(Math.abs(v - b.displacement[i])).toBeLessThan(1e-9 * Math.max(...b.displacement));
        });
      }
    }
  });

  it('solves all modes when none is set (the default)', () => {
    const storeys = randomBuilding(25, seededRandom(5));
    const result = analyse({ storeys, spectrum: SPECTRUM, dampingRatio: 0.05 });
    expect(result.modes).toHaveLength(25);
    expect(result.modes[24].cumulativeMassRatio).toBeCloseTo(1, 12);
  });
});
