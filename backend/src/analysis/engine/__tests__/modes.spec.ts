import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { naturalModes } from '../modes';
import { stiffnessMatrix } from '../shear-building';
import { randomBuilding, seededRandom, uniformBuilding, uniformFrequencies } from './buildings';

const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('naturalModes', () => {
  it.each([1, 2, 3, 5, 10, 40, 200])(
    'matches the closed-form frequencies of a uniform %i-storey shear building to 1e-10',
    (n) => {
      const modes = naturalModes(uniformBuilding(n, 2e5, 3e8));
      const expected = uniformFrequencies(n, 2e5, 3e8); // closed form: see buildings.ts
      modes.forEach((mode, j) => {
        expect(relative(mode.circularFrequency, expected[j])).toBeLessThan(1e-10);
      });
    },
  );

  it('gives w^2 = k/2m and 2k/m for the two-storey frame m1 = 2m, m2 = m, k1 = 2k, k2 = k', () => {
    // Chopra, Dynamics of Structures, chapter 10 (free vibration), the two-storey shear frame
    // example with m1 = 2m, k1 = 2k: w1^2 = k/2m, w2^2 = 2k/m, shapes [1/2, 1] and [-1, 1].
    const m = 1e5;
    const k = 2e8;
    const [first, second] = naturalModes([
      { mass: 2 * m, stiffness: 2 * k, height: 3 },
      { mass: m, stiffness: k, height: 3 },
    ]);
    expect(relative(first.circularFrequency ** 2, k / (2 * m))).toBeLessThan(1e-12);
    expect(relative(second.circularFrequency ** 2, (2 * k) / m)).toBeLessThan(1e-12);
    expect(first.shape[0]).toBeCloseTo(0.5, 12);
    expect(first.shape[1]).toBe(1);
    expect(second.shape[0]).toBeCloseTo(-1, 12);
  });

  it('gives the periods and effective masses of the five-storey uniform frame with T1 = 2 s', () => {
    // Five equal storeys with k chosen so that T1 = 2 s (Chopra, Dynamics of Structures,
    // chapter 13, the five-storey uniform shear frame). Periods from the closed form:
    // T_n = T1 sin(pi/22) / sin((2n-1) pi/22). Effective masses of modes 1 and 2, 87.95% and
    // 8.72% of the total, from memory of that example; all five sum to 100%.
    const m = 1e5;
    const w1 = Math.PI; // T1 = 2 s
    const k = m * (w1 / (2 * Math.sin(Math.PI / 22))) ** 2;
    const modes = naturalModes(uniformBuilding(5, m, k));
    const expectedPeriods = [1, 3, 5, 7, 9].map(
      (odd) => (2 * Math.sin(Math.PI / 22)) / Math.sin((odd * Math.PI) / 22),
    );
    modes.forEach((mode, i) => expect(mode.period).toBeCloseTo(expectedPeriods[i], 10));
    expect(modes.map((mode) => mode.period.toFixed(4))).toEqual([
      '2.0000',
      '0.6852',
      '0.4346',
      '0.3383',
      '0.2966',
    ]);
    expect(modes[0].effectiveMassRatio * 100).toBeCloseTo(87.95, 2);
    expect(modes[1].effectiveMassRatio * 100).toBeCloseTo(8.72, 2);
    expect(modes[4].cumulativeMassRatio).toBeCloseTo(1, 12);
  });

  it('agrees with an independent dense symmetric eigensolver (ml-matrix) for random buildings to 1e-9', () => {
    // ml-matrix reduces the dense A = M^-1/2 K M^-1/2 by Householder and accumulates the QL
    // rotations (tred2 + tql2): another algorithm and another implementation than the engine's.
    const random = seededRandom(20261201);
    for (const n of [2, 3, 4, 7, 12, 20, 35, 60]) {
      const storeys = randomBuilding(n, random);
      const modes = naturalModes(storeys);
      const root = storeys.map((s) => Math.sqrt(s.mass));
      const a = stiffnessMatrix(storeys).map((row, i) =>
        row.map((v, j) => v / (root[i] * root[j])),
      );
      const reference = new EigenvalueDecomposition(new Matrix(a), { assumeSymmetric: true });
      const order = reference.realEigenvalues
        .map((value, index) => ({ value, index }))
        .sort((x, y) => x.value - y.value);
      const norm = order[order.length - 1].value;
      order.forEach(({ value, index }, j) => {
        expect(relative(modes[j].circularFrequency ** 2, value)).toBeLessThan(1e-9);
        // An eigenvector is only determined to about eps * norm / gap (Davis-Kahan), whoever
        // computes it; where neighbouring eigenvalues are close the tolerance widens to that.
        const gap = Math.min(
          j > 0 ? value - order[j - 1].value : Infinity,
          j < n - 1 ? order[j + 1].value - value : Infinity,
        );
        const tolerance = Math.max(1e-9, (100 * Number.EPSILON * norm) / gap);
        // Compare the unit vectors x = M^1/2 phi, sign-aligned. The roof-normalised shape is
        // compared too where the roof moves: a high mode of a tall irregular building can have
        // a roof component of 1e-20 of its largest, and dividing by it amplifies any rounding.
        const x = reference.eigenvectorMatrix.getColumn(index);
        const ours = modes[j].massNormalisedShape.map((p, i) => p * root[i]);
        // Align signs by the dot product: a roof component of 1e-20 has no meaningful sign.
        const sign = Math.sign(x.reduce((sum, xi, i) => sum + xi * ours[i], 0)) || 1;
        x.forEach((xi, i) => expect(Math.abs(ours[i] - sign * xi)).toBeLessThan(tolerance));
        if (Math.abs(x[n - 1]) > 1e-3) {
          const phi = x.map((xi, i) => xi / root[i]);
          phi.forEach((p, i) => {
            const expected = p / phi[n - 1];
            expect(Math.abs(modes[j].shape[i] - expected)).toBeLessThan(
              tolerance * Math.max(1, Math.abs(expected)) * (1 / Math.abs(x[n - 1])),
            );
          });
        }
      });
    }
  });

  it('keeps the invariants: sum of M* = total mass and phi^T M phi = I', () => {
    const random = seededRandom(7);
    for (const n of [1, 6, 30, 120]) {
      const storeys = randomBuilding(n, random);
      const modes = naturalModes(storeys);
      const total = storeys.reduce((s, st) => s + st.mass, 0);
      const sum = modes.reduce((s, m) => s + m.effectiveMass, 0);
      expect(relative(sum, total)).toBeLessThan(1e-10);
      for (let a = 0; a < n; a += 1) {
        for (let b = a; b < n; b += 1) {
          const product = storeys.reduce(
            (s, st, i) =>
              s + st.mass * modes[a].massNormalisedShape[i] * modes[b].massNormalisedShape[i],
            0,
          );
          expect(Math.abs(product - (a === b ? 1 : 0))).toBeLessThan(1e-9);
        }
      }
    }
  });

  it('orders the modes from the longest period and puts +1 at the roof where the roof moves', () => {
    const modes = naturalModes(randomBuilding(9, seededRandom(3)));
    modes.forEach((mode, i) => {
      expect(mode.number).toBe(i + 1);
      // Mode 8 of this building barely reaches the roof (1e-7 of its level-1 component): its
      // shape is +1 at level 1 instead (hard-buildings.spec.ts).
      if (mode.number === 8) {
        expect([mode.shapeNormalisation, mode.normalisationLevel]).toEqual(['largest', 1]);
      } else {
        expect([mode.shapeNormalisation, mode.normalisationLevel]).toEqual(['roof', 9]);
      }
      expect(mode.shape[mode.normalisationLevel - 1]).toBe(1);
      if (i > 0) expect(mode.period).toBeLessThan(modes[i - 1].period);
      expect(mode.frequency).toBeCloseTo(1 / mode.period, 12);
    });
  });

  it('does not change its input', () => {
    const storeys = uniformBuilding(4);
    const copy = structuredClone(storeys);
    naturalModes(storeys);
    expect(storeys).toEqual(copy);
  });

  it('refuses bad storeys, naming the field and the storey', () => {
    expect(() => naturalModes([])).toThrow('storeys must have 1 to 500 storeys (got 0)');
    expect(() =>
      naturalModes([
        { mass: 1, stiffness: 1, height: 3 },
        { mass: -2, stiffness: 1, height: 3 },
      ]),
    ).toThrow('storeys[1].mass (storey 2) must be a positive number');
    expect(() => naturalModes([{ mass: 1, stiffness: Number.NaN, height: 3 }])).toThrow(
      'storeys[0].stiffness (storey 1) must be a positive number',
    );
    expect(() => naturalModes(uniformBuilding(501))).toThrow(RangeError);
  });
});
