import { describe, expect, it } from 'vitest';
import { fromBasis, perLevel, toBasis } from './basis-schema';

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
});
