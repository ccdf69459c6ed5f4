import {
  ACCELERATION_UNIT_FACTORS,
  STANDARD_GRAVITY,
  type AccelerationUnits,
  type FreeVibrationSetup,
  type FreeVibrationStart,
  type GroundMotionRecord,
  type StoreyInput,
} from '@tiermode/shared-types';

/** The record's accelerations in g (for plotting beside spectra in g). */
export function recordInG(record: GroundMotionRecord): number[] {
  const factor = ACCELERATION_UNIT_FACTORS[record.units] / STANDARD_GRAVITY;
  return record.accelerations.map((a) => a * factor);
}

/** The largest |a| of a record, in g. */
export function peakInG(record: GroundMotionRecord): number {
  return recordInG(record).reduce((peak, a) => Math.max(peak, Math.abs(a)), 0);
}

/** The initial displacements (m) of a free vibration start, from the current mode shapes. */
export function startDisplacements(
  start: FreeVibrationStart,
  shapes: readonly (readonly number[])[],
): number[] | null {
  if (start.kind === 'shape') return [...start.displacements];
  const shape = shapes[start.mode - 1];
  return shape ? shape.map((p) => p * start.amplitude) : null;
}

/** The index of the frame at or just before time t (frames' times ascending). */
export function frameAt(times: readonly number[], t: number): number {
  let lo = 0;
  let hi = times.length - 1;
  if (hi < 0) return 0;
  if (t >= times[hi]) return hi;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (times[mid] <= t) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** The largest |u| over every level and frame: what the drawing must hold. */
export function largestShift(displacements: readonly (readonly number[])[]): number {
  let bound = 0;
  for (const level of displacements) for (const u of level) bound = Math.max(bound, Math.abs(u));
  return bound;
}

/** Every level's displacement at one frame, level 1 first. */
export const levelsAt = (displacements: readonly (readonly number[])[], frame: number): number[] =>
  displacements.map((level) => level[frame] ?? 0);

/** Where a new free vibration starts: the first mode's shape, 50 mm at the roof, for 5 s. */
export const DEFAULT_FREE_VIBRATION: FreeVibrationSetup = {
  start: { kind: 'mode', mode: 1, amplitude: 0.05 },
  duration: 5,
  timeStep: 0.01,
};

/** The acceleration units as the screens name them. */
export const UNIT_NAMES: Record<AccelerationUnits, string> = {
  g: 'g',
  'm/s2': 'm/s²',
  'cm/s2': 'cm/s² (gal)',
};

/** The storeys as the history routes take them (labels left out). */
export const bareStoreys = (storeys: readonly StoreyInput[]) =>
  storeys.map(({ mass, stiffness, height }) => ({ mass, stiffness, height }));

/** Each level's elevation above the ground (m), level 1 first. */
export function elevationsOf(storeys: readonly StoreyInput[]): number[] {
  let top = 0;
  return storeys.map((s) => (top += s.height));
}
