import {
  amplifiedDrift,
  allowableDriftRatio,
  driftCheck,
  stabilityCoefficient,
} from '../checks/asce7-drift';
import {
  approximatePeriod,
  distributionExponent,
  elfPeriod,
  modalScaleFactor,
  seismicResponseCoefficient,
  upperLimitCoefficient,
  verticalDistribution,
} from '../checks/asce7-elf';
import {
  en1998CloselySpaced,
  en1998DriftCheck,
  en1998DriftLimitRatio,
  en1998ModeCountCheck,
  en1998ModesNeeded,
} from '../checks/en1998';
import { verticalIrregularities } from '../checks/irregularity';

// Every expected value below is worked by hand in the comment beside it, from the equation the
// clause gives (ASCE 7-22 and EN 1998-1:2004 as method.md cites them).

describe('ASCE 7-22 12.8.1.1 seismic response coefficient Cs', () => {
  const site = { sds: 1.0, sd1: 0.6, s1: 0.5, tl: 8, r: 8, ie: 1 };

  it('short period: SDS / (R/Ie) governs (Eq. 12.8-2)', () => {
    // 1.0 / 8 = 0.125; the cap 0.6 / (0.4 x 8) = 0.1875 is higher.
    const { cs, governs } = seismicResponseCoefficient({ ...site, period: 0.4 });
    expect(cs).toBeCloseTo(0.125, 12);
    expect(governs).toBe('12.8-2');
  });

  it('long period below TL: SD1 / (T R/Ie) governs (Eq. 12.8-3)', () => {
    // 0.6 / (1.2 x 8) = 0.0625, above the floor 0.044 x 1.0 x 1 = 0.044.
    const { cs, governs } = seismicResponseCoefficient({ ...site, period: 1.2 });
    expect(cs).toBeCloseTo(0.0625, 12);
    expect(governs).toBe('12.8-3');
  });

  it('beyond TL: SD1 TL / (T^2 R/Ie) governs (Eq. 12.8-4)', () => {
    // SDS 0.2, SD1 0.3, TL 4, R 3, T 4.5: 0.3 x 4 / (20.25 x 3) = 0.0197531; base 0.2/3 = 0.0667;
    // floor max(0.044 x 0.2, 0.01) = 0.01.
    const { cs, governs } = seismicResponseCoefficient({
      sds: 0.2,
      sd1: 0.3,
      s1: 0.2,
      tl: 4,
      r: 3,
      ie: 1,
      period: 4.5,
    });
    expect(cs).toBeCloseTo(1.2 / 60.75, 12);
    expect(governs).toBe('12.8-4');
  });

  it('the floor max(0.044 SDS Ie, 0.01) governs a long period (Eq. 12.8-5)', () => {
    // 0.6 / (2.0 x 8) = 0.0375 < 0.044 x 1.0 x 1 = 0.044.
    const { cs, governs } = seismicResponseCoefficient({ ...site, period: 2.0 });
    expect(cs).toBeCloseTo(0.044, 12);
    expect(governs).toBe('12.8-5');
  });

  it('near a fault, 0.5 S1 / (R/Ie) governs where S1 >= 0.6 g (Eq. 12.8-6)', () => {
    // S1 0.75: 0.5 x 0.75 / 8 = 0.046875 > 0.044 > 0.0375.
    const { cs, governs, values } = seismicResponseCoefficient({ ...site, s1: 0.75, period: 2.0 });
    expect(cs).toBeCloseTo(0.046875, 12);
    expect(governs).toBe('12.8-6');
    expect(values['12.8-5']).toBeCloseTo(0.044, 12);
  });
});

describe('ASCE 7-22 12.8.2 period: Ta = Ct hn^x and the Cu Ta cap', () => {
  it('Ta for a 36 m steel moment frame, Ct 0.0724, x 0.8 (SI, Table 12.8-2)', () => {
    // 36^0.8 = exp(0.8 ln 36) = exp(2.866815) = 17.58094; x 0.0724 = 1.272860 s.
    expect(approximatePeriod(0.0724, 0.8, 36)).toBeCloseTo(1.27286, 5);
  });

  it('Cu from Table 12.8-1 (from memory), interpolated between rows', () => {
    expect(upperLimitCoefficient(0.6)).toBe(1.4);
    expect(upperLimitCoefficient(0.25)).toBeCloseTo(1.45, 12); // halfway between 1.5 and 1.4
    expect(upperLimitCoefficient(0.05)).toBe(1.7);
  });

  it('caps the computed period at Cu Ta, and keeps a shorter one', () => {
    // Cu Ta = 1.4 x 1.272860 = 1.782004 s.
    const ta = approximatePeriod(0.0724, 0.8, 36);
    const capped = elfPeriod(2.3, ta, 1.4);
    expect(capped.capped).toBe(true);
    expect(capped.period).toBeCloseTo(1.782004, 5);
    expect(elfPeriod(1.5, ta, 1.4)).toEqual({ period: 1.5, capped: false });
  });
});

describe('ASCE 7-22 12.8.3 vertical distribution', () => {
  it('k = 1 at 0.5 s, 1.5 at 1.5 s, 2 at 2.5 s', () => {
    expect(distributionExponent(0.5)).toBe(1);
    expect(distributionExponent(1.5)).toBe(1.5); // 1 + (1.5 - 0.5) / 2
    expect(distributionExponent(2.5)).toBe(2);
    expect(distributionExponent(0.3)).toBe(1);
    expect(distributionExponent(4)).toBe(2);
  });

  it('Fx = V wx hx^k / sum wi hi^k (Eq. 12.8-11, 12.8-12)', () => {
    // k = 1: 1000x4 = 4000, 1000x8 = 8000, 500x12 = 6000; sum 18000; V = 100.
    const forces = verticalDistribution([1000, 1000, 500], [4, 8, 12], 100, 1);
    [22.2222222, 44.4444444, 33.3333333].forEach((f, i) => expect(forces[i]).toBeCloseTo(f, 6));
  });
});

describe('ASCE 7-22 12.9.1.4.1 scaling the modal forces to the ELF base shear', () => {
  it('scales by V / Vt when Vt < V, and not at all when Vt >= V', () => {
    expect(modalScaleFactor(1000, 800)).toBeCloseTo(1.25, 12);
    expect(modalScaleFactor(1000, 1100)).toBe(1);
    expect(modalScaleFactor(1000, 1000)).toBe(1);
  });
});

describe('ASCE 7-22 12.8.6 and 12.12.1 storey drift', () => {
  it('amplifies the elastic drift by Cd / Ie (Eq. 12.8-15)', () => {
    // 10 mm x 5.5 / 1.25 = 44 mm.
    expect(amplifiedDrift(0.01, 5.5, 1.25)).toBeCloseTo(0.044, 12);
  });

  it('holds risk category II to 0.020 hsx (Table 12.12-1, from memory)', () => {
    expect(allowableDriftRatio('II')).toBe(0.02);
    expect(allowableDriftRatio('III')).toBe(0.015);
    expect(allowableDriftRatio('IV')).toBe(0.01);
    // 3.5 m storey: the limit is 70 mm; 44 mm passes (ratio 0.012571), 80 mm fails (0.022857).
    expect(driftCheck(0.044, 3.5, 'II')).toMatchObject({ pass: true, value: { limit: 0.02 } });
    expect(driftCheck(0.08, 3.5, 'II').pass).toBe(false);
    expect(driftCheck(0.08, 3.5, 'II').value.ratio).toBeCloseTo(0.0228571, 6);
  });
});

describe('ASCE 7-22 12.8.7 stability coefficient', () => {
  const storey = { designDrift: 0.03, ie: 1, storeyShear: 1500, storeyHeight: 3.5, cd: 3 };

  it('below 0.10: P-delta may be neglected', () => {
    // 20000 x 0.03 x 1 / (1500 x 3.5 x 3) = 600 / 15750 = 0.038095.
    const { value, pass } = stabilityCoefficient({ ...storey, gravityLoad: 20000 });
    expect(value.theta).toBeCloseTo(0.038095, 6);
    expect(value.consequence).toBe('may be neglected');
    expect(pass).toBe(true);
  });

  it('between 0.10 and theta_max = 0.5 / (beta Cd): P-delta must be included', () => {
    // 70000 x 0.03 / 15750 = 0.133333; theta_max = 0.5 / 3 = 0.166667.
    const { value, pass } = stabilityCoefficient({ ...storey, gravityLoad: 70000 });
    expect(value.theta).toBeCloseTo(0.133333, 6);
    expect(value.thetaMax).toBeCloseTo(0.166667, 6);
    expect(value.consequence).toBe('must be included');
    expect(pass).toBe(true);
  });

  it('above theta_max the storey fails; theta_max is never more than 0.25', () => {
    // 100000 x 0.03 / 15750 = 0.190476 > 0.166667.
    const over = stabilityCoefficient({ ...storey, gravityLoad: 100000 });
    expect(over.value.theta).toBeCloseTo(0.190476, 6);
    expect(over.value.consequence).toBe('exceeds the limit');
    expect(over.pass).toBe(false);
    // Cd 1.5: 0.5 / 1.5 = 0.333 is capped at 0.25.
    expect(stabilityCoefficient({ ...storey, cd: 1.5, gravityLoad: 1 }).value.thetaMax).toBe(0.25);
  });
});

describe('ASCE 7-22 Table 12.3-2 vertical irregularities', () => {
  const mass = [100, 100, 100, 100];

  it('1a by the 70% rule: storey 1 has 65% of storey 2', () => {
    // 65 < 0.7 x 100; not 1b: 65 >= 0.6 x 100 and 65 >= 0.7 x (100 + 80 + 80) / 3 = 60.67.
    const [flag, ...rest] = verticalIrregularities([65, 100, 80, 80], mass);
    expect(rest).toEqual([]);
    expect(flag).toMatchObject({
      type: '1a',
      storey: 1,
      rule: 'stiffness < 70% of the storey above',
    });
  });

  it('1a only by the 80%-of-the-three-above rule', () => {
    // 75 >= 0.7 x 80 = 56, but 75 < 0.8 x (80 + 110 + 110) / 3 = 80; not 1b (75 >= 70).
    const flags = verticalIrregularities([75, 80, 110, 110], mass);
    expect(flags).toHaveLength(1);
    expect(flags[0]).toMatchObject({
      type: '1a',
      storey: 1,
      rule: 'stiffness < 80% of the average of the three storeys above',
    });
  });

  it('1b by the 60% rule, and 1b by the 70%-of-the-three-above rule', () => {
    // 50 < 0.6 x 100.
    expect(verticalIrregularities([50, 100, 60, 60], mass)).toEqual([
      expect.objectContaining({
        type: '1b',
        storey: 1,
        rule: 'stiffness < 60% of the storey above',
      }),
    ]);
    // 65 >= 60, but 65 < 0.7 x 100 = 70.
    expect(verticalIrregularities([65, 100, 100, 100], mass)).toEqual([
      expect.objectContaining({
        type: '1b',
        storey: 1,
        rule: 'stiffness < 70% of the average of the three storeys above',
      }),
    ]);
  });

  it('2, weight (mass): a storey more than 150% of an adjacent one', () => {
    // 160 > 1.5 x 100.
    const flags = verticalIrregularities([100, 100, 100, 100, 100], [100, 100, 160, 100, 80]);
    expect(flags).toEqual([expect.objectContaining({ type: '2', storey: 3 })]);
  });

  it('exempts a roof lighter than the floor below', () => {
    // 100 > 1.5 x 60 would flag storey 3, but the lighter roof is not compared.
    expect(verticalIrregularities([100, 100, 100, 100], [100, 100, 100, 60])).toEqual([]);
  });

  it('keeps a flag the drift-ratio exception covers, marked excepted with the reason (12.3.2.2)', () => {
    const flags = verticalIrregularities([65, 100, 80, 80], mass, [0.004, 0.0035, 0.003, 0.002]);
    // 0.004 / 0.0035 = 1.14 and 0.0035 / 0.003 = 1.17, both within 130%.
    expect(flags).toHaveLength(1);
    expect(flags[0].excepted).toBe(true);
    expect(flags[0].exceptionReason).toContain('12.3.2.2');
    const notExcepted = verticalIrregularities(
      [65, 100, 80, 80],
      mass,
      [0.006, 0.003, 0.003, 0.002],
    );
    expect(notExcepted[0].excepted).toBe(false); // 0.006 / 0.003 = 200%
  });
});

describe('EN 1998-1:2004', () => {
  it('4.4.3.2(1) drift limits: 0.005 h brittle, 0.0075 h ductile, 0.010 h none', () => {
    expect(en1998DriftLimitRatio('brittle')).toBe(0.005);
    expect(en1998DriftLimitRatio('ductile')).toBe(0.0075);
    expect(en1998DriftLimitRatio('none')).toBe(0.01);
    // d_r 30 mm, nu 0.5, h 3 m: 0.015 / 3 = 0.005 passes brittle exactly; 40 mm does not.
    expect(en1998DriftCheck(0.03, 0.5, 3, 'brittle').pass).toBe(true);
    expect(en1998DriftCheck(0.04, 0.5, 3, 'brittle')).toMatchObject({
      pass: false,
      clause: 'EN 1998-1:2004 4.4.3.2(1)a',
    });
    expect(en1998DriftCheck(0.04, 0.5, 3, 'ductile').pass).toBe(true); // 0.00667 <= 0.0075
  });

  it('4.3.3.3.1 mode count: 90% of the mass and every mode above 5%', () => {
    // 0.80 + 0.08 = 0.88 < 0.90; + 0.06 = 0.94, and mode 3 (6%) is kept: 3 modes.
    expect(en1998ModesNeeded([0.8, 0.08, 0.06, 0.03, 0.03])).toBe(3);
    // 0.85 + 0.06 = 0.91 reaches 90%, but mode 4 has 7% > 5%: 4 modes.
    expect(en1998ModesNeeded([0.85, 0.06, 0.02, 0.07])).toBe(4);
    expect(en1998ModesNeeded([0.5, 0.2])).toBeNull();
    expect(en1998ModeCountCheck([0.85, 0.06, 0.02, 0.07], 3)).toMatchObject({
      pass: false,
      value: { needed: 4 },
      clause: 'EN 1998-1:2004 4.3.3.3.1',
    });
    expect(en1998ModeCountCheck([0.85, 0.06, 0.02, 0.07], 4).pass).toBe(true);
  });

  it('4.3.3.3.2 closely spaced modes: T_j > 0.9 T_i, not acceptable for SRSS', () => {
    // 0.95 / 1.0 = 0.95 > 0.9 (modes 1, 2); 0.5 / 0.95 = 0.53 (independent).
    const close = en1998CloselySpaced([1.0, 0.95, 0.5], 'srss');
    expect(close).toMatchObject({ pass: false, value: { pairs: [[1, 2]] } });
    expect(en1998CloselySpaced([1.0, 0.95, 0.5], 'cqc').pass).toBe(true);
    expect(en1998CloselySpaced([1.0, 0.9, 0.5], 'srss').pass).toBe(true); // 0.9 exactly is independent
  });
});
