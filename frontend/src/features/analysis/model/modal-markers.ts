import { interpolateSpectrum, type SpectrumInput } from '@tiermode/shared-types';

export interface ModalMarker {
  number: number;
  period: number;
  /** Sa on the spectrum as it stands, g; null where the period is outside its table. */
  sa: number | null;
}

/**
 * Where each modal period meets the spectrum as it stands: Sa read from the current table (never
 * the Sa stored with an older analysis, which a regenerated curve would leave floating), or null
 * outside the table (listed apart, so a stale long period cannot stretch the axis). A table whose
 * periods do not increase marks nothing.
 */
export function modalMarkers(
  spectrum: Pick<SpectrumInput, 'points' | 'interpolation'>,
  modes: readonly { number: number; period: number }[],
): ModalMarker[] {
  const { points } = spectrum;
  const sorted = points.every(
    (p, i) =>
      Number.isFinite(p.period) &&
      Number.isFinite(p.sa) &&
      (i === 0 || p.period > points[i - 1].period),
  );
  return modes.map((m) => ({
    number: m.number,
    period: m.period,
    sa: sorted ? interpolateSpectrum(points, m.period, spectrum.interpolation) : null,
  }));
}
