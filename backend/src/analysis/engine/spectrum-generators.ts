import {
  SPECTRUM_GENERATOR_LIMITS,
  type GroundType,
  type SpectrumGenerateRequest,
  type SpectrumGeneratorParameters,
  type SpectrumInterpolation,
  type SpectrumSource,
} from '@tiermode/shared-types';
import type { SpectrumPoint } from './spectrum';

/**
 * Design spectrum generators. Each returns an editable point table (T s, Sa g) that holds every
 * branch point exactly and samples the curved branches densely enough for linear interpolation
 * (the 1/T and 1/T^2 branches are also exact under log-log interpolation between the samples).
 */

/** A generated table and the formula it samples, Sa (g) at any period T (s). */
interface Formula {
  points: SpectrumPoint[];
  sa: (period: number) => number;
}

/** Periods from `from` to `to` (exclusive of `from`, inclusive of `to`), finer at short periods. */
function samplePeriods(from: number, to: number): number[] {
  const periods: number[] = [];
  let t = from;
  while (t < to - 1e-12) {
    const step = t < 1 ? 0.02 : t < 3 ? 0.05 : 0.25;
    t = Math.min(to, Math.round((t + step) * 1e6) / 1e6);
    periods.push(t);
  }
  return periods;
}

function positive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0)
    throw new RangeError(`${name} must be a positive number`);
}

/** The table's last period: bounded, so the number of samples (and the work) is too. */
function lastPeriod(value: number): number {
  positive('maxPeriod', value);
  const limit = SPECTRUM_GENERATOR_LIMITS.maxPeriod;
  if (value > limit) throw new RangeError(`maxPeriod must be at most ${limit} s`);
  return value;
}

export interface Asce7TwoPeriodInput {
  /** SDS, g */
  sds: number;
  /** SD1, g */
  sd1: number;
  /** TL, s */
  tl: number;
  /** Last period of the table, s (default the larger of 10 s and TL + 2 s). */
  maxPeriod?: number;
}

/**
 * The ASCE 7 two-period design response spectrum (ASCE 7-16 11.4.6; ASCE 7-22 11.4.5.2, clause
 * number from memory): T0 = 0.2 SD1/SDS, Ts = SD1/SDS;
 * Sa = SDS (0.4 + 0.6 T/T0) for T < T0; SDS for T0 <= T <= Ts; SD1/T for Ts < T <= TL;
 * SD1 TL / T^2 for T > TL.
 */
export function asce7TwoPeriodSpectrum(input: Asce7TwoPeriodInput): SpectrumPoint[] {
  return asce7TwoPeriod(input).points;
}

function asce7TwoPeriod(input: Asce7TwoPeriodInput): Formula {
  const { sds, sd1, tl } = input;
  positive('sds', sds);
  positive('sd1', sd1);
  positive('tl', tl);
  if (tl > SPECTRUM_GENERATOR_LIMITS.tl) {
    throw new RangeError(`tl must be at most ${SPECTRUM_GENERATOR_LIMITS.tl} s`);
  }
  const ts = sd1 / sds;
  const t0 = 0.2 * ts;
  if (tl <= ts) throw new RangeError('tl must be longer than Ts = SD1/SDS');
  const maxPeriod = lastPeriod(input.maxPeriod ?? Math.max(10, tl + 2));
  if (maxPeriod <= ts) throw new RangeError('maxPeriod must be longer than Ts = SD1/SDS');
  const sa = (t: number) =>
    t < t0 ? sds * (0.4 + (0.6 * t) / t0) : t <= ts ? sds : t <= tl ? sd1 / t : (sd1 * tl) / t ** 2;
  return {
    points: toPoints([0, t0, ts, tl, maxPeriod], samplePeriods(ts, maxPeriod), maxPeriod, sa),
    sa,
  };
}

export type En1998SpectrumType = 1 | 2;

/** S, TB, TC, TD by ground type: EN 1998-1:2004 Tables 3.2 (Type 1) and 3.3 (Type 2), from memory. */
export const EN1998_GROUND_PARAMETERS: Readonly<
  Record<
    En1998SpectrumType,
    Readonly<Record<GroundType, readonly [number, number, number, number]>>
  >
> = {
  1: {
    A: [1.0, 0.15, 0.4, 2.0],
    B: [1.2, 0.15, 0.5, 2.0],
    C: [1.15, 0.2, 0.6, 2.0],
    D: [1.35, 0.2, 0.8, 2.0],
    E: [1.4, 0.15, 0.5, 2.0],
  },
  2: {
    A: [1.0, 0.05, 0.25, 1.2],
    B: [1.35, 0.05, 0.25, 1.2],
    C: [1.5, 0.1, 0.25, 1.2],
    D: [1.8, 0.1, 0.3, 1.2],
    E: [1.6, 0.05, 0.25, 1.2],
  },
};

export interface En1998Input {
  /** Reference peak ground acceleration on type A ground, agR, in g. */
  agR: number;
  /** Importance factor gamma_I (default 1); ag = gamma_I agR. */
  importanceFactor?: number;
  groundType: GroundType;
  spectrumType: En1998SpectrumType;
  /** Last period of the table, s (default 4 s). */
  maxPeriod?: number;
}

function groundParameters(input: En1998Input) {
  const byGround = EN1998_GROUND_PARAMETERS[input.spectrumType];
  if (!byGround) throw new RangeError('spectrumType must be 1 or 2');
  const row = byGround[input.groundType];
  if (!row) throw new RangeError('groundType must be one of A, B, C, D, E');
  positive('agR', input.agR);
  const importance = input.importanceFactor ?? 1;
  positive('importanceFactor', importance);
  const maxPeriod = lastPeriod(input.maxPeriod ?? 4);
  const [s, tb, tc, td] = row;
  return { ag: importance * input.agR, s, tb, tc, td, maxPeriod };
}

/** eta = sqrt(10 / (5 + xi)) >= 0.55, xi in percent (EN 1998-1 3.2.2.2(3)). */
export function dampingCorrection(dampingPercent: number): number {
  if (!Number.isFinite(dampingPercent) || dampingPercent < 0) {
    throw new RangeError('dampingPercent must be a number >= 0');
  }
  return Math.max(0.55, Math.sqrt(10 / (5 + dampingPercent)));
}

/**
 * EN 1998-1:2004 3.2.2.2 horizontal elastic response spectrum, in g:
 * 0 <= T <= TB: ag S (1 + T/TB (2.5 eta - 1)); TB..TC: 2.5 ag S eta; TC..TD: 2.5 ag S eta TC/T;
 * TD..: 2.5 ag S eta TC TD / T^2.
 */
export function en1998ElasticSpectrum(
  input: En1998Input & { dampingPercent?: number },
): SpectrumPoint[] {
  return en1998Elastic(input).points;
}

function en1998Elastic(input: En1998Input & { dampingPercent?: number }): Formula {
  const { ag, s, tb, tc, td, maxPeriod } = groundParameters(input);
  const eta = dampingCorrection(input.dampingPercent ?? 5);
  const plateau = 2.5 * ag * s * eta;
  const sa = (t: number) =>
    t <= tb
      ? ag * s * (1 + (t / tb) * (2.5 * eta - 1))
      : t <= tc
        ? plateau
        : t <= td
          ? (plateau * tc) / t
          : (plateau * tc * td) / t ** 2;
  return {
    points: toPoints([0, tb, tc, td, maxPeriod], samplePeriods(tb, maxPeriod), maxPeriod, sa),
    sa,
  };
}

/**
 * EN 1998-1:2004 3.2.2.5 design spectrum for elastic analysis, in g, with behaviour factor q and
 * lower bound beta ag (beta = 0.2 recommended): 0 <= T <= TB: ag S (2/3 + T/TB (2.5/q - 2/3));
 * TB..TC: 2.5 ag S / q; TC..TD: max(2.5 ag S TC / (q T), beta ag); TD..: max(2.5 ag S TC TD /
 * (q T^2), beta ag).
 */
export function en1998DesignSpectrum(
  input: En1998Input & { q: number; beta?: number },
): SpectrumPoint[] {
  return en1998Design(input).points;
}

function en1998Design(input: En1998Input & { q: number; beta?: number }): Formula {
  const { ag, s, tb, tc, td, maxPeriod } = groundParameters(input);
  positive('q', input.q);
  const beta = input.beta ?? 0.2;
  positive('beta', beta);
  const plateau = (2.5 * ag * s) / input.q;
  const floor = beta * ag;
  // Where the falling branch meets the lower bound beta ag: on the TC..TD branch at
  // T = plateau TC / floor, else on the branch past TD at T = sqrt(plateau TC TD / floor).
  const onSecond = (plateau * tc) / floor;
  const corner = onSecond <= td ? onSecond : Math.sqrt((plateau * tc * td) / floor);
  const sa = (t: number) =>
    t <= tb
      ? ag * s * (2 / 3 + (t / tb) * (2.5 / input.q - 2 / 3))
      : t <= tc
        ? plateau
        : t <= td
          ? Math.max((plateau * tc) / t, floor)
          : Math.max((plateau * tc * td) / t ** 2, floor);
  const breakpoints = [0, tb, tc, td, maxPeriod, ...(corner > tc ? [corner] : [])];
  return { points: toPoints(breakpoints, samplePeriods(tb, maxPeriod), maxPeriod, sa), sa };
}

/**
 * The table: every breakpoint of the formula exactly (so that each branch, straight or 1/T^n,
 * is exact under the table's log-log interpolation between its points), and the samples between
 * them, up to the last period. A sample within 1e-9 s of a breakpoint gives way to it.
 */
function toPoints(
  breakpoints: number[],
  samples: number[],
  maxPeriod: number,
  sa: (t: number) => number,
): SpectrumPoint[] {
  const kept = breakpoints.filter((t) => t <= maxPeriod);
  const periods = [
    ...kept,
    ...samples.filter((t) => t <= maxPeriod && kept.every((b) => Math.abs(t - b) > 1e-9)),
  ].sort((a, b) => a - b);
  return periods
    .filter((t, i) => i === 0 || t - periods[i - 1] > 1e-9)
    .map((period) => ({ period, sa: sa(period) }));
}

/** A generated spectrum: the table, the formula behind it and the clause both follow. */
export interface GeneratedSpectrum extends Formula {
  interpolation: SpectrumInterpolation;
  basis: string;
  /** The spectrum's source as a calc stores it: the generator and its parameters. */
  source: SpectrumSource;
}

/**
 * The generator a request names, with its parameters. Throws RangeError naming the field when
 * a parameter is out of range (the request DTO has checked the types and which fields are set).
 */
export function generateSpectrum(request: SpectrumGenerateRequest): GeneratedSpectrum {
  const { kind, ...given } = request;
  // Only the parameters given, in a fixed order: the source is sealed with the calc.
  const parameters = Object.fromEntries(
    Object.entries(given).filter(([, value]) => value !== undefined && value !== null),
  ) as SpectrumGeneratorParameters;
  const source: SpectrumSource = { kind, parameters };
  const en = () => ({
    agR: request.agR as number,
    importanceFactor: request.importanceFactor,
    groundType: request.groundType as GroundType,
    spectrumType: request.spectrumType as En1998SpectrumType,
    maxPeriod: request.maxPeriod,
  });
  switch (kind) {
    case 'asce7-two-period':
      return {
        ...asce7TwoPeriod({
          sds: request.sds as number,
          sd1: request.sd1 as number,
          tl: request.tl as number,
          maxPeriod: request.maxPeriod,
        }),
        interpolation: 'log-log',
        basis: 'ASCE 7-16 11.4.6 two-period design response spectrum (ASCE 7-22 11.4.5.2)',
        source,
      };
    case 'en1998-elastic':
      return {
        ...en1998Elastic({ ...en(), dampingPercent: request.dampingPercent }),
        interpolation: 'log-log',
        basis: `EN 1998-1:2004 3.2.2.2 elastic spectrum, Type ${request.spectrumType}, ground ${request.groundType}`,
        source,
      };
    case 'en1998-design':
      return {
        ...en1998Design({ ...en(), q: request.q as number, beta: request.beta }),
        interpolation: 'log-log',
        basis: `EN 1998-1:2004 3.2.2.5 design spectrum, Type ${request.spectrumType}, ground ${request.groundType}, q = ${request.q}`,
        source,
      };
    default:
      throw new RangeError('kind must be one of: asce7-two-period, en1998-elastic, en1998-design');
  }
}
