import {
  HISTORY_LIMITS,
  type FreeVibrationRequest,
  type FreeVibrationResponse,
} from '@tiermode/shared-types';
import { ENGINE_VERSION } from '../analyse';
import { isArray } from '../guards';
import { naturalModes } from '../modes';
import { assertStoreys } from '../shear-building';

/** 0 <= zeta < 1 (response history allows an undamped building; the spectrum method does not). */
export function assertHistoryDamping(dampingRatio: unknown): asserts dampingRatio is number {
  if (typeof dampingRatio !== 'number' || !(dampingRatio >= 0 && dampingRatio < 1)) {
    throw new RangeError('dampingRatio must be at least 0 and less than 1');
  }
}

/** One finite number per level, or absent. */
function assertLevelValues(values: unknown, levels: number, field: string, unit: string): void {
  if (values === undefined) return;
  if (!isArray(values) || values.length !== levels) {
    throw new RangeError(`${field} must have one value per level (${levels}), level 1 first`);
  }
  values.forEach((value, i) => {
    if (typeof value !== 'number' || !Number.isFinite(value)) {
      throw new TypeError(`${field}[${i}] (level ${i + 1}) must be a number (${unit})`);
    }
  });
}

/** Checks a free vibration request; throws TypeError/RangeError naming the field. */
export function assertFreeVibrationRequest(request: FreeVibrationRequest): number {
  const { storeys, duration, timeStep } = request;
  assertStoreys(storeys);
  assertHistoryDamping(request.dampingRatio);
  const n = storeys.length;
  assertLevelValues(request.initialDisplacements, n, 'initialDisplacements', 'm');
  assertLevelValues(request.initialVelocities, n, 'initialVelocities', 'm/s');
  const moving = [...(request.initialDisplacements ?? []), ...(request.initialVelocities ?? [])];
  if (!moving.some((value) => value !== 0)) {
    throw new RangeError(
      'initialDisplacements or initialVelocities must give the building a start: at least one value other than 0',
    );
  }
  if (typeof timeStep !== 'number' || !(timeStep > 0) || !Number.isFinite(timeStep)) {
    throw new RangeError('timeStep must be a number greater than 0 (s)');
  }
  if (typeof duration !== 'number' || !(duration > 0) || !Number.isFinite(duration)) {
    throw new RangeError('duration must be a number greater than 0 (s)');
  }
  const samples = Math.floor(duration / timeStep + 1e-9) + 1;
  if (samples > HISTORY_LIMITS.maxFreeVibrationSamples) {
    throw new RangeError(
      `duration / timeStep gives ${samples} samples; at most ${HISTORY_LIMITS.maxFreeVibrationSamples} are answered (lengthen the step or shorten the duration)`,
    );
  }
  if (samples * n > HISTORY_LIMITS.maxLevelSamples) {
    throw new RangeError(
      `${n} levels x ${samples} samples is more than ${HISTORY_LIMITS.maxLevelSamples} values; lengthen timeStep or shorten duration`,
    );
  }
  return samples;
}

/**
 * The free vibration of the shear building from initial displacements u0 and velocities v0, as
 * the exact sum of its damped modal responses (Chopra, Dynamics of Structures, chapter 10, free
 * vibration of systems with classical damping):
 *
 *   u(t) = sum_n phi_n q_n(t),
 *   q_n(t) = e^(-zeta omega_n t) [q_n(0) cos omega_D t + (q'_n(0) + zeta omega_n q_n(0)) / omega_D sin omega_D t],
 *   q_n(0) = phi_n^T M u0 / phi_n^T M phi_n,  q'_n(0) = phi_n^T M v0 / phi_n^T M phi_n,
 *
 * every mode with the same damping ratio (classical damping), sampled at 0, dt, 2 dt, ...
 * There is no time stepping, so there is no time-stepping error.
 */
export function freeVibration(request: FreeVibrationRequest): FreeVibrationResponse {
  const samples = assertFreeVibrationRequest(request);
  const { storeys, dampingRatio: zeta, timeStep } = request;
  const n = storeys.length;
  const u0 = request.initialDisplacements ?? new Array<number>(n).fill(0);
  const v0 = request.initialVelocities ?? new Array<number>(n).fill(0);
  const masses = storeys.map((s) => s.mass);
  const times = Array.from({ length: samples }, (_, k) => k * timeStep);
  const displacements = Array.from({ length: n }, () => new Array<number>(samples).fill(0));

  const modes = naturalModes(storeys).map((mode) => {
    const phi = mode.shape;
    let mn = 0;
    let l0 = 0;
    let lv = 0;
    for (let i = 0; i < n; i++) {
      mn += masses[i] * phi[i] * phi[i];
      l0 += masses[i] * phi[i] * u0[i];
      lv += masses[i] * phi[i] * v0[i];
    }
    const q0 = l0 / mn;
    const qv0 = lv / mn;
    const omega = mode.circularFrequency;
    const omegaD = omega * Math.sqrt(1 - zeta * zeta);
    const b = (qv0 + zeta * omega * q0) / omegaD;
    const coordinate = times.map(
      (t) => Math.exp(-zeta * omega * t) * (q0 * Math.cos(omegaD * t) + b * Math.sin(omegaD * t)),
    );
    for (let i = 0; i < n; i++) {
      const row = displacements[i];
      const p = phi[i];
      for (let k = 0; k < samples; k++) row[k] += p * coordinate[k];
    }
    return {
      number: mode.number,
      period: mode.period,
      circularFrequency: omega,
      dampedCircularFrequency: omegaD,
      shape: phi,
      initialCoordinate: q0,
      initialCoordinateVelocity: qv0,
      coordinate,
    };
  });

  const peaks = { displacement: new Array<number>(n).fill(0), time: new Array<number>(n).fill(0) };
  displacements.forEach((row, i) => {
    row.forEach((u, k) => {
      if (Math.abs(u) > peaks.displacement[i]) {
        peaks.displacement[i] = Math.abs(u);
        peaks.time[i] = times[k];
      }
    });
  });
  const warnings: string[] = [];
  const shortest = modes[modes.length - 1].period;
  if (timeStep > shortest / 4) {
    warnings.push(
      `The time step (${timeStep} s) is longer than a quarter of the shortest period (${shortest.toPrecision(3)} s): each value is exact, but the samples are too far apart to draw the highest modes' motion`,
    );
  }
  return { times, displacements, modes, peaks, warnings, engineVersion: ENGINE_VERSION };
}
