import { analyse, ENGINE_VERSION } from '../analyse';
import { storeyStiffnessFromColumns } from '../column-stiffness';
import { STANDARD_GRAVITY } from '../modal-response';
import { randomBuilding, seededRandom, uniformBuilding } from './buildings';

const flat = (sa: number) => ({
  points: [
    { period: 0, sa },
    { period: 10, sa },
  ],
});

describe('analyse', () => {
  const storeys = randomBuilding(8, seededRandom(42));
  const result = analyse({ storeys, spectrum: flat(0.5), dampingRatio: 0.05 });

  it('returns every mode and the fields of the API contract', () => {
    expect(result.modes).toHaveLength(8);
    expect(result.availableModes).toBe(8);
    expect(result.engineVersion).toBe(ENGINE_VERSION);
    expect(result.correlation).toHaveLength(8);
    expect(Object.keys(result.combined.cqc).sort()).toEqual([
      'baseMoment',
      'baseShear',
      'displacement',
      'drift',
      'driftRatio',
      'floorForce',
      'overturningMoment',
      'storeyShear',
    ]);
  });

  it('keeps the modal invariants: floor forces sum to the base shear M* A (Chopra ch. 13)', () => {
    for (const mode of result.modes) {
      const sum = mode.response.floorForce.reduce((s, f) => s + f, 0);
      expect(Math.abs(sum - mode.response.baseShear)).toBeLessThan(
        1e-9 * Math.abs(mode.response.baseShear),
      );
      expect(mode.response.storeyShear[0]).toBeCloseTo(sum, 6);
      expect(mode.response.baseShear).toBeCloseTo(mode.effectiveMass * 0.5 * STANDARD_GRAVITY, 6);
    }
  });

  it('gives, with a flat spectrum and all modes, an ABS base shear >= CQC and SRSS', () => {
    const { srss, cqc, abs } = result.combined;
    for (const key of [
      'displacement',
      'drift',
      'floorForce',
      'storeyShear',
      'overturningMoment',
    ] as const) {
      abs[key].forEach((v, i) => {
        expect(v).toBeGreaterThanOrEqual(cqc[key][i] * (1 - 1e-12));
        expect(v).toBeGreaterThanOrEqual(srss[key][i] * (1 - 1e-12));
        expect(cqc[key][i]).toBeGreaterThanOrEqual(0);
      });
    }
    expect(abs.baseShear).toBeGreaterThanOrEqual(cqc.baseShear);
    cqc.driftRatio.forEach((r, i) => expect(r).toBeCloseTo(cqc.drift[i] / storeys[i].height, 15));
    expect(cqc.baseMoment).toBe(cqc.overturningMoment[0]);
  });

  it('gives a one-storey building the single-degree-of-freedom answer: V = m Sa g, u = Sa g / w^2', () => {
    const one = analyse({
      storeys: [{ mass: 2e5, stiffness: 8e7, height: 4 }],
      spectrum: flat(0.3),
      dampingRatio: 0.05,
    });
    const w2 = 8e7 / 2e5;
    expect(one.combined.cqc.baseShear).toBeCloseTo(2e5 * 0.3 * STANDARD_GRAVITY, 6);
    expect(one.combined.srss.displacement[0]).toBeCloseTo((0.3 * STANDARD_GRAVITY) / w2, 12);
    expect(one.combined.abs.overturningMoment[0]).toBeCloseTo(2e5 * 0.3 * STANDARD_GRAVITY * 4, 4);
  });

  it('uses the first n modes or the fewest reaching a mass ratio, and warns below 90%', () => {
    const building = uniformBuilding(5);
    const two = analyse({
      storeys: building,
      spectrum: flat(0.4),
      dampingRatio: 0.05,
      modeCount: 1,
    });
    expect(two.modes).toHaveLength(1);
    expect(two.warnings.some((w) => w.includes('reach 88.0% of the total mass'))).toBe(true);
    const target = analyse({
      storeys: building,
      spectrum: flat(0.4),
      dampingRatio: 0.05,
      targetMassRatio: 0.9,
    });
    expect(target.modes).toHaveLength(2); // 87.95% + 8.72% (five-storey uniform frame above)
    expect(target.warnings.some((w) => w.includes('of the total mass'))).toBe(false);
    expect(() =>
      analyse({ storeys: building, spectrum: flat(0.4), dampingRatio: 0.05, modeCount: 6 }),
    ).toThrow('modeCount must be a whole number from 1 to 5 (the number of storeys)');
  });

  it('warns of closely spaced modes (EN 1998-1 4.3.3.3.2) and of periods outside the table', () => {
    // Two storeys whose periods nearly coincide: a stiff heavy base and a soft light top.
    const close = analyse({
      storeys: [
        { mass: 1e6, stiffness: 1e9, height: 3 },
        { mass: 1e4, stiffness: 1e7, height: 3 },
      ],
      spectrum: {
        points: [
          { period: 0.05, sa: 1 },
          { period: 0.5, sa: 1 },
        ],
      },
      dampingRatio: 0.05,
    });
    const ratio = close.modes[1].period / close.modes[0].period;
    expect(ratio).toBeGreaterThan(0.9);
    expect(close.modes[1].effectiveMassRatio).toBeGreaterThan(0.01);
    expect(close.warnings).toContain(
      `Modes 1 and 2 (T2/T1 = ${ratio.toFixed(3)}) are closely spaced and each holds at least 1% of the mass (common practice: T_j > 0.9 T_i): SRSS is not acceptable for them; use CQC.`,
    );
    const outside = analyse({
      storeys: uniformBuilding(3),
      spectrum: {
        points: [
          { period: 0.5, sa: 1 },
          { period: 1, sa: 1 },
        ],
      },
      dampingRatio: 0.05,
    });
    expect(outside.warnings.some((w) => /^Modes? [\d ,to]+: T/.test(w))).toBe(true);
  });

  it('cites the clause of the calc’s own code basis, and none it does not follow', () => {
    const request = {
      storeys: [
        { mass: 1e6, stiffness: 1e9, height: 3 },
        { mass: 1e4, stiffness: 1e7, height: 3 },
      ],
      spectrum: flat(1),
      dampingRatio: 0.05,
    };
    const en = analyse(request, undefined, 'EN1998-1').warnings.join(' ');
    const asce = analyse(request, undefined, 'ASCE7-22').warnings.join(' ');
    expect(en).toContain('(EN 1998-1:2004 4.3.3.3.2)');
    expect(asce).toContain('(ASCE 7-22 12.9.1.3, clause from memory)');
    expect(asce).not.toContain('EN 1998-1');
  });

  it('says nothing of closely spaced modes that hold almost no mass', () => {
    // A 1 kg appendage on top, 5% stiffer in frequency than the building (k = m w^2 1.05^2):
    // the periods are close, but the appendage's mode holds about a millionth of the mass.
    const result = analyse({
      storeys: [
        { mass: 1e6, stiffness: 1e9, height: 3 },
        { mass: 1, stiffness: 1000 * 1.05 ** 2, height: 3 },
      ],
      spectrum: flat(1),
      dampingRatio: 0.05,
    });
    const ratio = result.modes[1].period / result.modes[0].period;
    expect(ratio).toBeGreaterThan(0.9);
    expect(Math.min(...result.modes.map((m) => m.effectiveMassRatio))).toBeLessThan(0.01);
    expect(result.warnings.filter((w) => /closely spaced/.test(w))).toEqual([]);
  });

  it('groups the periods outside the table into one line per side', () => {
    // A tall uniform building: its higher modes all fall below a table that starts at 0.2 s.
    const result = analyse({
      storeys: uniformBuilding(40),
      spectrum: {
        points: [
          { period: 0.2, sa: 1 },
          { period: 10, sa: 0.2 },
        ],
      },
      dampingRatio: 0.05,
    });
    const below = result.modes.filter((m) => m.period < 0.2).map((m) => m.number);
    expect(below.length).toBeGreaterThan(10);
    const lines = result.warnings.filter((w) => /below the spectrum table/.test(w));
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(
      new RegExp(
        `^Modes ${below[0]} to ${below[below.length - 1]}: T from [\\d.e-]+ s to [\\d.e-]+ s are below the spectrum table \\(which starts at 0\\.2 s\\); its first value was used\\.$`,
      ),
    );
  });

  it('refuses damping of 0 or 1 and an unknown interpolation', () => {
    expect(() =>
      analyse({ storeys: uniformBuilding(2), spectrum: flat(1), dampingRatio: 0 }),
    ).toThrow('dampingRatio must be greater than 0 and less than 1');
    expect(() =>
      analyse({ storeys: uniformBuilding(2), spectrum: flat(1), dampingRatio: 1 }),
    ).toThrow(RangeError);
  });

  it('refuses inputs whose results overflow double precision, instead of answering null', () => {
    // Each value is a legal positive number; SRSS squares a floor force of about 1e300 N.
    const overflow = /the results overflow double precision/;
    expect(() =>
      analyse({ storeys: uniformBuilding(2), spectrum: flat(1e300), dampingRatio: 0.05 }),
    ).toThrow(overflow);
    expect(() =>
      analyse({ storeys: uniformBuilding(2), spectrum: flat(1e160), dampingRatio: 0.05 }),
    ).toThrow(overflow);
    expect(() =>
      analyse({ storeys: uniformBuilding(2), spectrum: flat(1e100), dampingRatio: 0.05 }),
    ).not.toThrow();
  });
});

describe('storeyStiffnessFromColumns (k = sum c E I / h^3; standard beam theory)', () => {
  it('gives 12 EI/h^3 per fixed-fixed column and 3 EI/h^3 per fixed-pinned one', () => {
    // Two 400 mm square concrete columns, E = 30 GPa, I = 0.4^4/12 = 2.1333e-3 m^4, h = 3.5 m:
    // 2 x 12 x 30e9 x 2.13333e-3 / 42.875 = 1.536e9 / 42.875 = 35,825,073 N/m, worked by hand.
    const i = 0.4 ** 4 / 12;
    expect(
      storeyStiffnessFromColumns(
        [{ elasticModulus: 30e9, secondMoment: i, count: 2, fixity: 'fixed-fixed' }],
        3.5,
      ),
    ).toBeCloseTo(35_825_073, 0);
    expect(
      storeyStiffnessFromColumns(
        [{ elasticModulus: 30e9, secondMoment: i, count: 2, fixity: 'fixed-pinned' }],
        3.5,
      ),
    ).toBeCloseTo(35_825_073 / 4, 0);
  });

  it('refuses a bad column, naming it', () => {
    expect(() =>
      storeyStiffnessFromColumns(
        [{ elasticModulus: 0, secondMoment: 1, count: 1, fixity: 'fixed-fixed' }],
        3,
      ),
    ).toThrow('columns[0].elasticModulus must be a positive number');
    expect(() =>
      storeyStiffnessFromColumns(
        [{ elasticModulus: 1, secondMoment: 1, count: 1.5, fixity: 'fixed-fixed' }],
        3,
      ),
    ).toThrow('columns[0].count must be a whole number of at least 1');
  });
});
