import { interpolateSpectrum } from '@tiermode/shared-types';
import { isArray } from './guards';
/** One point of a design spectrum: period T (s) and spectral acceleration Sa (g). */
export interface SpectrumPoint {
  period: number;
  sa: number;
}

export type SpectrumInterpolation = 'linear' | 'log-log';

export interface SpectralValue {
  sa: number;
  /** Set when the period lies outside the table and the nearest end value was used. */
  warning?: string;
}

/**
 * Checks a design spectrum table: at least two points, periods finite, >= 0 and strictly
 * increasing, Sa finite and >= 0. Throws TypeError or RangeError naming the point.
 */
export function assertSpectrum(points: readonly SpectrumPoint[]): void {
  if (!isArray(points)) throw new TypeError('spectrum.points must be an array');
  if (points.length < 2) throw new RangeError('spectrum.points must have at least two points');
  points.forEach((point, i) => {
    const where = `spectrum.points[${i}]`;
    if (typeof point?.period !== 'number' || !Number.isFinite(point.period) || point.period < 0) {
      throw new RangeError(`${where}.period (point ${i + 1}) must be a number >= 0`);
    }
    if (typeof point.sa !== 'number' || !Number.isFinite(point.sa) || point.sa < 0) {
      throw new RangeError(`${where}.sa (point ${i + 1}) must be a number >= 0`);
    }
    if (i > 0 && point.period <= points[i - 1].period) {
      throw new RangeError(
        `${where}.period (point ${i + 1}) must be greater than the period of point ${i}`,
      );
    }
  });
}

/**
 * Sa at period T from the table (method.md, "Spectrum and modal maxima"): linear interpolation
 * in T, or with `log-log` linear in log Sa against log T. A log-log segment needs both ends
 * positive in T and Sa; a segment that starts at T = 0 or touches Sa = 0 is interpolated
 * linearly. Outside the table the nearest end value is used and a warning says so.
 */
export function spectralAcceleration(
  points: readonly SpectrumPoint[],
  period: number,
  interpolation: SpectrumInterpolation = 'linear',
): SpectralValue {
  assertSpectrum(points);
  if (!Number.isFinite(period) || period < 0) throw new RangeError('period must be a number >= 0');
  const first = points[0];
  const last = points[points.length - 1];
  if (period < first.period) {
    return { sa: first.sa, warning: outside(period, 'below', first.period) };
  }
  if (period > last.period) {
    return { sa: last.sa, warning: outside(period, 'above', last.period) };
  }
  // Inside the table: the one interpolation the plots use too.
  return { sa: interpolateSpectrum(points, period, interpolation) as number };
}

function outside(period: number, side: 'below' | 'above', end: number): string {
  return `T = ${period.toPrecision(4)} s is ${side} the spectrum table (which ${
    side === 'below' ? 'starts' : 'ends'
  } at ${end} s); the ${side === 'below' ? 'first' : 'last'} value was used`;
}
