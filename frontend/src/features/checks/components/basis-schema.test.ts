import { describe, expect, it } from 'vitest';
import { ctToDisplay, fromBasis, perLevel, perLevelLabel, toBasis } from './basis-schema';

describe('the code basis form values', () => {
  it('reads a per-level list, storey 1 first, and refuses a wrong count or a bad value', () => {
    expect(perLevel('1200, 1150;980', 3)).toEqual([1200, 1150, 980]);
    expect(perLevel('  ', 3)).toBeNull();
    expect(() => perLevel('1200, 1150', 3)).toThrow('Give one value per storey (3)');
    expect(() => perLevel('1200, -1, 980', 3)).toThrow('Every value must be a positive number');
  });

  it('turns the typed ASCE 7-22 values into the API basis, weights in N', () => {
    const values = { ...fromBasis(null, 'ASCE7-22'), seismicWeights: '1000, 2000' };
    const basis = toBasis(values, 2);
    expect(basis).toMatchObject({ code: 'ASCE7-22', sds: 1, r: 8, riskCategory: 'II' });
    expect((basis as { seismicWeights?: number[] }).seismicWeights).toEqual([1e6, 2e6]);
    // And back: kN in the form.
    expect(fromBasis(basis, 'ASCE7-22').seismicWeights).toBe('1000, 2000');
  });

  it('keeps the EN 1998-1 spectrum type a number and the ground type a letter', () => {
    const basis = toBasis(fromBasis(null, 'EN1998-1'), 3);
    expect(basis).toMatchObject({ code: 'EN1998-1', spectrumType: 1, groundType: 'C' });
  });

  it('shows Ct and the per-level list in US units, and saves them in SI', () => {
    // ASCE 7-22 Table 12.8-2 gives Ct = 0.0466 (SI) and 0.016 (US) for concrete moment
    // frames, x = 0.9: Ct(US) = Ct(SI) x 0.3048^x (common practice).
    expect(ctToDisplay('US', 0.0466, 0.9)).toBeCloseTo(0.016, 3);
    expect(ctToDisplay('SI', 0.0466, 0.9)).toBe(0.0466);
    const si = {
      ...(fromBasis(null, 'ASCE7-22') as object),
      seismicWeights: [4448.2216152605 * 100, 4448.2216152605 * 250],
    };
    const shown = fromBasis(si as never, 'ASCE7-22', 'US');
    expect(shown.seismicWeights).toBe('100, 250');
    expect(Number(shown.ct)).toBeCloseTo(0.016, 3);
    const back = toBasis(shown, 2, 'US') as { ct: number; seismicWeights: number[] };
    expect(back.ct).toBeCloseTo(0.0466, 6);
    expect(back.seismicWeights[1]).toBeCloseTo(4448.2216152605 * 250, 3);
    expect(perLevelLabel('ASCE7-22', 'US')).toBe('Seismic weight per level (kip)');
    expect(perLevelLabel('ASCE7-22', 'SI')).toBe('Seismic weight per level (kN)');
    expect(perLevelLabel('EN1998-1', 'SI')).toBe('Seismic mass per level (t)');
  });
});
