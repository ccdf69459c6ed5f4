import { decimated, logPeriods, type GroundMotionRecord } from '@tiermode/shared-types';
import { freeVibration } from '../history/free-vibration';
import { demoRecord, DEMO_RECORD_NAME } from '../history/record';
import { recordScaleFactor, recordSpectrum } from '../history/record-spectrum';
import { responseHistory } from '../history/response-history';
import { sdofStep } from '../history/sdof-recursion';
import { naturalModes } from '../modes';
import { STANDARD_GRAVITY as G } from '../modal-response';
import { randomBuilding, seededRandom, uniformBuilding } from './buildings';

/** A record from a function of time (m/s^2), sampled at dt for `duration`. */
function sampled(duration: number, dt: number, a: (t: number) => number): GroundMotionRecord {
  const steps = Math.round(duration / dt) + 1;
  return {
    timeStep: dt,
    units: 'm/s2',
    accelerations: Array.from({ length: steps }, (_, k) => a(k * dt)),
  };
}

/** One storey: mass 1e5 kg, stiffness 4e6 N/m, so omega = sqrt(40) rad/s (T about 0.99 s). */
const oneStorey = [{ mass: 1e5, stiffness: 4e6, height: 3 }];
const omega1 = Math.sqrt(40);

/** The roof displacement at every step (`full`) under a record. */
function roofHistory(record: GroundMotionRecord, zeta: number, storeys = oneStorey) {
  const answer = responseHistory({ storeys, dampingRatio: zeta, record, full: true });
  return answer.histories.roofDisplacement;
}

describe('single storey against closed-form SDOF solutions', () => {
  it.each([0, 0.05, 0.2])(
    'a step of ground acceleration, zeta %s (Chopra, Dynamics of Structures, ch. 4, response to a step force)',
    (zeta) => {
      const a0 = 2; // m/s^2 from t = 0
      const history = roofHistory(
        sampled(8, 0.01, () => a0),
        zeta,
      );
      const wd = omega1 * Math.sqrt(1 - zeta * zeta);
      // u(t) = -(a0 / omega^2) [1 - e^(-zeta omega t)(cos wd t + zeta / sqrt(1 - zeta^2) sin wd t)]
      const exact = (t: number) =>
        -(a0 / omega1 ** 2) *
        (1 -
          Math.exp(-zeta * omega1 * t) *
            (Math.cos(wd * t) + (zeta / Math.sqrt(1 - zeta * zeta)) * Math.sin(wd * t)));
      const scale = a0 / omega1 ** 2;
      history.times.forEach((t, k) => {
        expect(Math.abs(history.values[k] - exact(t))).toBeLessThan(1e-10 * scale);
      });
    },
  );

  it.each([0, 0.05])(
    'a ramp of ground acceleration, zeta %s (Chopra ch. 4, ramp force; the damped form by the same particular-plus-homogeneous solution)',
    (zeta) => {
      const r = 0.5; // m/s^3
      const history = roofHistory(
        sampled(6, 0.02, (t) => r * t),
        zeta,
      );
      const wd = omega1 * Math.sqrt(1 - zeta * zeta);
      // x'' + 2 zeta w x' + w^2 x = r t from rest:
      // x = (r / w^2) [t - 2 zeta / w + e^(-zeta w t)(2 zeta / w cos wd t + (2 zeta^2 - 1) / wd sin wd t)]
      const exact = (t: number) =>
        -(r / omega1 ** 2) *
        (t -
          (2 * zeta) / omega1 +
          Math.exp(-zeta * omega1 * t) *
            (((2 * zeta) / omega1) * Math.cos(wd * t) +
              ((2 * zeta * zeta - 1) / wd) * Math.sin(wd * t)));
      const scale = (r * 6) / omega1 ** 2;
      history.times.forEach((t, k) => {
        expect(Math.abs(history.values[k] - exact(t))).toBeLessThan(1e-10 * scale);
      });
    },
  );

  it('stays exact where omega dt is tiny or large (long and short periods)', () => {
    // Step response of the recursion's one step against the closed form (Chopra ch. 4).
    for (const [omega, dt] of [
      [0.01, 0.001],
      [(2 * Math.PI) / 100, 0.005],
      [3000, 0.02],
    ]) {
      const zeta = 0.05;
      const step = sdofStep(omega, zeta, dt);
      const wd = omega * Math.sqrt(1 - zeta * zeta);
      const exact =
        -(
          1 -
          Math.exp(-zeta * omega * dt) *
            (Math.cos(wd * dt) + (zeta / Math.sqrt(1 - zeta * zeta)) * Math.sin(wd * dt))
        ) /
        (omega * omega);
      // A unit step held over the step: D_1 = (da + da1) x 1. The closed form itself loses digits
      // to cancellation at omega dt = 1e-5, so compare with its series there.
      const series = (-(dt * dt) / 2) * (1 - (2 * zeta * omega * dt) / 3);
      const reference = omega * dt < 1e-3 ? series : exact;
      expect(Math.abs((step.da + step.da1 - reference) / reference)).toBeLessThan(1e-8);
    }
  });
});

describe('free vibration', () => {
  // Two storeys, m1 = m2 = m, k1 = k2 = k: omega^2 = (3 -/+ sqrt 5) / 2 k/m with shapes
  // [(sqrt 5 - 1) / 2, 1] and [-(1 + sqrt 5) / 2, 1] (the roots of lambda^2 - 3 lambda + 1 = 0;
  // Chopra ch. 10, the two-storey shear frame, worked for equal storeys).
  const m = 2e5;
  const k = 1.5e8;
  const storeys = [
    { mass: m, stiffness: k, height: 3.5 },
    { mass: m, stiffness: k, height: 3.5 },
  ];
  const w = [
    Math.sqrt(((3 - Math.sqrt(5)) / 2) * (k / m)),
    Math.sqrt(((3 + Math.sqrt(5)) / 2) * (k / m)),
  ];
  const phi = [
    [(Math.sqrt(5) - 1) / 2, 1],
    [-(1 + Math.sqrt(5)) / 2, 1],
  ];

  it.each([0, 0.05])(
    'of a two-storey building is the closed-form sum of modal cosines, zeta %s (Chopra ch. 10)',
    (zeta) => {
      const u0 = [0.01, 0.03];
      const v0 = [0.05, -0.02];
      const answer = freeVibration({
        storeys,
        dampingRatio: zeta,
        initialDisplacements: u0,
        initialVelocities: v0,
        duration: 3,
        timeStep: 0.005,
      });
      // q_n(0) = phi_n^T M u0 / phi_n^T M phi_n (equal masses cancel).
      const coordinate = (n: number, x: number[]) =>
        (phi[n][0] * x[0] + phi[n][1] * x[1]) / (phi[n][0] ** 2 + phi[n][1] ** 2);
      const exact = (level: number, t: number) =>
        [0, 1].reduce((sum, n) => {
          const q0 = coordinate(n, u0);
          const qv0 = coordinate(n, v0);
          const wd = w[n] * Math.sqrt(1 - zeta * zeta);
          const q =
            Math.exp(-zeta * w[n] * t) *
            (q0 * Math.cos(wd * t) + ((qv0 + zeta * w[n] * q0) / wd) * Math.sin(wd * t));
          return sum + phi[n][level] * q;
        }, 0);
      expect(answer.times).toHaveLength(601);
      for (const level of [0, 1]) {
        answer.times.forEach((t, s) => {
          expect(answer.displacements[level][s]).toBeCloseTo(exact(level, t), 12);
        });
        expect(answer.displacements[level][0]).toBeCloseTo(u0[level], 14);
      }
      expect(answer.modes[0].circularFrequency).toBeCloseTo(w[0], 9);
      expect(answer.modes[1].circularFrequency).toBeCloseTo(w[1], 9);
    },
  );

  it('started from a mode shape, vibrates in that mode alone (common practice: the meaning of a mode)', () => {
    const modes = naturalModes(uniformBuilding(5));
    const start = modes[1].shape.map((p) => 0.02 * p);
    const answer = freeVibration({
      storeys: uniformBuilding(5),
      dampingRatio: 0,
      initialDisplacements: start,
      duration: 2,
      timeStep: 0.01,
    });
    answer.modes.forEach((mode, j) => {
      if (j === 1) expect(mode.initialCoordinate).toBeCloseTo(0.02, 12);
      else expect(Math.abs(mode.initialCoordinate)).toBeLessThan(1e-14);
    });
    answer.times.forEach((t, s) => {
      const q = 0.02 * Math.cos(modes[1].circularFrequency * t);
      start.forEach((_, i) => {
        expect(answer.displacements[i][s]).toBeCloseTo(modes[1].shape[i] * q, 12);
      });
    });
    // Undamped: each level's peak is its starting displacement (at t = 0).
    answer.peaks.displacement.forEach((peak, i) =>
      expect(peak).toBeCloseTo(Math.abs(start[i]), 14),
    );
  });

  it('refuses a request that cannot be answered, naming the field', () => {
    const base = { storeys, dampingRatio: 0.05, duration: 1, timeStep: 0.01 };
    expect(() => freeVibration(base)).toThrow(/initialDisplacements or initialVelocities/);
    expect(() => freeVibration({ ...base, initialDisplacements: [0.1] })).toThrow(
      'initialDisplacements must have one value per level (2)',
    );
    expect(() => freeVibration({ ...base, initialDisplacements: [0.1, Number.NaN] })).toThrow(
      'initialDisplacements[1] (level 2) must be a number (m)',
    );
    expect(() =>
      freeVibration({ ...base, initialDisplacements: [0, 0.1], duration: 1000, timeStep: 0.001 }),
    ).toThrow(/at most 20001/);
    expect(() =>
      freeVibration({ ...base, initialDisplacements: [0, 0.1], dampingRatio: 1 }),
    ).toThrow('dampingRatio must be at least 0 and less than 1');
  });
});

/**
 * An undamped or damped oscillator's response to a half-cycle sine pulse of ground acceleration
 * a0 sin(pi t / td) for t <= td, in closed form: the harmonic response from rest while the pulse
 * lasts (Chopra ch. 3, harmonic excitation of damped systems), then free vibration (Chopra ch. 2),
 * evaluated on a fine grid of times for the peak (Chopra ch. 4, half-cycle sine pulse: the shock
 * spectrum).
 */
function halfSinePeak(omega: number, zeta: number, td: number, a0: number, end: number): number {
  const p0 = -a0; // force per unit mass
  const big = Math.PI / td;
  const beta = big / omega;
  const wd = omega * Math.sqrt(1 - zeta * zeta);
  const denominator = (1 - beta * beta) ** 2 + (2 * zeta * beta) ** 2;
  let forced: (t: number) => [number, number];
  if (Math.abs(beta - 1) < 1e-12 && zeta === 0) {
    // Resonance, undamped: u = (p0 / 2k)(sin wt - wt cos wt).
    const c = p0 / (2 * omega * omega);
    forced = (t) => [
      c * (Math.sin(omega * t) - omega * t * Math.cos(omega * t)),
      c * omega * omega * t * Math.sin(omega * t),
    ];
  } else {
    const c = ((p0 / (omega * omega)) * (1 - beta * beta)) / denominator;
    const d = ((p0 / (omega * omega)) * (-2 * zeta * beta)) / denominator;
    const a = -d;
    const b = (zeta * omega * a - c * big) / wd;
    forced = (t) => {
      const e = Math.exp(-zeta * omega * t);
      const u =
        e * (a * Math.cos(wd * t) + b * Math.sin(wd * t)) +
        c * Math.sin(big * t) +
        d * Math.cos(big * t);
      const v =
        e *
          ((-zeta * omega * a + wd * b) * Math.cos(wd * t) +
            (-zeta * omega * b - wd * a) * Math.sin(wd * t)) +
        c * big * Math.cos(big * t) -
        d * big * Math.sin(big * t);
      return [u, v];
    };
  }
  const [ud, vd] = forced(td);
  const free = (t: number) => {
    const s = t - td;
    const e = Math.exp(-zeta * omega * s);
    return e * (ud * Math.cos(wd * s) + ((vd + zeta * omega * ud) / wd) * Math.sin(wd * s));
  };
  let peak = 0;
  const samples = 200_000;
  for (let i = 0; i <= samples; i++) {
    const t = (end * i) / samples;
    peak = Math.max(peak, Math.abs(t <= td ? forced(t)[0] : free(t)));
  }
  return peak;
}

describe('a single storey under a half-cycle sine pulse', () => {
  const td = 0.5;
  it('the closed form gives pi / 2 at td / Tn = 1/2, undamped (Chopra ch. 4, half-cycle sine pulse)', () => {
    const omega = Math.PI / td; // Tn = 2 td
    expect(halfSinePeak(omega, 0, td, 1, 6) * omega * omega).toBeCloseTo(Math.PI / 2, 6);
  });

  it.each([
    [0.25, 0],
    [0.5, 0],
    [0.8, 0],
    [1.5, 0],
    [3, 0],
    [0.8, 0.05],
    [1.5, 0.1],
  ])('td / Tn = %s, zeta %s: the peak matches the closed-form shock spectrum', (ratio, zeta) => {
    const tn = td / ratio;
    const omega = (2 * Math.PI) / tn;
    const a0 = 3;
    const dt = td / 1000;
    const end = td + 2 * tn;
    const record = sampled(end, dt, (t) => (t <= td ? a0 * Math.sin((Math.PI * t) / td) : 0));
    const storeys = [{ mass: 1e5, stiffness: 1e5 * omega * omega, height: 3 }];
    const answer = responseHistory({ storeys, dampingRatio: zeta, record });
    const exact = halfSinePeak(omega, zeta, td, a0, end);
    // The sampled pulse is linear between samples: an error of order (pi dt / td)^2 / 12.
    expect(Math.abs(answer.peaks.displacement[0] - exact) / exact).toBeLessThan(2e-5);
  });
});

/**
 * An independent solution for checking the record spectrum: Newmark's average acceleration
 * method (Chopra ch. 5, Newmark's method, gamma 1/2, beta 1/4) on sub-steps of dt / 20 with the
 * record interpolated linearly: a different method with a different error.
 */
function newmarkPeak(ag: readonly number[], dt: number, omega: number, zeta: number): number {
  const sub = 20;
  const h = dt / sub;
  const k = omega * omega;
  const c = 2 * zeta * omega;
  const kHat = k + (2 * c) / h + 4 / (h * h);
  let u = 0;
  let v = 0;
  let a = -ag[0];
  let peak = 0;
  for (let i = 0; i + 1 < ag.length; i++) {
    for (let s = 1; s <= sub; s++) {
      const p = -(ag[i] + ((ag[i + 1] - ag[i]) * s) / sub);
      const pHat = p + (4 / (h * h)) * u + (4 / h) * v + a + c * ((2 / h) * u + v);
      const uNext = pHat / kHat;
      const vNext = (2 / h) * (uNext - u) - v;
      a = (4 / (h * h)) * (uNext - u) - (4 / h) * v - a;
      u = uNext;
      v = vNext;
      peak = Math.max(peak, Math.abs(u));
    }
  }
  return peak;
}

describe('record spectrum', () => {
  const record = demoRecord();
  const ag = record.accelerations.map((a) => a * G);

  it.each([0.05, 0.2, 0.5, 1, 2, 4])(
    'Sd at T = %s s matches fine-step Newmark average acceleration to 0.2 %% (Chopra ch. 5)',
    (period) => {
      const answer = recordSpectrum({ record, dampingRatio: 0.05, periods: [period] });
      const omega = (2 * Math.PI) / period;
      const reference = newmarkPeak(ag, record.timeStep, omega, 0.05);
      expect(Math.abs(answer.sd[0] - reference) / reference).toBeLessThan(2e-3);
      expect(answer.sa[0]).toBeCloseTo((omega * omega * answer.sd[0]) / G, 12);
    },
  );

  it('answers the peak ground acceleration at T = 0 and scales linearly', () => {
    const answer = recordSpectrum({ record, dampingRatio: 0.05, periods: [0, 1], scale: 2 });
    expect(answer.sa[0]).toBeCloseTo(0.6, 9);
    const once = recordSpectrum({ record, dampingRatio: 0.05, periods: [1] });
    expect(answer.sd[1]).toBeCloseTo(2 * once.sd[0], 12);
  });

  it('refuses periods outside 0 to 50 s, naming the period', () => {
    expect(() => recordSpectrum({ record, dampingRatio: 0.05, periods: [1, -1] })).toThrow(
      'periods[1] must be a number from 0 to 50 (s)',
    );
  });
});

describe('response history of a building', () => {
  const record = demoRecord();

  it('of a single storey peaks at the record spectrum: Sd and k Sd (Chopra ch. 6, the response spectrum)', () => {
    const answer = responseHistory({ storeys: oneStorey, dampingRatio: 0.05, record });
    const spectrum = recordSpectrum({
      record,
      dampingRatio: 0.05,
      periods: [(2 * Math.PI) / omega1],
    });
    expect(answer.peaks.displacement[0]).toBeCloseTo(spectrum.sd[0], 12);
    expect(answer.peaks.shear[0] / (4e6 * spectrum.sd[0])).toBeCloseTo(1, 12);
    expect(answer.peaks.floorForce[0]).toBeCloseTo(answer.peaks.shear[0], 6);
    expect(answer.peaks.overturningMoment[0]).toBeCloseTo(answer.peaks.shear[0] * 3, 4);
  });

  it('of four storeys matches direct integration of M u" + C u\' + K u = -M 1 a_g with the classical damping matrix (Chopra ch. 11 and 13)', () => {
    const storeys = randomBuilding(4, seededRandom(7));
    const zeta = 0.05;
    const answer = responseHistory({ storeys, dampingRatio: zeta, record, full: true });
    const reference = directIntegration(
      storeys,
      zeta,
      record.accelerations.map((a) => a * G),
      record.timeStep,
    );
    reference.peaks.forEach((peak, i) => {
      expect(Math.abs(answer.peaks.displacement[i] - peak) / peak).toBeLessThan(2e-3);
    });
    const roofPeak = Math.max(...answer.histories.roofDisplacement.values.map(Math.abs));
    expect(roofPeak).toBeCloseTo(answer.peaks.displacement[3], 14);
  });

  it('keeps every storey quantity consistent: V = k drift, V_i = sum of floor forces above, M from V h', () => {
    const storeys = randomBuilding(6, seededRandom(3));
    const answer = responseHistory({ storeys, dampingRatio: 0.05, record, animationFrames: 401 });
    const frames = answer.animation!;
    expect(frames.times).toHaveLength(401);
    // At the drawn frames, rebuild the peaks from the displacements; they can only be smaller.
    const shearAt = (s: number, i: number) =>
      storeys[i].stiffness *
      (frames.displacements[i][s] - (i > 0 ? frames.displacements[i - 1][s] : 0));
    frames.times.forEach((_, s) => {
      storeys.forEach((_, i) => {
        expect(Math.abs(shearAt(s, i))).toBeLessThanOrEqual(answer.peaks.shear[i] * (1 + 1e-12));
      });
    });
    answer.peaks.drift.forEach((drift, i) => {
      expect(answer.peaks.shear[i]).toBeCloseTo(storeys[i].stiffness * drift, 3);
      expect(answer.peaks.driftRatio[i]).toBeCloseTo(drift / storeys[i].height, 15);
    });
    expect(answer.base.shear).toBe(answer.peaks.shear[0]);
    expect(answer.record.peakGroundAcceleration).toBeCloseTo(0.3, 9);
  });

  it('with the modes truncated, differs from all modes by the higher modes only', () => {
    const storeys = uniformBuilding(10);
    const all = responseHistory({ storeys, dampingRatio: 0.05, record });
    const three = responseHistory({ storeys, dampingRatio: 0.05, record, modeCount: 3 });
    expect(three.modeCount).toBe(3);
    expect(Math.abs(three.peaks.displacement[9] / all.peaks.displacement[9] - 1)).toBeLessThan(
      0.02,
    );
  });

  it('refuses records that cannot be run, naming the field and the sample', () => {
    const base = { storeys: oneStorey, dampingRatio: 0.05 };
    expect(() =>
      responseHistory({ ...base, record: { ...record, accelerations: [0, 1, Number.NaN] } }),
    ).toThrow('record.accelerations[2] (sample 3, t = 0.02 s) must be a finite number (g)');
    // 500 cm/s^2 read as g would be 500 g: a units slip, named (100 g bound: common practice,
    // no recorded ground motion comes near it).
    expect(() =>
      responseHistory({ ...base, record: { ...record, accelerations: [0, 500, 0] } }),
    ).toThrow(
      "record.accelerations[1] (sample 2, t = 0.01 s) is 500 g, more than 100 g: check the record's units (g chosen)",
    );
    expect(() => responseHistory({ ...base, record: { ...record, timeStep: 0 } })).toThrow(
      'record.timeStep must be from 0.0001 to 0.1 s',
    );
    expect(() =>
      responseHistory({ ...base, record: { ...record, units: 'ft/s2' as never } }),
    ).toThrow('record.units must be one of g, m/s2, cm/s2');
    expect(() =>
      responseHistory({
        storeys: uniformBuilding(500),
        dampingRatio: 0.05,
        record: { ...record, accelerations: new Array(9000).fill(0) },
      }),
    ).toThrow(/500 storeys x 9000 record steps/);
    expect(() => responseHistory({ ...base, record, scale: 0 })).toThrow(
      'scale must be a number greater than 0',
    );
  });
});

describe('scaling a record to the design spectrum', () => {
  const record = demoRecord();
  const design = {
    points: [
      { period: 0, sa: 0.4 },
      { period: 0.2, sa: 1.0 },
      { period: 0.6, sa: 1.0 },
      { period: 4, sa: 0.15 },
    ],
  };
  const range: [number, number] = [0.2, 2];
  const grid = logPeriods(0.2, 2, 50);
  const designAt = grid.map((t) => (t <= 0.6 ? 1 : 1 + ((t - 0.6) / 3.4) * (0.15 - 1)));

  it('by the mean over the range: the scaled spectrum has the design mean (common practice)', () => {
    const { factor } = recordScaleFactor(
      { method: 'spectrum', rule: 'mean', periodRange: range },
      record,
      0.05,
      design,
    );
    const scaled = recordSpectrum({ record, dampingRatio: 0.05, periods: grid, scale: factor });
    const mean = (values: number[]) => values.reduce((a, b) => a + b, 0) / values.length;
    expect(mean(scaled.sa)).toBeCloseTo(mean(designAt), 9);
  });

  it('not below 90 %: the least ratio is 0.9 (EN 1998-1 3.2.3.1.2(4)c)', () => {
    const { factor, explanation } = recordScaleFactor(
      { method: 'spectrum', rule: 'not-below-90', periodRange: range },
      record,
      0.05,
      design,
    );
    const scaled = recordSpectrum({ record, dampingRatio: 0.05, periods: grid, scale: factor });
    const ratios = scaled.sa.map((sa, i) => sa / designAt[i]);
    expect(Math.min(...ratios)).toBeCloseTo(0.9, 9);
    expect(explanation).toContain('EN 1998-1 3.2.3.1.2(4)c');
  });

  it('refuses a range outside the design spectrum', () => {
    expect(() =>
      recordScaleFactor(
        { method: 'spectrum', rule: 'mean', periodRange: [1, 8] },
        record,
        0.05,
        design,
      ),
    ).toThrow(/outside the design spectrum's table/);
  });
});

describe('the demo record', () => {
  it('is the same on every call, labelled invented, 20 s at 0.01 s with a 0.30 g peak', () => {
    const a = demoRecord();
    expect(demoRecord()).toEqual(a);
    expect(a.name).toBe(DEMO_RECORD_NAME);
    expect(a.name).toMatch(/invented/i);
    expect(a.accelerations).toHaveLength(2001);
    expect(Math.max(...a.accelerations.map(Math.abs))).toBeCloseTo(0.3, 6);
    expect(a.accelerations[0]).toBe(0);
  });
});

describe('decimation for drawing', () => {
  it("keeps every span's least and greatest sample, so the peak stays", () => {
    const values = Array.from({ length: 10_001 }, (_, k) => (k === 6_543 ? 5 : Math.sin(k / 7)));
    const out = decimated(values, 0.01, 2000);
    expect(out.values.length).toBeLessThanOrEqual(2000);
    expect(Math.max(...out.values)).toBe(Math.max(...values));
    expect(out.times[out.values.indexOf(Math.max(...out.values))]).toBeCloseTo(65.43, 9);
  });
});

/**
 * Direct integration of the whole building: C = M Phi diag(2 zeta omega_n / M_n) Phi^T M (the
 * classical damping matrix from modal damping ratios, Chopra ch. 11), Newmark average
 * acceleration on sub-steps of dt / 20 with the record interpolated linearly, dense solves.
 */
function directIntegration(
  storeys: { mass: number; stiffness: number; height: number }[],
  zeta: number,
  ag: number[],
  dt: number,
): { peaks: number[] } {
  const n = storeys.length;
  const mass = storeys.map((s) => s.mass);
  const kMatrix = Array.from({ length: n }, (_, i) =>
    Array.from({ length: n }, (_, j) => {
      const ki = storeys[i].stiffness;
      const kAbove = i + 1 < n ? storeys[i + 1].stiffness : 0;
      if (i === j) return ki + kAbove;
      if (j === i + 1) return -kAbove;
      if (j === i - 1) return -ki;
      return 0;
    }),
  );
  const modes = naturalModes(storeys);
  const cMatrix = Array.from({ length: n }, (_, i) =>
    Array.from({ length: n }, (_, j) =>
      modes.reduce((sum, mode) => {
        const mn = mode.shape.reduce((s, p, l) => s + mass[l] * p * p, 0);
        return (
          sum +
          (mass[i] * mode.shape[i] * 2 * zeta * mode.circularFrequency * mode.shape[j] * mass[j]) /
            mn
        );
      }, 0),
    ),
  );
  const sub = 20;
  const h = dt / sub;
  const kHat = kMatrix.map((row, i) =>
    row.map(
      (value, j) => value + (2 / h) * cMatrix[i][j] + (i === j ? (4 / (h * h)) * mass[i] : 0),
    ),
  );
  const solve = gaussSolver(kHat);
  let u = new Array<number>(n).fill(0);
  let v = new Array<number>(n).fill(0);
  let a = mass.map(() => -ag[0]);
  const peaks = new Array<number>(n).fill(0);
  for (let i = 0; i + 1 < ag.length; i++) {
    for (let s = 1; s <= sub; s++) {
      const g = ag[i] + ((ag[i + 1] - ag[i]) * s) / sub;
      const mTerm = u.map((_, r) => mass[r] * ((4 / (h * h)) * u[r] + (4 / h) * v[r] + a[r]));
      const cTerm = cMatrix.map((row) =>
        row.reduce((sum, c, col) => sum + c * ((2 / h) * u[col] + v[col]), 0),
      );
      const pHat = mass.map((mr, r) => -mr * g + mTerm[r] + cTerm[r]);
      const uNext = solve(pHat);
      const vNext = uNext.map((x, r) => (2 / h) * (x - u[r]) - v[r]);
      a = uNext.map((x, r) => (4 / (h * h)) * (x - u[r]) - (4 / h) * v[r] - a[r]);
      u = uNext;
      v = vNext;
      u.forEach((x, r) => (peaks[r] = Math.max(peaks[r], Math.abs(x))));
    }
  }
  return { peaks };
}

/** Gaussian elimination with partial pivoting, factored once (a few lines; the test's own). */
function gaussSolver(matrix: number[][]): (b: number[]) => number[] {
  const n = matrix.length;
  const lu = matrix.map((row) => [...row]);
  const pivots = Array.from({ length: n }, (_, i) => i);
  for (let c = 0; c < n; c++) {
    let best = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(lu[r][c]) > Math.abs(lu[best][c])) best = r;
    [lu[c], lu[best]] = [lu[best], lu[c]];
    [pivots[c], pivots[best]] = [pivots[best], pivots[c]];
    for (let r = c + 1; r < n; r++) {
      lu[r][c] /= lu[c][c];
      for (let k = c + 1; k < n; k++) lu[r][k] -= lu[r][c] * lu[c][k];
    }
  }
  return (b) => {
    const y = pivots.map((p) => b[p]);
    for (let r = 0; r < n; r++) for (let k = 0; k < r; k++) y[r] -= lu[r][k] * y[k];
    for (let r = n - 1; r >= 0; r--) {
      for (let k = r + 1; k < n; k++) y[r] -= lu[r][k] * y[k];
      y[r] /= lu[r][r];
    }
    return y;
  };
}
