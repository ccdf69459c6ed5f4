import type { ModalResponse } from '@tiermode/shared-types';
import { correlationMatrix, paddedToFour, strictUpperProducts } from '../combination';
import { combineModalResponses } from '../combined-response';
import { modalResponse } from '../modal-response';
import { naturalModes } from '../modes';
import { randomBuilding, seededRandom } from './buildings';

/** The definitions written out pair by pair, as the reference (method.md, "Combining modal maxima"). */
function naive(values: number[], rho: number[][]) {
  let cqc = 0;
  values.forEach((vi, i) => values.forEach((vj, j) => (cqc += rho[i][j] * vi * vj)));
  return {
    srss: Math.sqrt(values.reduce((s, v) => s + v * v, 0)),
    cqc: Math.sqrt(Math.max(0, cqc)),
    abs: values.reduce((s, v) => s + Math.abs(v), 0),
  };
}

const QUANTITIES = [
  'displacement',
  'drift',
  'floorForce',
  'storeyShear',
  'overturningMoment',
] as const;

describe('strictUpperProducts', () => {
  it('gives t_i = sum_{j<i} rho_ij x_j for every row, padding included', () => {
    const random = seededRandom(7);
    const modes = 7;
    const rows = 5;
    const stride = paddedToFour(modes);
    const rho = Array.from({ length: modes }, () => new Array<number>(modes).fill(0));
    for (let i = 0; i < modes; i += 1) {
      rho[i][i] = 1;
      for (let j = 0; j < i; j += 1) rho[i][j] = rho[j][i] = random();
    }
    const values = Array.from({ length: rows }, () =>
      Array.from({ length: modes }, () => random() - 0.5),
    );
    const { x, t } = strictUpperProducts(1, paddedToFour(rows), stride, rho, ([block]) =>
      values.forEach((row, r) => block.set(row, r * stride)),
    );
    // A second, smaller call reuses the scratch memory: the padding must be zero again.
    strictUpperProducts(1, 4, 4, [[1]], ([block]) => block.fill(1));
    const again = strictUpperProducts(1, paddedToFour(rows), stride, rho, ([block]) =>
      values.forEach((row, r) => block.set(row, r * stride)),
    );
    expect(Array.from(again.t[0])).toEqual(Array.from(t[0]));
    for (let r = 0; r < rows; r += 1) {
      for (let i = 0; i < modes; i += 1) {
        let expected = 0;
        for (let j = 0; j < i; j += 1) expected += rho[i][j] * values[r][j];
        expect(t[0][r * stride + i]).toBeCloseTo(expected, 14);
        expect(x[0][r * stride + i]).toBe(values[r][i]);
      }
    }
  });

  it('refuses a block that is not padded to fours', () => {
    expect(() => strictUpperProducts(1, 3, 4, [[1]], () => undefined)).toThrow(RangeError);
    expect(() => strictUpperProducts(1, 4, 4, Array(5).fill([1]), () => undefined)).toThrow(
      RangeError,
    );
  });
});

describe('combineModalResponses', () => {
  it.each([
    [1, 1],
    [3, 3],
    [7, 5],
    [13, 13],
    [30, 9],
  ])('%i storeys, %i modes: every quantity equals its own pair-by-pair combination', (n, used) => {
    const storeys = randomBuilding(n, seededRandom(100 + n));
    const modes = naturalModes(storeys).slice(0, used);
    const responses: ModalResponse[] = modes.map((mode, i) =>
      modalResponse(storeys, mode, 0.3 + 0.1 * Math.sin(i)),
    );
    const rho = correlationMatrix(
      modes.map((m) => m.circularFrequency),
      0.05,
    );
    const combined = combineModalResponses(storeys, responses, rho);
    for (const method of ['srss', 'cqc', 'abs'] as const) {
      for (const quantity of QUANTITIES) {
        for (let k = 0; k < n; k += 1) {
          const expected = naive(
            responses.map((r) => r[quantity][k]),
            rho,
          )[method];
          expect(Math.abs(combined[method][quantity][k] - expected)).toBeLessThanOrEqual(
            1e-11 * Math.abs(expected) + 1e-300,
          );
        }
      }
      const base = naive(
        responses.map((r) => r.baseShear),
        rho,
      )[method];
      expect(combined[method].baseShear).toBeCloseTo(base, 6);
      expect(combined[method].baseMoment).toBe(combined[method].overturningMoment[0]);
      combined[method].driftRatio.forEach((ratio, k) =>
        expect(ratio).toBe(combined[method].drift[k] / storeys[k].height),
      );
    }
  });

  it('refuses a correlation matrix of the wrong size', () => {
    const storeys = randomBuilding(3, seededRandom(1));
    const modes = naturalModes(storeys);
    const responses = modes.map((mode) => modalResponse(storeys, mode, 0.5));
    expect(() => combineModalResponses(storeys, responses, [[1]])).toThrow(RangeError);
  });
});
