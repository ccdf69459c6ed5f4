import type { SpectrumInterpolation, SpectrumPointInput } from './analysis';

/**
 * Sa at a period inside a sorted spectrum table (method.md, "Spectrum and modal maxima"): linear
 * in T, or with `log-log` linear in log Sa against log T. A log-log segment needs both ends
 * positive in T and Sa; a segment that starts at T = 0 or touches Sa = 0 is interpolated
 * linearly. Returns null outside the table: what happens there is the caller's to say. The
 * engine reads the spectrum through this, and the spectrum plot places the modal periods with it.
 */
export function interpolateSpectrum(
  points: readonly SpectrumPointInput[],
  period: number,
  interpolation: SpectrumInterpolation = 'linear',
): number | null {
  const first = points[0];
  const last = points[points.length - 1];
  if (!first || !last || period < first.period || period > last.period) return null;
  // Binary search for the segment [lo, lo + 1] holding the period.
  let lo = 0;
  let hi = points.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (points[mid].period <= period) lo = mid;
    else hi = mid;
  }
  const a = points[lo];
  const b = points[hi];
  if (period === a.period) return a.sa;
  if (period === b.period) return b.sa;
  const logLog = interpolation === 'log-log' && a.period > 0 && a.sa > 0 && b.sa > 0;
  if (logLog) {
    const t = Math.log(period / a.period) / Math.log(b.period / a.period);
    return Math.exp(Math.log(a.sa) + t * Math.log(b.sa / a.sa));
  }
  const t = (period - a.period) / (b.period - a.period);
  return a.sa + t * (b.sa - a.sa);
}

/** A problem with one point of a spectrum table, in the user's words. */
export interface SpectrumPointProblem {
  /** 0-based index of the point. */
  index: number;
  field: 'period' | 'sa' | 'points';
  message: string;
}

/**
 * What is wrong with a spectrum table as typed, point by point: "Point 3: the period must be
 * greater than 0.6 s above it". The server refuses the same tables (engine `assertSpectrum`).
 */
export function spectrumPointProblems(
  points: readonly SpectrumPointInput[],
  limits: { min: number; max: number } = { min: 2, max: 1000 },
): SpectrumPointProblem[] {
  const problems: SpectrumPointProblem[] = [];
  points.forEach((p, i) => {
    const name = `Point ${i + 1}`;
    if (!Number.isFinite(p.period) || p.period < 0) {
      problems.push({
        index: i,
        field: 'period',
        message: `${name}: the period must be 0 s or more`,
      });
    } else if (i > 0 && Number.isFinite(points[i - 1].period) && p.period <= points[i - 1].period) {
      problems.push({
        index: i,
        field: 'period',
        message: `${name}: the period must be greater than ${points[i - 1].period} s above it`,
      });
    }
    if (!Number.isFinite(p.sa) || p.sa < 0) {
      problems.push({ index: i, field: 'sa', message: `${name}: Sa must be 0 g or more` });
    }
  });
  if (points.length < limits.min) {
    problems.push({
      index: Math.max(points.length - 1, 0),
      field: 'points',
      message: `A spectrum needs at least ${limits.min} points`,
    });
  }
  if (points.length > limits.max) {
    problems.push({
      index: points.length - 1,
      field: 'points',
      message: `A spectrum has at most ${limits.max} points`,
    });
  }
  return problems;
}
