import type { ImportReadAs, StoreyInput } from './analysis';
import { STANDARD_GRAVITY } from './units';

/**
 * Response history: the building's free vibration as a sum of damped modal responses, and its
 * linear response to a ground-motion record by modal superposition (Chopra, Dynamics of
 * Structures, chapters 10 and 13; the engine's history/ files give each step's source). SI base
 * units throughout (kg, N/m, m, s, N, N*m); record accelerations in the
 * units they are given in; spectral accelerations in g.
 */

export const ACCELERATION_UNITS = ['g', 'm/s2', 'cm/s2'] as const;
/** The units of a record's accelerations: g, m/s^2 or cm/s^2 (gal). */
export type AccelerationUnits = (typeof ACCELERATION_UNITS)[number];

/** m/s^2 per unit of each acceleration unit. */
export const ACCELERATION_UNIT_FACTORS: Readonly<Record<AccelerationUnits, number>> = {
  g: STANDARD_GRAVITY,
  'm/s2': 1,
  'cm/s2': 0.01,
};

/**
 * A ground acceleration record sampled at a constant step, the first value at t = 0, taken as
 * given: no baseline correction or filtering is applied (record processing is the user's).
 * Between samples the acceleration is linear.
 */
export interface GroundMotionRecord {
  /** s */
  timeStep: number;
  /** One value per step, in `units`. */
  accelerations: number[];
  units: AccelerationUnits;
}

/**
 * The bounds on response history requests. They keep every answer a few megabytes at most and
 * every request under a few seconds of work: a record of at most 60,000 steps at a step of
 * 0.0001 s to 0.1 s; a response history of at most 4,000,000 storey-steps (e.g. 500 storeys x
 * 8,000 steps, or 200 x 20,000); a free vibration of at most 20,001 samples and 500,000
 * level-samples (its answer holds levels x samples displacements and as many modal coordinates); a record spectrum of at most 500 periods, each 0 to 50 s, and at most
 * 10,000,000 period-steps.
 */
export const HISTORY_LIMITS = {
  maxRecordSteps: 60_000,
  minRecordSteps: 2,
  minTimeStep: 1e-4,
  maxTimeStep: 0.1,
  maxStoreySteps: 4_000_000,
  maxFreeVibrationSamples: 20_001,
  maxLevelSamples: 500_000,
  maxSpectrumPeriods: 500,
  maxSpectrumPeriod: 50,
  maxPeriodSteps: 10_000_000,
  /** Points per history in a decimated answer (pairs of a bucket's least and greatest). */
  displayPoints: 2_000,
  maxAnimationFrames: 2_000,
  maxScale: 100,
  /** g: no ground shakes near this; a larger sample is a units slip (cm/s^2 read as g). */
  maxAcceleration: 100,
} as const;

/** `POST /api/free-vibration`. */
export interface FreeVibrationRequest {
  storeys: StoreyInput[];
  dampingRatio: number;
  /** m, one per level, level 1 first; zeros when absent. */
  initialDisplacements?: number[];
  /** m/s, one per level, level 1 first; zeros when absent. */
  initialVelocities?: number[];
  /** s */
  duration: number;
  /** s: the samples are at 0, timeStep, 2 timeStep, ... up to `duration`. */
  timeStep: number;
}

/** One mode's part in a free vibration. */
export interface FreeVibrationMode {
  number: number;
  /** s */
  period: number;
  /** rad/s, undamped */
  circularFrequency: number;
  /** rad/s, omega sqrt(1 - zeta^2) */
  dampedCircularFrequency: number;
  /** As in the analysis: +1 at the roof (or at its largest component). */
  shape: number[];
  /** q_n(0) = phi_n^T M u0 / phi_n^T M phi_n, for `shape`. */
  initialCoordinate: number;
  /** dq_n/dt at 0, from the initial velocities the same way. */
  initialCoordinateVelocity: number;
  /**
   * q_n(t) at `times` (m): the mode's contribution at level i is shape[i] q_n(t), so at the roof
   * (shape +1 there) it is q_n(t) itself.
   */
  coordinate: number[];
}

/** `POST /api/free-vibration`: the exact sum of the damped modal responses, sampled. */
export interface FreeVibrationResponse {
  /** s */
  times: number[];
  /** m, one array per level (level 1 first), each sampled at `times`. */
  displacements: number[][];
  modes: FreeVibrationMode[];
  /** The largest absolute displacement of each level (m) and its time (s). */
  peaks: { displacement: number[]; time: number[] };
  warnings: string[];
  engineVersion: string;
}

/** `POST /api/response-history`. */
export interface ResponseHistoryRequest {
  storeys: StoreyInput[];
  dampingRatio: number;
  record: GroundMotionRecord;
  /** Multiplies the record's accelerations; default 1. */
  scale?: number;
  /** How many modes to superpose, fundamental first; default all. */
  modeCount?: number;
  /** Also answer every step of the roof displacement, base shear and base moment. */
  full?: boolean;
  /** Also answer every level's displacement at this many evenly spaced times (for drawing). */
  animationFrames?: number;
}

/** One value per storey (storey 1 first) of each response quantity. */
export interface StoreyHistoryValues {
  /** m: level displacement relative to the ground. */
  displacement: number[];
  /** m: storey drift, u_i - u_(i-1). */
  drift: number[];
  /** Drift over the storey height. */
  driftRatio: number[];
  /** N: (K u)_i, stiffness times the displacements relative to the ground. */
  floorForce: number[];
  /** N: storey shear. */
  shear: number[];
  /** N*m: overturning moment at the bottom of the storey. */
  overturningMoment: number[];
}

/** A history for plotting, at the times it is given at. */
export interface SampledHistory {
  /** s */
  times: number[];
  values: number[];
}

/** `POST /api/response-history`. */
export interface ResponseHistoryResponse {
  /** Modes superposed, fundamental first. */
  modeCount: number;
  /** The record's multiplier used. */
  scale: number;
  record: {
    steps: number;
    /** s */
    timeStep: number;
    /** s */
    duration: number;
    /** g, after scaling (absolute maximum of the samples). */
    peakGroundAcceleration: number;
  };
  /** Absolute maxima over the record's samples, SI, one per storey from storey 1 up. */
  peaks: StoreyHistoryValues;
  /** The time (s) of each peak. */
  peakTimes: StoreyHistoryValues;
  base: {
    /** N */
    shear: number;
    shearTime: number;
    /** N*m */
    moment: number;
    momentTime: number;
  };
  /**
   * Roof displacement (m), base shear (N), base moment (N*m) and ground acceleration (g, scaled)
   * in time. Decimated for display unless `full`: each of at most `HISTORY_LIMITS.displayPoints`
   * / 2 spans keeps its least and its greatest sample, so every peak stays.
   */
  histories: {
    decimated: boolean;
    roofDisplacement: SampledHistory;
    baseShear: SampledHistory;
    baseMoment: SampledHistory;
    groundAcceleration: SampledHistory;
  };
  /** With `animationFrames`: every level's displacement (m), level 1 first, at `times`. */
  animation?: { times: number[]; displacements: number[][] };
  warnings: string[];
  engineVersion: string;
}

/** `POST /api/record-spectrum`. */
export interface RecordSpectrumRequest {
  record: GroundMotionRecord;
  dampingRatio: number;
  /** s, each 0 to 50; 0 answers the peak ground acceleration. */
  periods: number[];
  /** Multiplies the record's accelerations; default 1. */
  scale?: number;
}

/** `POST /api/record-spectrum`: the record's response spectrum by the exact recursion. */
export interface RecordSpectrumResponse {
  /** s */
  periods: number[];
  /** g: pseudo-acceleration, omega^2 Sd. */
  sa: number[];
  /** m: the peak relative displacement. */
  sd: number[];
  dampingRatio: number;
}

/**
 * How a calc's record is scaled: by a factor the engineer gives, or to the design spectrum over
 * a period range, so that the record's spectrum matches the design spectrum's mean over the
 * range (`mean`) or lies nowhere in it below 90 % of the design spectrum (`not-below-90`, the
 * rule EN 1998-1 3.2.3.1.2(4)c sets for the mean spectrum of a set of records).
 */
export type RecordScaling =
  | { method: 'factor'; factor: number }
  | { method: 'spectrum'; rule: 'mean' | 'not-below-90'; periodRange: [number, number] };

/**
 * Where a calc's free vibration starts: a mode's shape with the roof (or its reference level)
 * displaced by `amplitude` m, read from the current analysis each time (so it stays that mode's
 * shape when the storeys change), or displacements the engineer gives, one per level.
 */
export type FreeVibrationStart =
  { kind: 'mode'; mode: number; amplitude: number } | { kind: 'shape'; displacements: number[] };

/** A calc's free vibration. */
export interface FreeVibrationSetup {
  start: FreeVibrationStart;
  /** s */
  duration: number;
  /** s */
  timeStep: number;
}

/** A calc's stored record, kept and sealed with its inputs. */
export interface StoredGroundMotionRecord extends GroundMotionRecord {
  /** The engineer's name for it, or the file's. */
  name: string;
  /** `demo` is the built-in invented record; `upload` a file. */
  origin: 'upload' | 'demo';
}

/** The response history part of a calc (an input: sealed with the calc when set). */
export interface ResponseHistorySetup {
  record: StoredGroundMotionRecord;
  scaling: RecordScaling;
  freeVibration?: FreeVibrationSetup;
}

/** The stored results of a calc's response history (made by `analyse`, sealed with it). */
export interface ResponseHistoryResult {
  scaling: {
    factor: number;
    /** How the factor was found, in words, with the clause where there is one. */
    explanation: string;
    /** s, for `spectrum` scaling. */
    periodRange?: [number, number];
  };
  /** The response to the scaled record; histories decimated for display. */
  response: ResponseHistoryResponse;
  /** The scaled record's spectrum at the calc's damping, over a fixed grid and the modal periods. */
  recordSpectrum: RecordSpectrumResponse;
  /** The free vibration's peaks and each mode's start (no histories: the tab draws them live). */
  freeVibration?: {
    /** In words: "mode 2, 0.05 m at the roof" or "the engineer's shape". */
    startedFrom: string;
    /** m, one per level: where it started. */
    initialDisplacements: number[];
    peaks: { displacement: number[]; time: number[] };
    modes: {
      number: number;
      period: number;
      initialCoordinate: number;
      initialCoordinateVelocity: number;
    }[];
    roofDisplacement: SampledHistory;
  };
  engineVersion: string;
}

/** The demo record: `GET /api/records/demo`. */
export interface DemoRecordResponse {
  record: StoredGroundMotionRecord;
  /** What it is, in words: invented, synthetic, how it was made. */
  description: string;
}

/** `POST /api/imports/record` (multipart: `file`, `units`, `timeStep` for one column). */
export interface RecordImportResponse {
  /** Null when no row could be read. */
  record: StoredGroundMotionRecord | null;
  errors: { row: number; column: string; message: string }[];
  /** How the file's numbers were read. */
  readAs: ImportReadAs;
  /** How the time step was found, in words ("from the time column: 0.01 s"). */
  timeStepFrom: string;
}

/** One storey's peak from the response history beside the spectrum method's combined value. */
export interface HistoryComparisonRow {
  storey: number;
  quantity: 'displacement' | 'drift' | 'shear' | 'overturningMoment';
  history: number;
  spectrum: number;
  /** history / spectrum; null where the spectrum value is 0. */
  ratio: number | null;
}

/** The storey-by-storey comparison of the history's peaks with a combined spectrum response. */
export function historyComparison(
  peaks: StoreyHistoryValues,
  combined: {
    displacement: number[];
    drift: number[];
    storeyShear: number[];
    overturningMoment: number[];
  },
): HistoryComparisonRow[] {
  const pairs = [
    ['displacement', peaks.displacement, combined.displacement],
    ['drift', peaks.drift, combined.drift],
    ['shear', peaks.shear, combined.storeyShear],
    ['overturningMoment', peaks.overturningMoment, combined.overturningMoment],
  ] as const;
  const rows: HistoryComparisonRow[] = [];
  for (let i = 0; i < peaks.displacement.length; i++) {
    for (const [quantity, history, spectrum] of pairs) {
      const s = spectrum[i] ?? 0;
      rows.push({
        storey: i + 1,
        quantity,
        history: history[i],
        spectrum: s,
        ratio: s > 0 ? history[i] / s : null,
      });
    }
  }
  return rows;
}

/** The default period range for scaling to the design spectrum: 0.2 T1 to 2 T1. */
export function defaultScalingRange(fundamentalPeriod: number): [number, number] {
  return [0.2 * fundamentalPeriod, 2 * fundamentalPeriod];
}

/**
 * At most `points` samples of a history for drawing: split into points / 2 spans, each giving its
 * least and greatest sample in time order, so every peak and trough stays (the line's envelope is
 * the full history's). A shorter history is given whole. Sample k is at k dt.
 */
export function decimated(values: ArrayLike<number>, dt: number, points: number): SampledHistory {
  const whole = (): SampledHistory => ({
    times: Array.from(values, (_, k) => k * dt),
    values: Array.from(values),
  });
  if (values.length <= points) return whole();
  const spans = Math.floor(points / 2);
  const width = values.length / spans;
  const out: SampledHistory = { times: [], values: [] };
  for (let b = 0; b < spans; b++) {
    const from = Math.floor(b * width);
    const to = Math.min(values.length, Math.floor((b + 1) * width));
    let lo = from;
    let hi = from;
    for (let k = from + 1; k < to; k++) {
      if (values[k] < values[lo]) lo = k;
      if (values[k] > values[hi]) hi = k;
    }
    for (const k of lo === hi ? [lo] : lo < hi ? [lo, hi] : [hi, lo]) {
      out.times.push(k * dt);
      out.values.push(values[k]);
    }
  }
  return out;
}

/** `count` periods spaced evenly in log T from `from` to `to` (s). */
export function logPeriods(from: number, to: number, count: number): number[] {
  const ratio = Math.log(to / from);
  return Array.from({ length: count }, (_, i) => from * Math.exp((ratio * i) / (count - 1)));
}

/** The periods a record's scale factor is found at: 50, even in log T over the range. */
export const scalingPeriods = (range: readonly [number, number]): number[] =>
  logPeriods(range[0], range[1], 50);

/**
 * The factor that scales a record to the design spectrum over a period range, from the unscaled
 * record's Sa and the design Sa at `scalingPeriods(range)`: `mean`, the ratio of their means (the
 * scaled record then has the design spectrum's mean over the range; common practice);
 * `not-below-90`, the least factor keeping the record at or above 90 % of the design spectrum at
 * every one of those periods (EN 1998-1 3.2.3.1.2(4)c, there for the mean of a set of records).
 */
export function spectrumScaleFactor(
  rule: 'mean' | 'not-below-90',
  recordSa: readonly number[],
  designSa: readonly number[],
): number {
  if (rule === 'mean') {
    return designSa.reduce((a, b) => a + b, 0) / recordSa.reduce((a, b) => a + b, 0);
  }
  return Math.max(...designSa.map((value, i) => (0.9 * value) / recordSa[i]));
}
