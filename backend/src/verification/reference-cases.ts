import { correlationMatrix } from '../analysis/engine/combination';
import { analyse } from '../analysis/engine/analyse';
import { STANDARD_GRAVITY } from '../analysis/engine/modal-response';
import { naturalModes } from '../analysis/engine/modes';
import type { Storey } from '../analysis/engine/shear-building';
import { PUBLISHED_CASES } from './published-cases';

/** A reference case: its source, its inputs in words, and the values to compare. */
export interface ReferenceCase {
  id: string;
  title: string;
  source: string;
  inputs: string[];
  /** Relative tolerance (absolute where the expected value is 0). */
  tolerance: number;
  /** A value may carry its own tolerance, e.g. a source that gives only four figures. */
  values: () => { quantity: string; expected: number; computed: number; tolerance?: number }[];
}

const uniform = (n: number, mass: number, stiffness: number): Storey[] =>
  Array.from({ length: n }, () => ({ mass, stiffness, height: 3 }));

/**
 * The reference cases the engine is held to. The Verification page and the Jest suite
 * (reference-cases.spec.ts) both read this list, so what users see is what CI checks.
 */
export const REFERENCE_CASES: ReferenceCase[] = [
  {
    id: 'uniform-shear-building-closed-form',
    title: 'Uniform 10-storey shear building: closed-form frequencies',
    source:
      'Closed form of the fixed-free spring-mass chain, omega_j = 2 sqrt(k/m) sin((2j-1) pi / (2(2N+1))): common practice (e.g. Chopra, Dynamics of Structures, chapter 10 problems on uniform shear frames; from memory)',
    inputs: ['N = 10 storeys', 'm = 100 t per level', 'k = 200 MN/m per storey'],
    tolerance: 1e-10,
    values: () => {
      const modes = naturalModes(uniform(10, 1e5, 2e8));
      return [1, 2, 3, 10].map((j) => ({
        quantity: `omega_${j} (rad/s)`,
        expected: 2 * Math.sqrt(2e8 / 1e5) * Math.sin(((2 * j - 1) * Math.PI) / (2 * 21)),
        computed: modes[j - 1].circularFrequency,
      }));
    },
  },
  {
    id: 'two-storey-frame',
    title: 'Two-storey frame, m1 = 2m, m2 = m, k1 = 2k, k2 = k',
    source:
      'Chopra, Dynamics of Structures, chapter 10 (free vibration of MDF systems), two-storey shear frame example: omega^2 = k/2m and 2k/m, shapes [1/2, 1] and [-1, 1]',
    inputs: ['m = 100 t', 'k = 200 MN/m', 'm1 = 2m, m2 = m, k1 = 2k, k2 = k'],
    tolerance: 1e-12,
    values: () => {
      const m = 1e5;
      const k = 2e8;
      const [first, second] = naturalModes([
        { mass: 2 * m, stiffness: 2 * k, height: 3 },
        { mass: m, stiffness: k, height: 3 },
      ]);
      return [
        {
          quantity: 'omega_1^2 (rad^2/s^2)',
          expected: k / (2 * m),
          computed: first.circularFrequency ** 2,
        },
        {
          quantity: 'omega_2^2 (rad^2/s^2)',
          expected: (2 * k) / m,
          computed: second.circularFrequency ** 2,
        },
        { quantity: 'mode 1 shape at level 1', expected: 0.5, computed: first.shape[0] },
        { quantity: 'mode 2 shape at level 1', expected: -1, computed: second.shape[0] },
      ];
    },
  },
  {
    id: 'five-storey-uniform-frame',
    title: 'Five-storey uniform shear frame with T1 = 2 s',
    source:
      'Chopra, Dynamics of Structures, chapter 13, five-storey uniform shear frame: periods from the closed form; effective masses of modes 1 and 2 (87.95% and 8.72%) from memory',
    inputs: ['5 equal storeys', 'k chosen so that T1 = 2 s'],
    tolerance: 1e-4,
    values: () => {
      const m = 1e5;
      const k = m * (Math.PI / (2 * Math.sin(Math.PI / 22))) ** 2;
      const modes = naturalModes(uniform(5, m, k));
      const periods = [1, 3, 5].map((odd, i) => ({
        quantity: `T_${i + 1} (s)`,
        expected: (2 * Math.sin(Math.PI / 22)) / Math.sin((odd * Math.PI) / 22),
        computed: modes[i].period,
      }));
      return [
        ...periods,
        // Given to two decimals: half a unit in the last place is 0.06% of 8.72.
        {
          quantity: 'M*_1 / M (%)',
          expected: 87.95,
          computed: modes[0].effectiveMassRatio * 100,
          tolerance: 1e-3,
        },
        {
          quantity: 'M*_2 / M (%)',
          expected: 8.72,
          computed: modes[1].effectiveMassRatio * 100,
          tolerance: 1e-3,
        },
      ];
    },
  },
  {
    id: 'cqc-coefficient',
    title: 'CQC correlation coefficient, zeta = 5%',
    source:
      'Der Kiureghian, J. Eng. Mech. Div. ASCE 106 (1980); Wilson, Der Kiureghian & Bayo, Earthquake Eng. Struct. Dyn. 9 (1981) 187-194: the equal-damping formula, worked by hand',
    inputs: ['zeta = 0.05', 'beta = omega_j / omega_i = 0.9 and 0.5'],
    tolerance: 1e-4,
    // The matrix the analysis builds from its modes' frequencies (analyse -> correlationMatrix).
    values: () => {
      const rho = correlationMatrix([1, 0.9, 0.5], 0.05);
      return [
        { quantity: 'rho at beta = 0.9', expected: 0.47303, computed: rho[0][1] },
        { quantity: 'rho at beta = 0.5', expected: 0.018486, computed: rho[0][2] },
        { quantity: 'rho at beta = 1', expected: 1, computed: rho[1][1] },
      ];
    },
  },
  {
    id: 'single-storey',
    title: 'One storey: the single-degree-of-freedom answer',
    source: 'V = m Sa g and u = Sa g / omega^2 for one degree of freedom: common practice',
    inputs: ['m = 200 t', 'k = 80 MN/m', 'h = 4 m', 'Sa = 0.3 g at every period'],
    tolerance: 1e-12,
    values: () => {
      const result = analyse({
        storeys: [{ mass: 2e5, stiffness: 8e7, height: 4 }],
        spectrum: {
          points: [
            { period: 0, sa: 0.3 },
            { period: 10, sa: 0.3 },
          ],
        },
        dampingRatio: 0.05,
      });
      return [
        {
          quantity: 'base shear (N)',
          expected: 2e5 * 0.3 * STANDARD_GRAVITY,
          computed: result.combined.cqc.baseShear,
        },
        {
          quantity: 'roof displacement (m)',
          expected: (0.3 * STANDARD_GRAVITY) / (8e7 / 2e5),
          computed: result.combined.srss.displacement[0],
        },
      ];
    },
  },
  ...PUBLISHED_CASES,
];
