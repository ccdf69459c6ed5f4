import {
  ACCELERATION_UNIT_FACTORS,
  ACCELERATION_UNITS,
  HISTORY_LIMITS,
  STANDARD_GRAVITY,
  type GroundMotionRecord,
  type StoredGroundMotionRecord,
} from '@tiermode/shared-types';
import { isArray } from '../guards';
import { sdofStep } from './sdof-recursion';

import { create, randomDependencies } from './mathjs';

/**
 * Checks a ground-motion record: a time step of 0.0001 to 0.1 s, 2 to 60,000 finite accelerations
 * and known units. Throws TypeError/RangeError naming the field and the sample ("record.
 * accelerations[12] (sample 13, t = 0.12 s) must be a finite number").
 */
export function assertRecord(record: GroundMotionRecord, path = 'record'): void {
  if (typeof record !== 'object' || record === null) {
    throw new TypeError(`${path} must be an object { timeStep, accelerations, units }`);
  }
  const { timeStep, accelerations, units } = record;
  if (typeof timeStep !== 'number' || !Number.isFinite(timeStep)) {
    throw new TypeError(`${path}.timeStep must be a number (s)`);
  }
  if (timeStep < HISTORY_LIMITS.minTimeStep || timeStep > HISTORY_LIMITS.maxTimeStep) {
    throw new RangeError(
      `${path}.timeStep must be from ${HISTORY_LIMITS.minTimeStep} to ${HISTORY_LIMITS.maxTimeStep} s (got ${timeStep})`,
    );
  }
  if (!ACCELERATION_UNITS.includes(units)) {
    throw new RangeError(`${path}.units must be one of ${ACCELERATION_UNITS.join(', ')}`);
  }
  if (!isArray(accelerations))
    throw new TypeError(`${path}.accelerations must be a list of numbers`);
  const n = accelerations.length;
  if (n < HISTORY_LIMITS.minRecordSteps || n > HISTORY_LIMITS.maxRecordSteps) {
    throw new RangeError(
      `${path}.accelerations must have ${HISTORY_LIMITS.minRecordSteps} to ${HISTORY_LIMITS.maxRecordSteps} values (got ${n})`,
    );
  }
  const inG = ACCELERATION_UNIT_FACTORS[units] / STANDARD_GRAVITY;
  for (let k = 0; k < n; k++) {
    const a: unknown = accelerations[k];
    const where = `${path}.accelerations[${k}] (sample ${k + 1}, t = ${+(k * timeStep).toPrecision(6)} s)`;
    if (typeof a !== 'number' || !Number.isFinite(a)) {
      throw new TypeError(`${where} must be a finite number (${units})`);
    }
    if (Math.abs(a) * inG > HISTORY_LIMITS.maxAcceleration) {
      throw new RangeError(
        `${where} is ${+(Math.abs(a) * inG).toPrecision(3)} g, more than ${HISTORY_LIMITS.maxAcceleration} g: check the record's units (${units} chosen)`,
      );
    }
  }
}

/** Checks a record multiplier: a finite number greater than 0 and at most 100. */
export function assertScale(scale: unknown, path = 'scale'): void {
  if (scale === undefined) return;
  if (typeof scale !== 'number' || !(scale > 0) || scale > HISTORY_LIMITS.maxScale) {
    throw new RangeError(
      `${path} must be a number greater than 0 and at most ${HISTORY_LIMITS.maxScale}`,
    );
  }
}

/** The record's accelerations in m/s^2, times `scale`. */
export function groundAccelerations(record: GroundMotionRecord, scale = 1): Float64Array {
  const factor = ACCELERATION_UNIT_FACTORS[record.units] * scale;
  return Float64Array.from(record.accelerations, (a) => a * factor);
}

/** The largest |a| of the samples, m/s^2. */
export function peakOf(values: ArrayLike<number>): number {
  let peak = 0;
  for (let k = 0; k < values.length; k++) peak = Math.max(peak, Math.abs(values[k]));
  return peak;
}

export const DEMO_RECORD_NAME = 'Invented demo record (synthetic, not a recorded earthquake)';

/** What the demo record is, in words, for the screen and the calc package. */
export const DEMO_RECORD_DESCRIPTION =
  'An invented, synthetic ground acceleration for trying the product: Gaussian white noise from ' +
  'a fixed seed, filtered as firm ground would (a Kanai-Tajimi filter, ground frequency 15.6 rad/s ' +
  'and ground damping 0.6, from memory), shaped by a trapezoidal envelope (a 2 s quadratic rise, ' +
  '8 s of strong shaking, an exponential decay) and scaled to a peak of 0.30 g; 20 s at 0.01 s. ' +
  'It is no earthquake and no site: do not design with it.';

/**
 * The built-in demo record. Deterministic: the same seed gives the same samples on every machine
 * (mathjs's seeded `random`). Invented: see DEMO_RECORD_DESCRIPTION.
 */
export function demoRecord(): StoredGroundMotionRecord {
  const math = create({ randomDependencies }, { randomSeed: 'tiermode-demo-record-1' });
  const dt = 0.01;
  const steps = 2001;
  // Box-Muller pairs of standard normals.
  const noise = new Float64Array(steps);
  for (let k = 0; k < steps; k += 2) {
    const u1 = Math.max(Number(math.random()), Number.MIN_VALUE);
    const u2 = Number(math.random());
    const r = Math.sqrt(-2 * Math.log(u1));
    noise[k] = r * Math.cos(2 * Math.PI * u2);
    if (k + 1 < steps) noise[k + 1] = r * Math.sin(2 * Math.PI * u2);
  }
  // The ground as a damped oscillator driven by the noise: its absolute acceleration
  // -(2 zeta_g omega_g x' + omega_g^2 x) is the filtered motion.
  const omegaG = 15.6;
  const zetaG = 0.6;
  const filter = sdofStep(omegaG, zetaG, dt);
  const filtered = new Float64Array(steps);
  let x = 0;
  let v = 0;
  for (let k = 0; k + 1 < steps; k++) {
    const xNext = filter.dd * x + filter.dv * v + filter.da * noise[k] + filter.da1 * noise[k + 1];
    v = filter.vd * x + filter.vv * v + filter.va * noise[k] + filter.va1 * noise[k + 1];
    x = xNext;
    filtered[k + 1] = -(2 * zetaG * omegaG * v + omegaG * omegaG * x);
  }
  const envelope = (t: number) => (t < 2 ? (t / 2) ** 2 : t <= 10 ? 1 : Math.exp(-0.35 * (t - 10)));
  const shaped = Array.from(filtered, (a, k) => a * envelope(k * dt));
  const peak = peakOf(shaped);
  const target = 0.3; // g
  return {
    name: DEMO_RECORD_NAME,
    origin: 'demo',
    timeStep: dt,
    units: 'g',
    accelerations: shaped.map((a) => +((a / peak) * target).toPrecision(6)),
  };
}

/** g per m/s^2. */
export const toG = (acceleration: number): number => acceleration / STANDARD_GRAVITY;
