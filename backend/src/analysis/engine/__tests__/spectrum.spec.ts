import { assertSpectrum, spectralAcceleration } from '../spectrum';

const table = [
  { period: 0, sa: 0.4 },
  { period: 0.2, sa: 1.0 },
  { period: 1, sa: 1.0 },
  { period: 4, sa: 0.25 },
];

describe('spectralAcceleration (method.md: linear in T, or log Sa against log T)', () => {
  it('interpolates linearly in T', () => {
    expect(spectralAcceleration(table, 0.1).sa).toBeCloseTo(0.7, 14);
    expect(spectralAcceleration(table, 2.5).sa).toBeCloseTo(0.625, 14);
    expect(spectralAcceleration(table, 1).sa).toBe(1);
  });

  it('interpolates log-log between positive periods; SD1/T-like branches come out exact', () => {
    // Between (1, 1.0) and (4, 0.25) the table follows Sa = 1/T, a straight line in log-log.
    expect(spectralAcceleration(table, 2, 'log-log').sa).toBeCloseTo(0.5, 14);
    expect(spectralAcceleration(table, 2, 'linear').sa).toBeCloseTo(0.75, 14);
    // A segment starting at T = 0 has no logarithm: it is interpolated linearly.
    expect(spectralAcceleration(table, 0.1, 'log-log').sa).toBeCloseTo(0.7, 14);
  });

  it('uses the nearest end value outside the table and says so', () => {
    const above = spectralAcceleration(table, 6);
    expect(above.sa).toBe(0.25);
    expect(above.warning).toBe(
      'T = 6.000 s is above the spectrum table (which ends at 4 s); the last value was used',
    );
    const below = spectralAcceleration(table.slice(1), 0.1);
    expect(below.sa).toBe(1);
    expect(below.warning).toMatch(/below the spectrum table/);
    expect(spectralAcceleration(table, 3).warning).toBeUndefined();
  });

  it('refuses bad tables, naming the point', () => {
    expect(() => assertSpectrum([{ period: 0, sa: 1 }])).toThrow(
      'spectrum.points must have at least two points',
    );
    expect(() =>
      assertSpectrum([
        { period: 0.5, sa: 1 },
        { period: 0.5, sa: 1 },
      ]),
    ).toThrow('spectrum.points[1].period (point 2) must be greater than the period of point 1');
    expect(() =>
      assertSpectrum([
        { period: 0, sa: 1 },
        { period: 1, sa: -1 },
      ]),
    ).toThrow('spectrum.points[1].sa (point 2) must be a number >= 0');
    expect(() =>
      assertSpectrum([
        { period: -1, sa: 1 },
        { period: 1, sa: 1 },
      ]),
    ).toThrow('spectrum.points[0].period (point 1) must be a number >= 0');
  });
});
