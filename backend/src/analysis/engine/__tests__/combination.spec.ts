import {
  combineAbs,
  combineCqc,
  combineSrss,
  correlationCoefficient,
  correlationMatrix,
} from '../combination';

describe('correlationCoefficient (Der Kiureghian 1980; Wilson, Der Kiureghian & Bayo 1981)', () => {
  it('is 1 for a mode with itself and symmetric in the two modes', () => {
    expect(correlationCoefficient(5, 5, 0.05)).toBeCloseTo(1, 14);
    expect(correlationCoefficient(4, 5, 0.05)).toBeCloseTo(correlationCoefficient(5, 4, 0.05), 14);
  });

  it('matches the published formula worked by hand at beta = 0.9 and 0.5, zeta = 5%', () => {
    // rho = 8 z^2 (1 + b) b^1.5 / ((1 - b^2)^2 + 4 z^2 b (1 + b)^2), worked by hand:
    // b = 0.9: 8(0.0025)(1.9)(0.853815) / (0.0361 + 0.03249) = 0.032445 / 0.06859 = 0.47303
    // b = 0.5: 8(0.0025)(1.5)(0.353553) / (0.5625 + 0.01125) = 0.0106066 / 0.57375 = 0.018486
    expect(correlationCoefficient(1, 0.9, 0.05)).toBeCloseTo(0.47303, 4);
    expect(correlationCoefficient(1, 0.5, 0.05)).toBeCloseTo(0.018486, 5);
  });

  it('tends to 0 for distinct modes as damping tends to 0, and stays within (0, 1]', () => {
    expect(correlationCoefficient(1, 1.5, 1e-6)).toBeLessThan(1e-10);
    for (const beta of [0.1, 0.5, 0.8, 0.95, 0.999, 1.2, 3]) {
      for (const zeta of [0.01, 0.05, 0.2]) {
        const rho = correlationCoefficient(1, beta, zeta);
        expect(rho).toBeGreaterThan(0);
        expect(rho).toBeLessThanOrEqual(1);
      }
    }
  });

  it('rises towards 1 as the modes close in', () => {
    const values = [0.5, 0.8, 0.9, 0.95, 0.99].map((b) => correlationCoefficient(1, b, 0.05));
    values.forEach((v, i) => i > 0 && expect(v).toBeGreaterThan(values[i - 1]));
    expect(values[4]).toBeGreaterThan(0.98);
  });

  it('refuses damping outside (0, 1) and non-positive frequencies', () => {
    expect(() => correlationCoefficient(1, 2, 0)).toThrow('dampingRatio must be between 0 and 1');
    expect(() => correlationCoefficient(1, 2, 1)).toThrow(RangeError);
    expect(() => correlationCoefficient(0, 2, 0.05)).toThrow(
      'circular frequencies must be positive numbers',
    );
  });
});

describe('combining modal maxima', () => {
  const modal = [
    [3, -2, 0.5],
    [-1, 4, 0.25],
    [0.5, 0.5, -2],
  ];

  it('SRSS is the root of the sum of squares (Rosenblueth)', () => {
    expect(combineSrss(modal)).toEqual([Math.sqrt(10.25), Math.sqrt(20.25), Math.sqrt(4.3125)]);
  });

  it('ABS is the sum of absolute values', () => {
    expect(combineAbs(modal)).toEqual([4.5, 6.5, 2.75]);
  });

  it('CQC with rho = I is SRSS, and with all rho = 1 is the absolute value of the sum', () => {
    const identity = [
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
    ];
    const ones = [
      [1, 1, 1],
      [1, 1, 1],
      [1, 1, 1],
    ];
    combineCqc(modal, identity).forEach((v, k) => expect(v).toBeCloseTo(combineSrss(modal)[k], 14));
    expect(combineCqc(modal, ones)).toEqual([2.5, 2.5, 1.25]);
  });

  it('CQC lies between SRSS-like and ABS bounds for real correlations, and tends to SRSS for far-apart modes with little damping', () => {
    const omegas = [2, 7, 15];
    const cqc = combineCqc(modal, correlationMatrix(omegas, 0.05));
    const abs = combineAbs(modal);
    cqc.forEach((v, k) => expect(v).toBeLessThanOrEqual(abs[k]));
    const nearlyUndamped = combineCqc(modal, correlationMatrix(omegas, 1e-7));
    nearlyUndamped.forEach((v, k) => expect(v).toBeCloseTo(combineSrss(modal)[k], 10));
  });

  it('builds a symmetric correlation matrix with ones on the diagonal', () => {
    const rho = correlationMatrix([1, 1.1, 3], 0.05);
    expect(rho[0][0]).toBe(1);
    expect(rho[0][1]).toBe(rho[1][0]);
    expect(rho[1][2]).toBeCloseTo(correlationCoefficient(1.1, 3, 0.05), 15);
  });
});
