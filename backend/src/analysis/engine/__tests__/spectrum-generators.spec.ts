import { spectralAcceleration } from '../spectrum';
import {
  asce7TwoPeriodSpectrum,
  dampingCorrection,
  en1998DesignSpectrum,
  en1998ElasticSpectrum,
} from '../spectrum-generators';

const at = (points: ReturnType<typeof asce7TwoPeriodSpectrum>, t: number) =>
  spectralAcceleration(points, t, 'log-log').sa;

describe('ASCE 7 two-period design spectrum (ASCE 7-16 11.4.6)', () => {
  // SDS = 1.0 g, SD1 = 0.6 g, TL = 8 s: T0 = 0.12 s, Ts = 0.6 s, worked by hand.
  const points = asce7TwoPeriodSpectrum({ sds: 1.0, sd1: 0.6, tl: 8 });

  it('passes through the branch points', () => {
    expect(at(points, 0)).toBeCloseTo(0.4, 12); // 0.4 SDS at T = 0
    expect(at(points, 0.12)).toBeCloseTo(1.0, 12); // SDS at T0
    expect(at(points, 0.6)).toBeCloseTo(1.0, 12); // SDS at Ts
    expect(at(points, 8)).toBeCloseTo(0.075, 12); // SD1/TL at TL
  });

  it('follows 0.4 + 0.6 T/T0, SD1/T and SD1 TL / T^2 between them', () => {
    expect(at(points, 0.06)).toBeCloseTo(0.7, 12); // SDS (0.4 + 0.6 x 0.5)
    expect(at(points, 1.5)).toBeCloseTo(0.4, 9); // 0.6 / 1.5
    expect(at(points, 2.37)).toBeCloseTo(0.6 / 2.37, 9);
    expect(at(points, 10)).toBeCloseTo((0.6 * 8) / 100, 9); // 0.048
    expect(points[points.length - 1].period).toBe(10);
  });

  it('refuses bad parameters, naming them', () => {
    expect(() => asce7TwoPeriodSpectrum({ sds: -1, sd1: 0.6, tl: 8 })).toThrow(
      'sds must be a positive number',
    );
    expect(() => asce7TwoPeriodSpectrum({ sds: 1, sd1: 0.6, tl: 0.5 })).toThrow(
      'tl must be longer than Ts = SD1/SDS',
    );
  });
});

describe('EN 1998-1:2004 spectra', () => {
  it('takes eta = 1 at 5% damping and never below 0.55 (3.2.2.2(3))', () => {
    expect(dampingCorrection(5)).toBe(1);
    expect(dampingCorrection(10)).toBeCloseTo(Math.sqrt(10 / 15), 14);
    expect(dampingCorrection(40)).toBe(0.55);
  });

  it('gives the Type 1, ground C elastic spectrum at its branch points (3.2.2.2, Table 3.2 from memory)', () => {
    // ag = 0.25 g, S = 1.15, TB = 0.2, TC = 0.6, TD = 2.0 s, eta = 1: plateau 2.5 x 0.25 x 1.15 = 0.71875 g.
    const points = en1998ElasticSpectrum({ agR: 0.25, groundType: 'C', spectrumType: 1 });
    const sa = (t: number) => spectralAcceleration(points, t, 'log-log').sa;
    expect(sa(0)).toBeCloseTo(0.2875, 12); // ag S
    expect(sa(0.2)).toBeCloseTo(0.71875, 12);
    expect(sa(0.6)).toBeCloseTo(0.71875, 12);
    expect(sa(1.2)).toBeCloseTo(0.359375, 9); // x TC/T = 0.5
    expect(sa(2.0)).toBeCloseTo(0.215625, 12);
    expect(sa(4.0)).toBeCloseTo((0.71875 * 0.6 * 2) / 16, 9);
  });

  it('gives the Type 2, ground A elastic spectrum with 10% damping (Table 3.3 from memory)', () => {
    const points = en1998ElasticSpectrum({
      agR: 0.1,
      groundType: 'A',
      spectrumType: 2,
      dampingPercent: 10,
    });
    const eta = Math.sqrt(10 / 15);
    expect(spectralAcceleration(points, 0.05).sa).toBeCloseTo(0.25 * eta, 12); // TB = 0.05 s
    expect(spectralAcceleration(points, 0.25).sa).toBeCloseTo(0.25 * eta, 12); // TC = 0.25 s
  });

  it('gives the design spectrum with q and the beta ag lower bound (3.2.2.5)', () => {
    // ag = 0.3 g, ground B Type 1 (S = 1.2, TB 0.15, TC 0.5, TD 2.0), q = 4, beta = 0.2:
    // T = 0: 0.3 x 1.2 x 2/3 = 0.24; plateau 2.5 x 0.3 x 1.2 / 4 = 0.225; floor 0.06 g.
    const points = en1998DesignSpectrum({ agR: 0.3, groundType: 'B', spectrumType: 1, q: 4 });
    const sa = (t: number) => spectralAcceleration(points, t, 'log-log').sa;
    expect(sa(0)).toBeCloseTo(0.24, 12);
    expect(sa(0.15)).toBeCloseTo(0.225, 12);
    expect(sa(0.5)).toBeCloseTo(0.225, 12);
    expect(sa(1.0)).toBeCloseTo(0.1125, 9);
    // At TD the branch gives 0.225 x 0.5 / 2 = 0.05625 g, below the 0.06 g floor, which governs.
    expect(sa(2.0)).toBeCloseTo(0.06, 12);
    expect(sa(4.0)).toBeCloseTo(0.06, 12);
  });

  it('refuses an unknown ground type or spectrum type', () => {
    expect(() =>
      en1998ElasticSpectrum({ agR: 0.1, groundType: 'F' as 'A', spectrumType: 1 }),
    ).toThrow('groundType must be one of A, B, C, D, E');
    expect(() =>
      en1998ElasticSpectrum({ agR: 0.1, groundType: 'A', spectrumType: 3 as 1 }),
    ).toThrow('spectrumType must be 1 or 2');
  });
});

describe('generator bounds', () => {
  it('refuses periods past the limits before sampling anything', () => {
    expect(() => asce7TwoPeriodSpectrum({ sds: 1, sd1: 0.6, tl: 1e9 })).toThrow(
      new RangeError('tl must be at most 50 s'),
    );
    expect(() => asce7TwoPeriodSpectrum({ sds: 1, sd1: 0.6, tl: 8, maxPeriod: 1e17 })).toThrow(
      new RangeError('maxPeriod must be at most 100 s'),
    );
    expect(() =>
      en1998ElasticSpectrum({ agR: 0.2, groundType: 'A', spectrumType: 1, maxPeriod: 101 }),
    ).toThrow(new RangeError('maxPeriod must be at most 100 s'));
  });
});

/**
 * Each generated table, read the way the analysis reads it (log-log, straight from T = 0),
 * against its clause's formula written out again here, at 4,001 periods from 0 to the table's
 * end: every breakpoint is in the table, so every branch is exact to rounding.
 */
describe('generated tables against their formulas, densely (relative 1e-9)', () => {
  const dense = (maxPeriod: number) =>
    Array.from({ length: 4001 }, (_, i) => (maxPeriod * i) / 4000);
  const agree = (
    points: ReturnType<typeof asce7TwoPeriodSpectrum>,
    formula: (t: number) => number,
    maxPeriod: number,
  ) => {
    let worst = 0;
    for (const t of dense(maxPeriod)) {
      const expected = formula(t);
      const error = Math.abs(at(points, t) - expected) / expected;
      worst = Math.max(worst, error);
    }
    expect(worst).toBeLessThan(1e-9);
  };

  it.each([
    [1.0, 0.6, 8],
    [1.5, 0.9, 12],
    [0.3, 0.45, 4],
    [2.1, 0.35, 16],
  ])('ASCE 7-16 11.4.6 (Eq. 11.4-5 to 11.4-7), SDS %s, SD1 %s, TL %s', (sds, sd1, tl) => {
    const t0 = (0.2 * sd1) / sds;
    const ts = sd1 / sds;
    const formula = (t: number) =>
      t < t0
        ? sds * (0.4 + (0.6 * t) / t0)
        : t <= ts
          ? sds
          : t <= tl
            ? sd1 / t
            : (sd1 * tl) / (t * t);
    const maxPeriod = Math.max(10, tl + 2);
    agree(asce7TwoPeriodSpectrum({ sds, sd1, tl }), formula, maxPeriod);
    const periods = asce7TwoPeriodSpectrum({ sds, sd1, tl }).map((p) => p.period);
    for (const breakpoint of [0, t0, ts, tl, maxPeriod]) {
      expect(periods.some((t) => Math.abs(t - breakpoint) < 1e-12)).toBe(true);
    }
  });

  // S, TB, TC, TD: EN 1998-1:2004 Tables 3.2 (Type 1) and 3.3 (Type 2), from memory.
  const GROUND = {
    1: { A: [1.0, 0.15, 0.4, 2.0], C: [1.15, 0.2, 0.6, 2.0], E: [1.4, 0.15, 0.5, 2.0] },
    2: { B: [1.35, 0.05, 0.25, 1.2], D: [1.8, 0.1, 0.3, 1.2] },
  } as const;
  const cases = Object.entries(GROUND).flatMap(([type, grounds]) =>
    Object.entries(grounds).map(
      ([ground, row]) => [Number(type) as 1 | 2, ground as 'A', row as readonly number[]] as const,
    ),
  );

  it.each(cases)('EN 1998-1 3.2.2.2 (Eq. 3.2 to 3.5), Type %s, ground %s', (type, ground, row) => {
    const [s, tb, tc, td] = row;
    const ag = 0.3 * 1.2; // agR 0.3 g, gamma_I 1.2
    const eta = Math.max(0.55, Math.sqrt(10 / (5 + 7))); // 7 % damping, Eq. 3.6
    const formula = (t: number) =>
      t <= tb
        ? ag * s * (1 + (t / tb) * (eta * 2.5 - 1))
        : t <= tc
          ? ag * s * eta * 2.5
          : t <= td
            ? ag * s * eta * 2.5 * (tc / t)
            : ag * s * eta * 2.5 * ((tc * td) / (t * t));
    const points = en1998ElasticSpectrum({
      agR: 0.3,
      importanceFactor: 1.2,
      groundType: ground,
      spectrumType: type,
      dampingPercent: 7,
      maxPeriod: 6,
    });
    agree(points, formula, 6);
  });

  it.each(
    cases.flatMap(([type, ground, row]) =>
      [1.5, 3.9, 6].map((q) => [type, ground, row, q] as const),
    ),
  )(
    'EN 1998-1 3.2.2.5 (Eq. 3.13 to 3.16), Type %s, ground %s, q = %s, with the beta ag corner',
    (type, ground, row, q) => {
      const [s, tb, tc, td] = row;
      const ag = 0.25;
      const beta = 0.2;
      const formula = (t: number) =>
        t <= tb
          ? ag * s * (2 / 3 + (t / tb) * (2.5 / q - 2 / 3))
          : t <= tc
            ? (ag * s * 2.5) / q
            : t <= td
              ? Math.max(((ag * s * 2.5) / q) * (tc / t), beta * ag)
              : Math.max(((ag * s * 2.5) / q) * ((tc * td) / (t * t)), beta * ag);
      const points = en1998DesignSpectrum({
        agR: 0.25,
        groundType: ground,
        spectrumType: type,
        q,
        maxPeriod: 8,
      });
      agree(points, formula, 8);
      // The corner where the bound takes over is a point of the table.
      const corner = [tc, ...dense(8)].find((t) => t > tc && formula(t) === beta * ag);
      if (corner !== undefined) {
        const exact =
          (2.5 * s * tc) / (q * beta) <= td
            ? (2.5 * s * tc) / (q * beta)
            : Math.sqrt((2.5 * s * tc * td) / (q * beta));
        expect(points.some((p) => Math.abs(p.period - exact) < 1e-12)).toBe(true);
      }
    },
  );
});
