import { analyse } from '../analyse';
import { MAX_PLAUSIBLE_DRIFT_RATIO, plausibilityFlags } from '../plausibility';

// An invented five-storey frame: 300 t a floor, 400 MN/m a storey, 3.5 m storeys.
const frame = () => Array.from({ length: 5 }, () => ({ mass: 3e5, stiffness: 4e8, height: 3.5 }));
const spectrum = {
  points: [
    { period: 0, sa: 0.4 },
    { period: 0.5, sa: 1 },
    { period: 4, sa: 0.15 },
  ],
};

describe('plausibility flags', () => {
  it('says nothing of an ordinary building', () => {
    const result = analyse({ storeys: frame(), spectrum, dampingRatio: 0.05 });
    expect(result.plausibility).toEqual([]);
  });

  it('points at the storey of a units slip: a stiffness 1e8 times too small', () => {
    // Storey 2's stiffness typed as if a second moment in cm^4 were m^4: 4 N/m, not 4e8.
    const storeys = frame();
    storeys[1] = { ...storeys[1], stiffness: 4 };
    const result = analyse({ storeys, spectrum, dampingRatio: 0.05 });
    expect(result.modes[0].period).toBeGreaterThan(1000);
    expect(result.plausibility).toEqual([
      {
        storey: 2,
        message: expect.stringMatching(
          /^The fundamental period T1 = [\d.e+]+ s is longer than any design spectrum reaches \(no building comes near 20 s\)\. Storey 2 is the most flexible: check the units of its stiffness \(N\/m\) and of the masses \(kg\)\.$/,
        ),
      },
      {
        storey: 2,
        message: expect.stringMatching(
          /^Storey 2 drifts \d+% of its height: no building stands at that\. Check the units of its stiffness and height\.$/,
        ),
      },
    ]);
  });

  it('flags drift past a tenth of the height by the worst storey, counting the others', () => {
    const flags = plausibilityFlags(
      frame(),
      { period: 1, shape: [0.2, 0.4, 0.6, 0.8, 1] },
      { driftRatio: [0.05, 0.12, 0.3, 0.11, 0.02] },
    );
    expect(flags).toEqual([
      {
        storey: 3,
        message:
          'Storey 3 drifts 30.0% of its height (3 storeys drift more than 10.0%): no building stands at that. Check the units of its stiffness and height.',
      },
    ]);
    // At the bound itself, nothing (the bound is "more than").
    expect(
      plausibilityFlags(
        frame(),
        { period: 1, shape: [1, 1, 1, 1, 1] },
        {
          driftRatio: Array(5).fill(MAX_PLAUSIBLE_DRIFT_RATIO),
        },
      ),
    ).toEqual([]);
  });
});
