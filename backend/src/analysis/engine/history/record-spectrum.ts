import {
  HISTORY_LIMITS,
  interpolateSpectrum,
  logPeriods,
  scalingPeriods,
  spectrumScaleFactor,
  type RecordScaling,
  type RecordSpectrumRequest,
  type RecordSpectrumResponse,
  type SpectrumInput,
} from '@tiermode/shared-types';
import { isArray } from '../guards';
import { assertHistoryDamping } from './free-vibration';
import { assertRecord, assertScale, groundAccelerations, peakOf, toG } from './record';
import { partsPerStep, sdofDisplacements, sdofStep } from './sdof-recursion';

/** Checks a record spectrum request; throws TypeError/RangeError naming the field. */
export function assertRecordSpectrumRequest(request: RecordSpectrumRequest): void {
  assertRecord(request.record);
  assertHistoryDamping(request.dampingRatio);
  assertScale(request.scale);
  const { periods } = request;
  if (
    !isArray(periods) ||
    periods.length < 1 ||
    periods.length > HISTORY_LIMITS.maxSpectrumPeriods
  ) {
    throw new RangeError(
      `periods must be a list of 1 to ${HISTORY_LIMITS.maxSpectrumPeriods} periods (s)`,
    );
  }
  periods.forEach((period, i) => {
    if (
      typeof period !== 'number' ||
      !Number.isFinite(period) ||
      period < 0 ||
      period > HISTORY_LIMITS.maxSpectrumPeriod
    ) {
      throw new RangeError(
        `periods[${i}] must be a number from 0 to ${HISTORY_LIMITS.maxSpectrumPeriod} (s)`,
      );
    }
  });
  const work = periods.length * request.record.accelerations.length;
  if (work > HISTORY_LIMITS.maxPeriodSteps) {
    throw new RangeError(
      `${periods.length} periods x ${request.record.accelerations.length} record steps is more than ${HISTORY_LIMITS.maxPeriodSteps.toLocaleString('en')}; ask for fewer periods`,
    );
  }
}

/**
 * The record's response spectrum at a damping ratio: for each period T the peak relative
 * displacement Sd of the oscillator of omega = 2 pi / T from rest over the record's samples, and
 * the pseudo-acceleration Sa = omega^2 Sd (in g) (Chopra, Dynamics of Structures, chapter 6,
 * response spectrum). Each step is exact for the record linear between samples (Nigam and
 * Jennings 1969); T = 0 answers the peak ground acceleration and Sd = 0. Short periods are walked
 * in parts of the record's step (partsPerStep), so their peaks are not missed between samples.
 */
export function recordSpectrum(request: RecordSpectrumRequest): RecordSpectrumResponse {
  assertRecordSpectrumRequest(request);
  const ag = groundAccelerations(request.record, request.scale ?? 1);
  const pga = toG(peakOf(ag));
  const sa: number[] = [];
  const sd: number[] = [];
  for (const period of request.periods) {
    if (period === 0) {
      sa.push(pga);
      sd.push(0);
      continue;
    }
    const omega = (2 * Math.PI) / period;
    const dt = request.record.timeStep;
    const sub = partsPerStep(period, dt);
    const { peak } = sdofDisplacements(
      sdofStep(omega, request.dampingRatio, dt / sub),
      ag,
      undefined,
      0,
      1,
      sub,
    );
    sd.push(peak);
    sa.push(toG(omega * omega * peak));
  }
  return { periods: [...request.periods], sa, sd, dampingRatio: request.dampingRatio };
}

/** The periods a calc's record spectrum is drawn at: 0, 0.02 to 10 s (120 in log T), the modes'. */
export function displayPeriods(modalPeriods: readonly number[]): number[] {
  const grid = [0, ...logPeriods(0.02, 10, 120), ...modalPeriods.filter((t) => t <= 50)];
  return [...new Set(grid)].sort((a, b) => a - b);
}

/** The factor a calc's record is scaled by, and how it was found. */
export interface ScaleFactor {
  factor: number;
  explanation: string;
  periodRange?: [number, number];
}

/**
 * The record's scale factor. `factor`: as given. `spectrum`: from the unscaled record's spectrum
 * Sa_r and the design spectrum Sa_d at 50 periods spaced in log T over the range:
 *  - `mean`: the mean of Sa_d over the mean of Sa_r, so the scaled record's spectrum has the
 *    design spectrum's mean over the range (common practice);
 *  - `not-below-90`: the least factor that keeps the scaled record's spectrum at or above 90 %
 *    of the design spectrum at every one of those periods, the rule EN 1998-1 3.2.3.1.2(4)c sets
 *    for the mean spectrum of a set of records over 0.2 T1 to 2 T1.
 */
export function recordScaleFactor(
  scaling: RecordScaling,
  record: RecordSpectrumRequest['record'],
  dampingRatio: number,
  design: SpectrumInput,
): ScaleFactor {
  if (scaling.method === 'factor') {
    assertScale(scaling.factor, 'scaling.factor');
    return {
      factor: scaling.factor,
      explanation: `The record is multiplied by ${scaling.factor}, the factor given.`,
    };
  }
  const [from, to] = scaling.periodRange;
  if (!(from > 0) || !(to > from) || to > HISTORY_LIMITS.maxSpectrumPeriod) {
    throw new RangeError(
      `scaling.periodRange must be two periods in s, 0 < from < to <= ${HISTORY_LIMITS.maxSpectrumPeriod}`,
    );
  }
  const periods = scalingPeriods([from, to]);
  const { sa } = recordSpectrum({ record, dampingRatio, periods });
  const target = periods.map((t) => {
    const value = interpolateSpectrum(design.points, t, design.interpolation);
    if (value === null) {
      throw new RangeError(
        `scaling.periodRange reaches ${+t.toPrecision(3)} s, outside the design spectrum's table (${design.points[0].period} to ${design.points[design.points.length - 1].period} s)`,
      );
    }
    return value;
  });
  if (sa.some((value) => !(value > 0))) {
    throw new RangeError('scaling: the record has no response in the period range (all zero)');
  }
  const range = `${+from.toPrecision(3)} s to ${+to.toPrecision(3)} s`;
  const factor = spectrumScaleFactor(scaling.rule, sa, target);
  if (!(factor > 0) || factor > HISTORY_LIMITS.maxScale) {
    throw new RangeError(
      `scaling: the factor found (${factor.toPrecision(3)}) is outside 0 to ${HISTORY_LIMITS.maxScale}; check the record's units`,
    );
  }
  const explanation =
    scaling.rule === 'mean'
      ? `Scaled by ${factor.toPrecision(4)} so that the record's ${pct(dampingRatio)} spectrum has the design spectrum's mean over ${range} (50 periods, even in log T; common practice).`
      : `Scaled by ${factor.toPrecision(4)}, the least factor that keeps the record's ${pct(dampingRatio)} spectrum at or above 90 % of the design spectrum at 50 periods over ${range} (the rule of EN 1998-1 3.2.3.1.2(4)c for the mean of a set of records, here applied to one record).`;
  return { factor, explanation, periodRange: [from, to] };
}

const pct = (ratio: number) => `${+(ratio * 100).toPrecision(3)} % damped`;
