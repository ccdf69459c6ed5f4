import { interpolateSpectrum, spectrumPointProblems } from '@tiermode/shared-types';
import { describe, expect, it } from 'vitest';
import { modalMarkers } from './modal-markers';

describe('the spectrum table as typed', () => {
  it('names each unsorted or negative point in the user’s words', () => {
    const problems = spectrumPointProblems([
      { period: 0, sa: 0.4 },
      { period: 0.6, sa: 1 },
      { period: 0.5, sa: 1 },
      { period: 2, sa: -0.1 },
    ]);
    expect(problems).toEqual([
      {
        index: 2,
        field: 'period',
        message: 'Point 3: the period must be greater than 0.6 s above it',
      },
      { index: 3, field: 'sa', message: 'Point 4: Sa must be 0 g or more' },
    ]);
    expect(spectrumPointProblems([{ period: 0, sa: 1 }])[0].message).toBe(
      'A spectrum needs at least 2 points',
    );
  });

  it('reads Sa inside the table, linear or log-log, and nothing outside it', () => {
    const points = [
      { period: 0.5, sa: 1 },
      { period: 2, sa: 0.25 },
    ];
    expect(interpolateSpectrum(points, 1.25)).toBeCloseTo(0.625, 14);
    // Log-log between (0.5, 1) and (2, 0.25) is Sa = 0.5 / T: exact at T = 1 (common practice).
    expect(interpolateSpectrum(points, 1, 'log-log')).toBeCloseTo(0.5, 14);
    expect(interpolateSpectrum(points, 2.5)).toBeNull();
    expect(interpolateSpectrum(points, 0.1)).toBeNull();
  });
});

describe('the modal periods on the spectrum plot', () => {
  it('sit on the spectrum as it stands, not at the Sa of an older analysis', () => {
    const regenerated = {
      points: [
        { period: 0, sa: 0.4 },
        { period: 0.5, sa: 1 },
        { period: 4, sa: 0.125 },
      ],
    };
    // A 4,293 s period left from an analysis of a slipped storey table lies outside: no marker.
    const markers = modalMarkers(regenerated, [
      { number: 1, period: 4293 },
      { number: 2, period: 2.25 },
    ]);
    expect(markers[0].sa).toBeNull();
    // Linear in T between (0.5, 1) and (4, 0.125): 1 - 0.875 x (1.75 / 3.5) = 0.5625.
    expect(markers[1].sa).toBeCloseTo(0.5625, 14);
  });

  it('marks nothing on a table whose periods do not increase', () => {
    const unsorted = {
      points: [
        { period: 0.6, sa: 1 },
        { period: 0.5, sa: 1 },
      ],
    };
    expect(modalMarkers(unsorted, [{ number: 1, period: 0.55 }])[0].sa).toBeNull();
  });
});
