import type { Asce7Basis, En1998Basis, SpectrumInput } from '@tiermode/shared-types';
import { analyse } from '../analysis/engine/analyse';
import { freeVibration } from '../analysis/engine/history/free-vibration';
import { responseHistory } from '../analysis/engine/history/response-history';
import { runChecks } from '../analysis/engine/checks/run-checks';
import { STANDARD_GRAVITY as G } from '../analysis/engine/modal-response';
import { naturalModes } from '../analysis/engine/modes';
import type { Storey } from '../analysis/engine/shear-building';
import { generateSpectrum } from '../analysis/engine/spectrum-generators';
import type { ReferenceCase } from './reference-cases';
import { referenceOmega } from './sturm-reference';

/**
 * Reference cases beyond the modes: spectra, interpolation, modal combination, the code-basis
 * checks and ill-conditioned buildings. Each goes through the code path a real analysis takes
 * (the spectrum generators as /api/spectra/generate runs them, `analyse` as /api/analysis, and
 * `runChecks` as /api/checks); the expected values are worked by hand from the published
 * equation named in `source`, the working in the comments.
 */

const flat = (sa: number): SpectrumInput => ({
  points: [
    { period: 0, sa },
    { period: 10, sa },
  ],
});

/** Sa the analysis reads off a spectrum at period T: one storey tuned to that period. */
function saAt(spectrum: SpectrumInput, period: number): number {
  const mass = 1e5;
  const stiffness = mass * ((2 * Math.PI) / period) ** 2;
  return analyse({ storeys: [{ mass, stiffness, height: 3 }], spectrum, dampingRatio: 0.05 })
    .modes[0].sa;
}

// The two-storey frame of Chopra, Dynamics of Structures, chapter 10 (m1 = 2m, m2 = m, k1 = 2k,
// k2 = k): omega^2 = k/2m and 2k/m, shapes [1/2, 1] and [-1, 1]. By hand (chapter 13):
// L1 = 2m(1/2) + m = 2m, M1 = 2m/4 + m = 1.5m, Gamma1 = 4/3, M*1 = 8m/3;
// L2 = -2m + m = -m, M2 = 3m, Gamma2 = -1/3, M*2 = m/3.
const m = 1e5;
const k = 2e8;
const twoStorey: Storey[] = [
  { mass: 2 * m, stiffness: 2 * k, height: 4 },
  { mass: m, stiffness: k, height: 3 },
];
const A = 0.5 * G; // a flat spectrum of 0.5 g
const twoStoreyResult = () =>
  analyse({ storeys: twoStorey, spectrum: flat(0.5), dampingRatio: 0.05 });
/** rho at beta = omega1/omega2 = 0.5, zeta = 0.05 (Der Kiureghian 1980; worked by hand). */
const RHO_HALF = 0.018486;

// One storey on an ASCE 7-22 basis: m = 200 t, k = 80 MN/m, h = 4 m (T = 2 pi sqrt(m/k) =
// 0.31416 s), a flat spectrum of 0.8 g, SDS 1.0, SD1 0.6, S1 0.5, R 8, Cd 5.5, Ie 1, Ct 0.0724
// and x 0.8 (steel moment frame, SI), risk category II.
const asceStorey: Storey[] = [{ mass: 2e5, stiffness: 8e7, height: 4 }];
const asceBasis: Asce7Basis = {
  code: 'ASCE7-22',
  sds: 1,
  sd1: 0.6,
  s1: 0.5,
  tl: 8,
  r: 8,
  cd: 5.5,
  ie: 1,
  ct: 0.0724,
  x: 0.8,
  riskCategory: 'II',
};
const asceChecks = () =>
  runChecks({ storeys: asceStorey, spectrum: flat(0.8), dampingRatio: 0.05, basis: asceBasis })
    .checks;
const W = 2e5 * G;
const Ta = 0.0724 * 4 ** 0.8; // Eq. 12.8-7
const elasticDrift = (0.8 * G) / (8e7 / 2e5); // Sa g / omega^2

export const PUBLISHED_CASES: ReferenceCase[] = [
  {
    id: 'asce7-two-period-spectrum',
    title: 'ASCE 7 two-period design spectrum, read by the analysis',
    source:
      'ASCE 7-16 11.4.6 (ASCE 7-22 11.4.5.2; clause numbers from memory): Sa = SDS(0.4 + 0.6T/T0) below T0, SDS to Ts, SD1/T to TL, SD1 TL/T^2 beyond',
    inputs: ['SDS = 1.0 g, SD1 = 0.6 g, TL = 8 s', 'T0 = 0.12 s, Ts = 0.6 s'],
    tolerance: 1e-9,
    values: () => {
      const { points, interpolation, source } = generateSpectrum({
        kind: 'asce7-two-period',
        sds: 1,
        sd1: 0.6,
        tl: 8,
        maxPeriod: 12,
      });
      const spectrum = { points, interpolation, source };
      return [
        { quantity: 'Sa at T = 0.06 s (g)', expected: 0.7, computed: saAt(spectrum, 0.06) },
        { quantity: 'Sa at T = 0.4 s (g)', expected: 1, computed: saAt(spectrum, 0.4) },
        { quantity: 'Sa at T = 1.5 s (g)', expected: 0.4, computed: saAt(spectrum, 1.5) },
        { quantity: 'Sa at T = 10 s (g)', expected: 0.048, computed: saAt(spectrum, 10) },
      ];
    },
  },
  {
    id: 'asce7-long-period-past-the-table',
    title: 'ASCE 7 spectrum past the end of its generated table',
    source:
      'ASCE 7-16 11.4.6, T > TL: Sa = SD1 TL / T^2 (clause from memory); the table stops at 5 s, the mode is at 7 s',
    inputs: ['SDS = 1.0 g, SD1 = 0.6 g, TL = 4 s', 'table to 5 s', 'T = 7 s'],
    tolerance: 1e-9,
    values: () => {
      const { points, interpolation, source } = generateSpectrum({
        kind: 'asce7-two-period',
        sds: 1,
        sd1: 0.6,
        tl: 4,
        maxPeriod: 5,
      });
      return [
        {
          quantity: 'Sa at T = 7 s (g)',
          expected: (0.6 * 4) / 49,
          computed: saAt({ points, interpolation, source }, 7),
        },
      ];
    },
  },
  {
    id: 'en1998-elastic-spectrum',
    title: 'EN 1998-1 elastic spectrum, Type 1, ground C',
    source:
      'EN 1998-1:2004 3.2.2.2, Eqs. 3.2-3.4, Table 3.2 (S = 1.15, TB 0.2, TC 0.6, TD 2.0 s; table values from memory)',
    inputs: ['agR = 0.25 g, gamma_I = 1', 'ground C, Type 1, 5% damping (eta = 1)'],
    tolerance: 1e-9,
    values: () => {
      const generated = generateSpectrum({
        kind: 'en1998-elastic',
        agR: 0.25,
        groundType: 'C',
        spectrumType: 1,
      });
      // Plateau 2.5 x 0.25 x 1.15 = 0.71875 g; at 1.2 s x 0.6/1.2; at 3 s x 0.6 x 2 / 9.
      return [
        { quantity: 'Sa at 0.4 s (g)', expected: 0.71875, computed: saAt(generated, 0.4) },
        { quantity: 'Sa at 1.2 s (g)', expected: 0.359375, computed: saAt(generated, 1.2) },
        { quantity: 'Sa at 3 s (g)', expected: (0.71875 * 1.2) / 9, computed: saAt(generated, 3) },
      ];
    },
  },
  {
    id: 'en1998-damping-correction',
    title: 'EN 1998-1 damping correction at 10% damping',
    source: 'EN 1998-1:2004 3.2.2.2(3), Eq. 3.6: eta = sqrt(10 / (5 + xi)) >= 0.55',
    inputs: ['agR = 0.25 g, ground C, Type 1', 'xi = 10%'],
    tolerance: 1e-9,
    values: () => {
      const generated = generateSpectrum({
        kind: 'en1998-elastic',
        agR: 0.25,
        groundType: 'C',
        spectrumType: 1,
        dampingPercent: 10,
      });
      return [
        {
          quantity: 'plateau Sa at 0.4 s (g)',
          expected: 0.71875 * Math.sqrt(10 / 15),
          computed: saAt(generated, 0.4),
        },
      ];
    },
  },
  {
    id: 'en1998-design-spectrum',
    title: 'EN 1998-1 design spectrum with the beta ag lower bound',
    source:
      'EN 1998-1:2004 3.2.2.5, Eqs. 3.13-3.16 (beta = 0.2 recommended), Table 3.2 ground B (S 1.2, TB 0.15, TC 0.5, TD 2.0 s; from memory)',
    inputs: ['agR = 0.3 g, ground B, Type 1', 'q = 4, beta = 0.2'],
    tolerance: 1e-9,
    values: () => {
      const generated = generateSpectrum({
        kind: 'en1998-design',
        agR: 0.3,
        groundType: 'B',
        spectrumType: 1,
        q: 4,
      });
      // Plateau 2.5 x 0.3 x 1.2 / 4 = 0.225 g; at 1 s 0.225 x 0.5 = 0.1125 g; at 3 s
      // 0.225 x 0.5 x 2 / 9 = 0.025 g, below beta ag = 0.06 g, so 0.06 g.
      return [
        { quantity: 'Sa at 0.3 s (g)', expected: 0.225, computed: saAt(generated, 0.3) },
        { quantity: 'Sa at 1 s (g)', expected: 0.1125, computed: saAt(generated, 1) },
        { quantity: 'Sa at 3 s (g)', expected: 0.06, computed: saAt(generated, 3) },
      ];
    },
  },
  {
    id: 'linear-interpolation',
    title: 'A typed spectrum table, interpolated linearly in T',
    source: 'Linear interpolation between the points of a spectrum table: common practice',
    inputs: ['points (0.5 s, 1.0 g) and (1.5 s, 0.4 g)', 'T = 0.8 s'],
    tolerance: 1e-12,
    values: () => [
      {
        quantity: 'Sa at 0.8 s (g)',
        expected: 1 + (0.3 / 1) * (0.4 - 1),
        computed: saAt(
          {
            points: [
              { period: 0.5, sa: 1 },
              { period: 1.5, sa: 0.4 },
            ],
          },
          0.8,
        ),
      },
    ],
  },
  {
    id: 'log-log-interpolation',
    title: 'Log-log interpolation is exact on a 1/T branch',
    source:
      'A 1/T branch is a straight line in log Sa against log T, so log-log interpolation between two of its points gives it exactly: common practice',
    inputs: ['points (1 s, 0.6 g) and (2 s, 0.3 g)', 'T = 1.5 s'],
    tolerance: 1e-12,
    values: () => [
      {
        quantity: 'Sa at 1.5 s (g)',
        expected: 0.4,
        computed: saAt(
          {
            points: [
              { period: 1, sa: 0.6 },
              { period: 2, sa: 0.3 },
            ],
            interpolation: 'log-log',
          },
          1.5,
        ),
      },
    ],
  },
  {
    id: 'two-storey-participation',
    title: 'Two-storey frame: participation factors and effective masses',
    source:
      'Chopra, Dynamics of Structures, chapter 13 (Gamma_n = L_n / M_n, M*_n = L_n^2 / M_n) on the chapter 10 two-storey frame, worked by hand',
    inputs: ['m1 = 200 t, m2 = 100 t', 'k1 = 400 MN/m, k2 = 200 MN/m'],
    tolerance: 1e-12,
    values: () => {
      const [first, second] = twoStoreyResult().modes;
      return [
        { quantity: 'Gamma_1', expected: 4 / 3, computed: first.participationFactor },
        { quantity: 'Gamma_2', expected: -1 / 3, computed: second.participationFactor },
        { quantity: 'M*_1 (kg)', expected: (8 * m) / 3, computed: first.effectiveMass },
        { quantity: 'M*_2 (kg)', expected: m / 3, computed: second.effectiveMass },
      ];
    },
  },
  {
    id: 'two-storey-srss-abs',
    title: 'Two-storey frame: SRSS and ABS base shear',
    source:
      'Chopra, Dynamics of Structures, chapter 13 (modal combination rules): V_bn = M*_n A_n; SRSS sqrt(sum V^2), ABS sum |V|; worked by hand',
    inputs: ['the two-storey frame above', 'Sa = 0.5 g at every period'],
    tolerance: 1e-12,
    values: () => {
      const { combined } = twoStoreyResult();
      return [
        {
          quantity: 'SRSS base shear (N)',
          expected: ((m * A) / 3) * Math.sqrt(65),
          computed: combined.srss.baseShear,
        },
        { quantity: 'ABS base shear (N)', expected: 3 * m * A, computed: combined.abs.baseShear },
      ];
    },
  },
  {
    id: 'two-storey-cqc',
    title: 'Two-storey frame: CQC base shear with omega_1 / omega_2 = 0.5',
    source:
      'Der Kiureghian (1980); Wilson, Der Kiureghian & Bayo, Earthquake Eng. Struct. Dyn. 9 (1981): CQC = sqrt(sum_i sum_j rho_ij V_i V_j), rho(0.5, 5%) = 0.018486 worked by hand',
    inputs: ['the two-storey frame above', 'Sa = 0.5 g', 'zeta = 0.05'],
    tolerance: 1e-6,
    values: () => [
      {
        quantity: 'CQC base shear (N)',
        expected: ((m * A) / 3) * Math.sqrt(65 + 16 * RHO_HALF),
        computed: twoStoreyResult().combined.cqc.baseShear,
      },
      {
        quantity: 'rho_12 of the analysis',
        expected: RHO_HALF,
        computed: twoStoreyResult().correlation[0][1],
        tolerance: 1e-4,
      },
    ],
  },
  {
    id: 'two-storey-displacement-drift',
    title: 'Two-storey frame: roof displacement and storey drifts (SRSS)',
    source:
      'Chopra, Dynamics of Structures, chapter 13: u_n = Gamma_n phi_n A_n / omega_n^2; worked by hand',
    inputs: ['the two-storey frame above', 'Sa = 0.5 g'],
    tolerance: 1e-12,
    values: () => {
      const { combined } = twoStoreyResult();
      // Mode 1: Gamma A / omega^2 = (4/3) A / (k/2m); mode 2: (-1/3) A / (2k/m).
      const d1 = ((4 / 3) * A) / (k / (2 * m));
      const d2 = ((-1 / 3) * A) / ((2 * k) / m);
      return [
        {
          quantity: 'roof displacement (m)',
          expected: Math.hypot(d1, d2),
          computed: combined.srss.displacement[1],
        },
        {
          quantity: 'storey 1 drift (m)',
          expected: Math.hypot(0.5 * d1, -1 * d2),
          computed: combined.srss.drift[0],
        },
        {
          quantity: 'storey 2 drift (m)',
          expected: Math.hypot(0.5 * d1, 2 * d2),
          computed: combined.srss.drift[1],
        },
      ];
    },
  },
  {
    id: 'two-storey-shear-moment',
    title: 'Two-storey frame: top storey shear and base overturning moment (SRSS)',
    source:
      'Chopra, Dynamics of Structures, chapter 13: f_n = Gamma_n M phi_n A_n, storey shears and moments from the floor forces; worked by hand',
    inputs: ['the two-storey frame above (heights 4 m and 3 m)', 'Sa = 0.5 g'],
    tolerance: 1e-12,
    values: () => {
      const { combined } = twoStoreyResult();
      // Floor forces: mode 1 [(4/3) 2m (1/2), (4/3) m] A = [4/3, 4/3] m A; mode 2
      // [(-1/3) 2m (-1), (-1/3) m] A = [2/3, -1/3] m A. Base moment: f1 x 4 + f2 x 7.
      return [
        {
          quantity: 'storey 2 shear (N)',
          expected: m * A * Math.hypot(4 / 3, -1 / 3),
          computed: combined.srss.storeyShear[1],
        },
        {
          quantity: 'base overturning moment (N m)',
          expected: m * A * Math.hypot((4 / 3) * 4 + (4 / 3) * 7, (2 / 3) * 4 - (1 / 3) * 7),
          computed: combined.srss.baseMoment,
        },
      ];
    },
  },
  {
    id: 'effective-mass-sum',
    title: 'The effective masses of all modes add up to the total mass',
    source: 'Chopra, Dynamics of Structures, chapter 13: sum of M*_n over all modes = total mass',
    inputs: ['an invented 12-storey building, masses 150 to 420 t, stiffnesses 180 to 900 MN/m'],
    tolerance: 1e-12,
    values: () => {
      const storeys = Array.from({ length: 12 }, (_, i) => ({
        mass: 1e3 * (420 - 22 * i + (i % 3) * 15),
        stiffness: 1e6 * (900 - 55 * i + (i % 2) * 40),
        height: 3.2,
      }));
      const total = storeys.reduce((sum, s) => sum + s.mass, 0);
      const modes = naturalModes(storeys);
      return [
        {
          quantity: 'sum of M* (kg)',
          expected: total,
          computed: modes.reduce((sum, mode) => sum + mode.effectiveMass, 0),
        },
      ];
    },
  },
  {
    id: 'uniform-500-storeys',
    title: 'Uniform 500-storey shear building: closed-form frequencies',
    source:
      'Closed form of the fixed-free spring-mass chain, omega_j = 2 sqrt(k/m) sin((2j-1) pi / (2(2N+1))): common practice',
    inputs: ['N = 500', 'm = 200 t, k = 300 MN/m'],
    tolerance: 1e-9,
    values: () => {
      const modes = naturalModes(
        Array.from({ length: 500 }, () => ({ mass: 2e5, stiffness: 3e8, height: 3 })),
      );
      return [1, 2, 250, 500].map((j) => ({
        quantity: `omega_${j} (rad/s)`,
        expected: 2 * Math.sqrt(3e8 / 2e5) * Math.sin(((2 * j - 1) * Math.PI) / (2 * 1001)),
        computed: modes[j - 1].circularFrequency,
      }));
    },
  },
  {
    id: 'contrasted-storeys-60-digits',
    title: 'Neighbouring storeys 1e3 apart in stiffness and 1e-4 in mass',
    source:
      'Sturm sequence bisection on K - lambda M in 60-digit arithmetic (Bathe, Finite Element Procedures, 1996; Wilkinson, The Algebraic Eigenvalue Problem, 1965, chapter 5), computed live',
    inputs: ['20 storeys alternating 100 t / 10 kg and 100 MN/m / 100 GN/m'],
    tolerance: 1e-9,
    values: () => {
      const storeys = Array.from({ length: 20 }, (_, i) => ({
        mass: i % 2 ? 1e1 : 1e5,
        stiffness: i % 2 ? 1e11 : 1e8,
        height: 3,
      }));
      const modes = naturalModes(storeys);
      return [0, 1, 9, 19].map((j) => ({
        quantity: `omega_${j + 1} (rad/s)`,
        expected: referenceOmega(storeys, j, modes[j].circularFrequency),
        computed: modes[j].circularFrequency,
      }));
    },
  },
  {
    id: 'negligible-mass-condensation',
    title: 'A level of negligible mass equals its static condensation',
    source:
      'Static condensation of a massless level: the two storeys beside it act as springs in series, k = k3 k4 / (k3 + k4) (Chopra, Dynamics of Structures, chapter 9, static condensation)',
    inputs: [
      "5 storeys, level 3 with 1e-9 of its neighbours' mass",
      'against the 4-storey condensed building',
    ],
    tolerance: 1e-8,
    values: () => {
      const storeys: Storey[] = [
        { mass: 4e5, stiffness: 6e8, height: 4 },
        { mass: 4e5, stiffness: 5e8, height: 3.5 },
        { mass: 4e-4, stiffness: 5e8, height: 3.5 },
        { mass: 3.5e5, stiffness: 4e8, height: 3.5 },
        { mass: 3e5, stiffness: 3e8, height: 3.5 },
      ];
      const condensed: Storey[] = [
        storeys[0],
        storeys[1],
        { mass: 3.5e5, stiffness: (5e8 * 4e8) / 9e8, height: 7 },
        storeys[4],
      ];
      const full = naturalModes(storeys);
      const reduced = naturalModes(condensed);
      return [0, 1, 2].map((j) => ({
        quantity: `T_${j + 1} (s)`,
        expected: reduced[j].period,
        computed: full[j].period,
      }));
    },
  },
  {
    id: 'asce7-elf-period-and-cs',
    title: 'ASCE 7-22 ELF: period cap and seismic response coefficient',
    source:
      'ASCE 7-22 12.8.2 (T <= Cu Ta, Table 12.8-1 Cu = 1.4 for SD1 >= 0.4), Eq. 12.8-7 (Ta = Ct hn^x, Table 12.8-2 steel moment frame Ct 0.0724, x 0.8 in SI), Eq. 12.8-2 (Cs = SDS / (R/Ie)); table values from memory',
    inputs: ['one storey, 200 t, 80 MN/m, 4 m (T = 0.314 s)', 'SDS 1.0, SD1 0.6, R 8, Ie 1'],
    tolerance: 1e-9,
    values: () => {
      const { elf } = asceChecks();
      return [
        { quantity: 'Ta (s)', expected: Ta, computed: elf.approximatePeriod ?? Number.NaN },
        { quantity: 'T used, Cu Ta (s)', expected: 1.4 * Ta, computed: elf.period },
        { quantity: 'Cs', expected: 0.125, computed: elf.cs },
        { quantity: 'V = Cs W (N)', expected: 0.125 * W, computed: elf.baseShear },
      ];
    },
  },
  {
    id: 'asce7-scaling-and-drift',
    title: 'ASCE 7-22 modal scaling and design drift',
    source:
      'ASCE 7-22 12.9.1.2 (forces / (R/Ie), displacements x Cd/Ie), 12.9.1.4.1 (scale to V where Vt < V), 12.8.6 (design drift), Table 12.12-1 (0.020 hsx, risk category II); table value from memory',
    inputs: ['the one-storey building above', 'Sa = 0.8 g, Cd 5.5'],
    tolerance: 1e-9,
    values: () => {
      const checks = asceChecks();
      // Vt = 0.8 W / 8 = 0.1 W; V / Vt = 1.25. Design drift = Cd (delta / R) / Ie.
      return [
        { quantity: 'Vt (N)', expected: 0.1 * W, computed: checks.modalBaseShear },
        { quantity: 'V / Vt', expected: 1.25, computed: checks.scaleFactor },
        {
          quantity: 'design drift ratio',
          expected: (5.5 * (elasticDrift / 8)) / 4,
          computed: checks.storeys[0].designDriftRatio,
        },
        {
          quantity: 'drift limit ratio',
          expected: 0.02,
          computed: checks.storeys[0].driftLimitRatio,
        },
      ];
    },
  },
  {
    id: 'asce7-stability-coefficient',
    title: 'ASCE 7-22 stability coefficient theta',
    source:
      'ASCE 7-22 12.8.7, Eq. 12.8-16: theta = P Delta Ie / (Vx hsx Cd), with Vx the scaled storey shear; worked by hand',
    inputs: ['the one-storey building above', 'P = W'],
    tolerance: 1e-9,
    values: () => {
      const checks = asceChecks();
      const delta = 5.5 * (elasticDrift / 8);
      return [
        {
          quantity: 'theta',
          expected: (W * delta) / (0.125 * W * 4 * 5.5),
          computed: checks.storeys[0].theta,
        },
      ];
    },
  },
  {
    id: 'asce7-elf-distribution',
    title: 'ASCE 7-22 ELF vertical distribution, k = 1',
    source:
      'ASCE 7-22 12.8.3, Eqs. 12.8-11 and 12.8-12: Fx = Cvx V, Cvx = wx hx^k / sum wi hi^k, k = 1 for T <= 0.5 s',
    inputs: ['two storeys 200 t and 100 t at 4 m and 7 m', 'stiff: T below 0.5 s'],
    tolerance: 1e-9,
    values: () => {
      const storeys: Storey[] = [
        { mass: 2e5, stiffness: 2e9, height: 4 },
        { mass: 1e5, stiffness: 1e9, height: 3 },
      ];
      const { checks } = runChecks({
        storeys,
        spectrum: flat(0.8),
        dampingRatio: 0.05,
        basis: asceBasis,
      });
      const V = checks.elf.baseShear;
      const sum = 2e5 * 4 + 1e5 * 7;
      return [
        {
          quantity: 'F at level 1 (N)',
          expected: (V * 2e5 * 4) / sum,
          computed: checks.storeys[0].elfForce ?? Number.NaN,
        },
        {
          quantity: 'F at level 2 (N)',
          expected: (V * 1e5 * 7) / sum,
          computed: checks.storeys[1].elfForce ?? Number.NaN,
        },
      ];
    },
  },
  {
    id: 'asce7-soft-storey',
    title: 'ASCE 7-22 soft storey irregularities 1a and 1b',
    source:
      "ASCE 7-22 Table 12.3-2: 1a where a storey's stiffness is below 70% of the storey above (or 80% of the three above), 1b below 60% (or 70%)",
    inputs: ['4 storeys, storey 2 at 65% and then at 55% of storey 3'],
    tolerance: 0,
    values: () => {
      const flags = (ratio: number) =>
        runChecks({
          storeys: [
            { mass: 2e5, stiffness: 5e8, height: 4 },
            { mass: 2e5, stiffness: ratio * 4e8, height: 3.5 },
            { mass: 2e5, stiffness: 4e8, height: 3.5 },
            { mass: 2e5, stiffness: 4e8, height: 3.5 },
          ],
          spectrum: flat(0.1),
          dampingRatio: 0.05,
          basis: { ...asceBasis, sds: 0.1, sd1: 0.06 },
        }).checks.irregularities.filter((f) => f.storey === 2);
      const has = (ratio: number, type: string) =>
        flags(ratio).some((f) => f.type === type) ? 1 : 0;
      return [
        {
          quantity: '1a at storey 2 for 65% (1 = flagged)',
          expected: 1,
          computed: has(0.65, '1a'),
        },
        { quantity: '1b at storey 2 for 65% (0 = not)', expected: 0, computed: has(0.65, '1b') },
        {
          quantity: '1b at storey 2 for 55% (1 = flagged)',
          expected: 1,
          computed: has(0.55, '1b'),
        },
      ];
    },
  },
  {
    id: 'en1998-lateral-force-and-drift',
    title: 'EN 1998-1 base shear, design drift and theta',
    source:
      'EN 1998-1:2004 4.3.3.2.2 (Fb = Sd(T1) m lambda, lambda = 1 for two storeys or fewer), 4.3.4 (ds = q de), 4.4.3.2(1)a (dr nu <= 0.005 h), 4.4.2.2(2) (theta = Ptot dr / (Vtot h)); worked by hand',
    inputs: ['one storey, 200 t, 80 MN/m, 4 m', 'design Sa = 0.2 g flat, q = 4, nu = 0.5'],
    tolerance: 1e-9,
    values: () => {
      const basis: En1998Basis = {
        code: 'EN1998-1',
        ag: 0.25,
        groundType: 'C',
        spectrumType: 1,
        importanceFactor: 1,
        q: 4,
        nu: 0.5,
        driftLimitClass: 'brittle',
      };
      const { checks } = runChecks({
        storeys: asceStorey,
        spectrum: flat(0.2),
        dampingRatio: 0.05,
        basis,
      });
      const de = (0.2 * G) / (8e7 / 2e5);
      const Vtot = 2e5 * 0.2 * G;
      return [
        { quantity: 'Fb (N)', expected: Vtot, computed: checks.elf.baseShear },
        {
          quantity: 'dr nu / h',
          expected: (4 * de * 0.5) / 4,
          computed: checks.storeys[0].designDriftRatio,
        },
        {
          quantity: 'limit (brittle)',
          expected: 0.005,
          computed: checks.storeys[0].driftLimitRatio,
        },
        {
          quantity: 'theta',
          expected: (W * 4 * de) / (Vtot * 4),
          computed: checks.storeys[0].theta,
        },
      ];
    },
  },
  {
    id: 'sdof-step-response-peak',
    title: 'One storey under a step of ground acceleration: the first peak',
    source:
      'Chopra, Dynamics of Structures, chapter 4 (response to a step force): the peak of a damped system is (1 + e^(-zeta pi / sqrt(1 - zeta^2))) times the static deflection, at t = pi / omega_D; worked by hand',
    inputs: [
      'm = 100 t, k = m omega^2 with omega_D = 2 pi rad/s (T_D = 1 s)',
      'zeta = 0.05',
      'a_g = 2 m/s^2 from t = 0, sampled at 0.01 s for 3 s',
    ],
    tolerance: 1e-9,
    values: () => {
      const zeta = 0.05;
      const omega = (2 * Math.PI) / Math.sqrt(1 - zeta * zeta);
      const record = {
        timeStep: 0.01,
        units: 'm/s2' as const,
        accelerations: new Array<number>(301).fill(2),
      };
      const answer = responseHistory({
        storeys: [{ mass: 1e5, stiffness: 1e5 * omega * omega, height: 3 }],
        dampingRatio: zeta,
        record,
      });
      const staticDeflection = 2 / (omega * omega);
      return [
        {
          quantity: 'peak displacement (m)',
          expected:
            staticDeflection * (1 + Math.exp((-zeta * Math.PI) / Math.sqrt(1 - zeta * zeta))),
          computed: answer.peaks.displacement[0],
        },
        {
          quantity: 'time of the peak (s)',
          expected: 0.5,
          computed: answer.peakTimes.displacement[0],
        },
      ];
    },
  },
  {
    id: 'two-storey-free-vibration',
    title: 'Two-storey frame let go from its first mode shape: that mode alone, a cosine',
    source:
      'Chopra, Dynamics of Structures, chapter 10 (free vibration of undamped systems): from rest at a mode shape, u(t) = phi_1 q_0 cos(omega_1 t); the chapter 10 frame above, worked by hand',
    inputs: ['the two-storey frame above, undamped', 'u(0) = 0.1 m x [1/2, 1], at rest'],
    tolerance: 1e-9,
    values: () => {
      const omega1 = Math.sqrt(k / (2 * m));
      const half = Math.PI / omega1;
      const answer = freeVibration({
        storeys: twoStorey,
        dampingRatio: 0,
        initialDisplacements: [0.05, 0.1],
        duration: half,
        timeStep: half / 100,
      });
      const last = answer.times.length - 1;
      return [
        { quantity: 'q_1(0) (m)', expected: 0.1, computed: answer.modes[0].initialCoordinate },
        {
          quantity: 'roof at half a period (m)',
          expected: -0.1,
          computed: answer.displacements[1][last],
        },
        {
          quantity: 'level 1 at half a period (m)',
          expected: -0.05,
          computed: answer.displacements[0][last],
        },
      ];
    },
  },
  {
    id: 'half-sine-pulse-resonance',
    title:
      'One storey under a half-cycle sine pulse of ground acceleration lasting half its period',
    source:
      'Chopra, Dynamics of Structures, chapter 4 (half-cycle sine pulse): at t_d = T_n / 2 an undamped system reaches pi / 2 times the static deflection of the pulse amplitude; worked by hand (u = (p0 / 2k)(sin wt - wt cos wt) in the pulse, at rest slope at its end)',
    inputs: [
      'T_n = 1 s, undamped',
      'a_g = 3 m/s^2 sin(pi t / 0.5 s) for 0.5 s, then 0',
      'sampled at 0.0005 s',
    ],
    tolerance: 1e-5,
    values: () => {
      const omega = 2 * Math.PI;
      const dt = 0.0005;
      const record = {
        timeStep: dt,
        units: 'm/s2' as const,
        accelerations: Array.from({ length: 4001 }, (_, i) =>
          i * dt <= 0.5 ? 3 * Math.sin((Math.PI * i * dt) / 0.5) : 0,
        ),
      };
      const answer = responseHistory({
        storeys: [{ mass: 1e5, stiffness: 1e5 * omega * omega, height: 3 }],
        dampingRatio: 0,
        record,
      });
      return [
        {
          quantity: 'peak displacement (m)',
          expected: (Math.PI / 2) * (3 / (omega * omega)),
          computed: answer.peaks.displacement[0],
        },
      ];
    },
  },
];
