import { describe, expect, it } from 'vitest';
import { swayAt, swayBound } from './sway';

describe('the sway of chosen modes', () => {
  // Two invented modes of a two-storey building.
  const modes = [
    { circularFrequency: 10, shape: [0.5, 1] },
    { circularFrequency: 25, shape: [-1, 0.4] },
  ];

  it('starts from rest at the sum of the shapes and moves as a sum of cosines', () => {
    expect(swayAt(modes, 0)).toEqual([-0.5, 1.4]);
    const t = 0.123;
    const u = swayAt(modes, t);
    expect(u[0]).toBeCloseTo(0.5 * Math.cos(10 * t) - Math.cos(25 * t), 14);
    expect(u[1]).toBeCloseTo(Math.cos(10 * t) + 0.4 * Math.cos(25 * t), 14);
  });

  it('one mode alone returns to its shape after one period, and its opposite after half', () => {
    const one = [modes[0]];
    const period = (2 * Math.PI) / 10;
    swayAt(one, period).forEach((v, i) => expect(v).toBeCloseTo(one[0].shape[i], 12));
    swayAt(one, period / 2).forEach((v, i) => expect(v).toBeCloseTo(-one[0].shape[i], 12));
  });

  it('never passes its bound, the sum of |phi| at the worst level', () => {
    expect(swayBound(modes)).toBeCloseTo(1.5, 14);
    for (let k = 0; k < 200; k += 1) {
      for (const v of swayAt(modes, k * 0.01)) expect(Math.abs(v)).toBeLessThanOrEqual(1.5 + 1e-12);
    }
  });
});
