import { analyse } from '../analyse';
import { generateSpectrum } from '../spectrum-generators';

// One storey of 100 t on 100 kN/m: T = 2 pi sqrt(m / k) = 2 pi s (common practice: the single
// degree of freedom oscillator, Chopra, Dynamics of Structures, chapter 2).
const storeys = [{ mass: 1e5, stiffness: 1e5, height: 4 }];
const T = 2 * Math.PI;

function generated(request: Parameters<typeof generateSpectrum>[0]) {
  const { points, interpolation, source } = generateSpectrum(request);
  return { points, interpolation, source };
}

describe('Sa past the end of a generated table', () => {
  it('ASCE 7: the T > TL branch SD1 TL / T^2 (ASCE 7-16 11.4.6, Eq. 11.4-8; clause from memory)', () => {
    const spectrum = generated({ kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 4, maxPeriod: 5 });
    const result = analyse({ storeys, spectrum, dampingRatio: 0.05 });
    expect(result.modes[0].sa).toBeCloseTo((0.6 * 4) / T ** 2, 12);
    expect(result.warnings).toContain(
      "Mode 1: T = 6.283 s is above the spectrum table (which ends at 5 s); Sa was taken from the generator's own formula there (ASCE 7-16 11.4.6 two-period design response spectrum (ASCE 7-22 11.4.5.2)).",
    );
  });

  it('EN 1998-1 design: the lower bound beta ag past TD (EN 1998-1:2004 3.2.2.5, Eq. 3.16; equation number from memory)', () => {
    // ag = 0.3 g, ground C type 1 (S 1.15, TC 0.6, TD 2.0), q = 4: 2.5 ag S TC TD / (q T^2) =
    // 0.0262 g at 2 pi s, below beta ag = 0.06 g, so the floor governs.
    const spectrum = generated({
      kind: 'en1998-design',
      agR: 0.3,
      groundType: 'C',
      spectrumType: 1,
      q: 4,
      maxPeriod: 4,
    });
    const result = analyse({ storeys, spectrum, dampingRatio: 0.05 });
    expect(result.modes[0].sa).toBeCloseTo(0.2 * 0.3, 12);
  });

  it('EN 1998-1 elastic: the 1/T^2 branch past TD (EN 1998-1:2004 3.2.2.2, Eq. 3.4; equation number from memory)', () => {
    const spectrum = generated({
      kind: 'en1998-elastic',
      agR: 0.25,
      groundType: 'B',
      spectrumType: 1,
      maxPeriod: 4,
    });
    const result = analyse({ storeys, spectrum, dampingRatio: 0.05 });
    // ag 0.25 g, S 1.2, eta 1 (5% damping), TC 0.5, TD 2.0 (Table 3.2, from memory).
    expect(result.modes[0].sa).toBeCloseTo((2.5 * 0.25 * 1.2 * 0.5 * 2) / T ** 2, 12);
  });

  it('a typed table keeps its last value, with the warning', () => {
    const { points } = generated({
      kind: 'asce7-two-period',
      sds: 1,
      sd1: 0.6,
      tl: 4,
      maxPeriod: 5,
    });
    const result = analyse({
      storeys,
      spectrum: { points, interpolation: 'log-log', source: { kind: 'user' } },
      dampingRatio: 0.05,
    });
    expect(result.modes[0].sa).toBe(points[points.length - 1].sa);
    expect(result.warnings[0]).toMatch(/above the spectrum table .* its last value was used/);
  });

  it('a generated table edited afterwards is read as a typed table, and says which point', () => {
    const spectrum = generated({ kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 4, maxPeriod: 5 });
    spectrum.points[3] = { ...spectrum.points[3], sa: spectrum.points[3].sa * 1.1 };
    const result = analyse({ storeys, spectrum, dampingRatio: 0.05 });
    expect(result.modes[0].sa).toBe(spectrum.points[spectrum.points.length - 1].sa);
    expect(result.warnings).toContain(
      'The spectrum table no longer matches its generator (point 4 differs), so it is read as a typed table: past its end its last value is used.',
    );
  });

  it('refuses a source whose parameters the generator refuses, naming the parameter', () => {
    const spectrum = generated({ kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 4, maxPeriod: 5 });
    const bad = {
      ...spectrum,
      source: { kind: 'asce7-two-period' as const, parameters: { sds: 1, sd1: 0.6, tl: 0.1 } },
    };
    expect(() => analyse({ storeys, spectrum: bad, dampingRatio: 0.05 })).toThrow(
      'spectrum.source.parameters: tl must be longer than Ts = SD1/SDS',
    );
  });

  it('returns the source with only the parameters given', () => {
    expect(generated({ kind: 'asce7-two-period', sds: 1, sd1: 0.6, tl: 4 }).source).toEqual({
      kind: 'asce7-two-period',
      parameters: { sds: 1, sd1: 0.6, tl: 4 },
    });
  });
});
