import {
  HISTORY_LIMITS,
  type ResponseHistoryRequest,
  type ResponseHistoryResponse,
  type SampledHistory,
  type StoreyHistoryValues,
  decimated,
} from '@tiermode/shared-types';
import { ENGINE_VERSION } from '../analyse';
import { SIGNIFICANT_MASS_RATIO } from '../analysis-warnings';
import { naturalModes, type Mode } from '../modes';
import { assertStoreys, type Storey } from '../shear-building';
import { assertHistoryDamping } from './free-vibration';
import { assertRecord, assertScale, groundAccelerations, peakOf, toG } from './record';
import { sdofDisplacements, sdofStep } from './sdof-recursion';

/** Checks a response history request; throws TypeError/RangeError naming the field. */
export function assertResponseHistoryRequest(request: ResponseHistoryRequest): void {
  const { storeys, record, modeCount, animationFrames } = request;
  assertStoreys(storeys);
  assertHistoryDamping(request.dampingRatio);
  assertRecord(record);
  assertScale(request.scale);
  const work = storeys.length * record.accelerations.length;
  if (work > HISTORY_LIMITS.maxStoreySteps) {
    throw new RangeError(
      `${storeys.length} storeys x ${record.accelerations.length} record steps is more than ${HISTORY_LIMITS.maxStoreySteps.toLocaleString('en')}; use a shorter record or a longer time step`,
    );
  }
  if (
    modeCount !== undefined &&
    (!Number.isInteger(modeCount) || modeCount < 1 || modeCount > storeys.length)
  ) {
    throw new RangeError(
      `modeCount must be a whole number from 1 to ${storeys.length} (the number of storeys)`,
    );
  }
  if (
    animationFrames !== undefined &&
    (!Number.isInteger(animationFrames) ||
      animationFrames < 2 ||
      animationFrames > HISTORY_LIMITS.maxAnimationFrames)
  ) {
    throw new RangeError(
      `animationFrames must be a whole number from 2 to ${HISTORY_LIMITS.maxAnimationFrames}`,
    );
  }
}

/**
 * The linear response history of the shear building to a ground acceleration record by modal
 * superposition (Chopra, Dynamics of Structures, chapter 13, modal response history analysis):
 *
 *   u(t) = sum_n Gamma_n phi_n D_n(t),
 *
 * where D_n is the response of an oscillator of the mode's omega_n and the damping ratio to the
 * record, each step exact for the record taken linear between samples (sdof-recursion.ts).
 * Classical damping, the same ratio in every mode; the record as given (no baseline correction);
 * the ground fixed (no soil-structure interaction); peaks over the record's samples. At each
 * sample: drift d_i = u_i - u_(i-1), shear V_i = k_i d_i, floor force f_i = V_i - V_(i+1)
 * (= (K u)_i, stiffness times the displacements relative to the ground), overturning moment at
 * the bottom of storey i M_i = M_(i+1) + V_i h_i.
 *
 * Cost: N_modes oscillators x steps for the D_n, then storeys x modes x steps for u (the large
 * part: 200 storeys, all modes, 8,000 steps is 3.2e8 multiply-adds).
 */
export function responseHistory(
  request: ResponseHistoryRequest,
  solveModes: (storeys: readonly Storey[]) => Mode[] = naturalModes,
): ResponseHistoryResponse {
  assertResponseHistoryRequest(request);
  const { storeys, record, dampingRatio: zeta } = request;
  const scale = request.scale ?? 1;
  const n = storeys.length;
  const steps = record.accelerations.length;
  const dt = record.timeStep;
  const ag = groundAccelerations(record, scale);
  const modes = solveModes(storeys).slice(0, request.modeCount ?? n);
  const m = modes.length;

  // D_n at every step, step-major: d[k * m + j], with BLOCK - 1 rows of zeros after the last.
  const d = new Float64Array((steps + BLOCK - 1) * m);
  // Gamma_n phi_n by level, with a row of zeros for an odd count: g[i * m + j].
  const g = new Float64Array((n + 1) * m);
  modes.forEach((mode, j) => {
    sdofDisplacements(sdofStep(mode.circularFrequency, zeta, dt), ag, d, j, m);
    for (let i = 0; i < n; i++) g[i * m + j] = mode.participationFactor * mode.shape[i];
  });
  // The displacements of BLOCK steps at a time: block[b * n + i].
  const block = new Float64Array(BLOCK * (n + 1));

  const k = storeys.map((s) => s.stiffness);
  const h = storeys.map((s) => s.height);
  const peaks = emptyValues(n);
  const peakTimes = emptyValues(n);
  const roof = new Float64Array(steps);
  const baseShear = new Float64Array(steps);
  const baseMoment = new Float64Array(steps);
  const frameEvery =
    request.animationFrames === undefined
      ? 0
      : Math.max(1, Math.ceil((steps - 1) / (request.animationFrames - 1)));
  const animation = frameEvery
    ? { times: [] as number[], displacements: Array.from({ length: n }, () => [] as number[]) }
    : undefined;

  const shear = new Float64Array(n);
  for (let s = 0; s < steps; s++) {
    const b = s % BLOCK;
    if (b === 0) superpose(g, d, n, m, s, block);
    const u = block.subarray(b * (n + 1), b * (n + 1) + n);
    const t = s * dt;
    for (let i = 0; i < n; i++) {
      const drift = u[i] - (i > 0 ? u[i - 1] : 0);
      shear[i] = k[i] * drift;
      track(peaks.displacement, peakTimes.displacement, i, u[i], t);
      track(peaks.drift, peakTimes.drift, i, drift, t);
      track(peaks.shear, peakTimes.shear, i, shear[i], t);
    }
    let moment = 0;
    for (let i = n - 1; i >= 0; i--) {
      track(
        peaks.floorForce,
        peakTimes.floorForce,
        i,
        shear[i] - (i + 1 < n ? shear[i + 1] : 0),
        t,
      );
      moment += shear[i] * h[i];
      track(peaks.overturningMoment, peakTimes.overturningMoment, i, moment, t);
    }
    roof[s] = u[n - 1];
    baseShear[s] = shear[0];
    baseMoment[s] = moment;
    if (animation && (s % frameEvery === 0 || s === steps - 1)) {
      animation.times.push(t);
      for (let i = 0; i < n; i++) animation.displacements[i].push(u[i]);
    }
  }
  for (let i = 0; i < n; i++) {
    peaks.driftRatio[i] = peaks.drift[i] / h[i];
    peakTimes.driftRatio[i] = peakTimes.drift[i];
  }

  const times = (values: Float64Array): SampledHistory =>
    decimated(values, dt, request.full ? Infinity : HISTORY_LIMITS.displayPoints);
  const agInG = ag.map(toG);
  const decimate = !request.full && steps > HISTORY_LIMITS.displayPoints;
  const baseShearPeak = { value: peaks.shear[0], time: peakTimes.shear[0] };
  const warnings: string[] = [];
  // The fastest mode that carries at least 1 % of the mass: its peaks want 10 samples a period.
  const significant = modes.filter((mode) => mode.effectiveMassRatio >= SIGNIFICANT_MASS_RATIO);
  const fastest = (significant.length > 0 ? significant : modes).at(-1)!;
  const shortest = fastest.period;
  if (dt > shortest / 10) {
    warnings.push(
      `The record's time step (${dt} s) is longer than a tenth of the period of mode ${fastest.number} (${shortest.toPrecision(3)} s), which carries at least 1 % of the mass: each step is exact for the record as sampled, but peaks are read at the samples and may fall between them; a record at a finer step reads them closer`,
    );
  }
  return {
    modeCount: m,
    scale,
    record: {
      steps,
      timeStep: dt,
      duration: (steps - 1) * dt,
      peakGroundAcceleration: toG(peakOf(ag)),
    },
    peaks,
    peakTimes,
    base: {
      shear: baseShearPeak.value,
      shearTime: baseShearPeak.time,
      moment: peaks.overturningMoment[0],
      momentTime: peakTimes.overturningMoment[0],
    },
    histories: {
      decimated: decimate,
      roofDisplacement: times(roof),
      baseShear: times(baseShear),
      baseMoment: times(baseMoment),
      groundAcceleration: times(agInG),
    },
    ...(animation ? { animation } : {}),
    warnings,
    engineVersion: ENGINE_VERSION,
  };
}

/** Steps superposed at a time (the kernel below is written for four). */
const BLOCK = 4;

/**
 * u_i at steps s0..s0+3: block[b (n + 1) + i] = sum_j g[i m + j] d[(s0 + b) m + j], as dot
 * products two levels by four steps at a time, so each value loaded serves several
 * multiply-adds (about three times faster than one level and one step at a time).
 */
function superpose(
  g: Float64Array,
  d: Float64Array,
  n: number,
  m: number,
  s0: number,
  block: Float64Array,
): void {
  const stride = n + 1;
  const d0 = s0 * m;
  const d1 = d0 + m;
  const d2 = d1 + m;
  const d3 = d2 + m;
  for (let i = 0; i < n; i += 2) {
    const r0 = i * m;
    const r1 = r0 + m;
    let a00 = 0;
    let a01 = 0;
    let a02 = 0;
    let a03 = 0;
    let a10 = 0;
    let a11 = 0;
    let a12 = 0;
    let a13 = 0;
    for (let j = 0; j < m; j++) {
      const g0 = g[r0 + j];
      const g1 = g[r1 + j];
      const x0 = d[d0 + j];
      const x1 = d[d1 + j];
      const x2 = d[d2 + j];
      const x3 = d[d3 + j];
      a00 += g0 * x0;
      a01 += g0 * x1;
      a02 += g0 * x2;
      a03 += g0 * x3;
      a10 += g1 * x0;
      a11 += g1 * x1;
      a12 += g1 * x2;
      a13 += g1 * x3;
    }
    block[i] = a00;
    block[stride + i] = a01;
    block[2 * stride + i] = a02;
    block[3 * stride + i] = a03;
    block[i + 1] = a10;
    block[stride + i + 1] = a11;
    block[2 * stride + i + 1] = a12;
    block[3 * stride + i + 1] = a13;
  }
}

function emptyValues(n: number): StoreyHistoryValues {
  const zeros = () => new Array<number>(n).fill(0);
  return {
    displacement: zeros(),
    drift: zeros(),
    driftRatio: zeros(),
    floorForce: zeros(),
    shear: zeros(),
    overturningMoment: zeros(),
  };
}

function track(peaks: number[], times: number[], i: number, value: number, t: number): void {
  const size = Math.abs(value);
  if (size > peaks[i]) {
    peaks[i] = size;
    times[i] = t;
  }
}
