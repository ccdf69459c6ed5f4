import {
  historyComparison,
  toDisplay,
  type WholeCalculationDto,
  type UnitSystem,
} from '@tiermode/shared-types';
import { formats as f, inUnits, withUnit } from './formats';
import { lineChart } from './pdf-chart';
import { heading, keyValues, write, type Doc } from './pdf-kit';
import { table } from './pdf-table';

const time = (s: number) => s.toFixed(2);

/**
 * The calc package's response history: what was run and how (the record, its scaling, the
 * limits of the method), the record and its spectrum over the design spectrum, the peak storey
 * responses to it with their times, the comparison with the combined spectrum results, and the
 * free vibration. Nothing when the calc has no record.
 */
export function historySection(doc: Doc, calc: WholeCalculationDto, units: UnitSystem): void {
  const setup = calc.history;
  if (!setup) return;
  doc.addPage();
  heading(doc, 'Response history');
  const results = calc.historyResults;
  const zeta = calc.inputs.dampingRatio;
  write(
    doc,
    `Linear modal response history: the building's modes superposed, each mode's response to the ` +
      `record found step by step exactly for a record linear between its samples (Nigam and ` +
      `Jennings 1969). Classical damping, ${(zeta * 100).toPrecision(3)} % of critical in every ` +
      `mode; the ground is rigid (no soil-structure interaction); the record is used as given, ` +
      `with no baseline correction or filtering (its processing is the engineer's); peaks are ` +
      `read at the record's samples. One record is not a design: the code's rules for the number ` +
      `and choice of records govern.`,
    { width: 495 },
  );
  const record = setup.record;
  const steps = record.accelerations.length;
  keyValues(doc, [
    ['Record', record.name],
    [
      'Origin',
      record.origin === 'demo'
        ? 'Built-in invented demo record (synthetic; not a recorded earthquake, not for design)'
        : 'Uploaded by the designer',
    ],
    [
      'Samples',
      `${steps} at ${record.timeStep} s (${time((steps - 1) * record.timeStep)} s), in ${record.units}`,
    ],
    [
      'Scaling',
      !results
        ? 'Not analysed'
        : calc.analysisStale
          ? 'Found again by the next analysis'
          : results.scaling.explanation,
    ],
  ]);
  if (!results) {
    write(doc, 'The response history has not been made: analyse the calc.');
    return;
  }
  if (calc.analysisStale) {
    write(
      doc,
      'The stored response history is older than the inputs or the record; analyse again before relying on it.',
      { width: 495 },
    );
    return;
  }
  const response = results.response;
  keyValues(doc, [
    ['Scale factor', results.scaling.factor.toPrecision(4)],
    ['Peak ground acc.', `${f.g(response.record.peakGroundAcceleration)} g (scaled)`],
    ['Modes superposed', `${response.modeCount} (all)`],
  ]);
  for (const w of response.warnings) write(doc, `Warning: ${w}`, { width: 495 });

  const ground = response.histories.groundAcceleration;
  lineChart(doc, {
    title: 'Ground acceleration, scaled',
    xLabel: 'Time (s)',
    yLabel: 'Acceleration (g)',
    width: 495,
    height: 200,
    series: [
      { label: 'Ground acceleration', points: ground.times.map((t, k) => [t, ground.values[k]]) },
    ],
  });
  const spectrum = results.recordSpectrum;
  const periods = calc.analysis?.modes.map((m) => m.period) ?? [];
  const saAt = (t: number) => spectrum.sa[spectrum.periods.indexOf(t)] ?? 0;
  const lastDesign = calc.inputs.spectrum.points.at(-1)?.period ?? 10;
  lineChart(doc, {
    title: `The scaled record's spectrum (${(zeta * 100).toPrecision(3)} % damped) over the design spectrum`,
    xLabel: 'Period (s)',
    yLabel: 'Sa (g)',
    width: 495,
    height: 250,
    series: [
      {
        label: 'Design spectrum (the calc)',
        points: calc.inputs.spectrum.points
          .filter((p) => p.period <= 10)
          .map((p) => [p.period, p.sa]),
        width: 3,
        grey: '#aaaaaa',
      },
      {
        label: 'Record (scaled)',
        points: spectrum.periods
          .filter((t) => t <= Math.min(10, Math.max(lastDesign, 4)))
          .map((t) => [t, saAt(t)]),
      },
      {
        label: 'Modal periods',
        points: periods.filter((t) => t <= 10).map((t) => [t, saAt(t)]),
        pointsOnly: true,
        markers: true,
      },
    ],
  });

  heading(doc, 'Peak responses to the record, storey by storey');
  const peaks = response.peaks;
  const at = response.peakTimes;
  table(
    doc,
    [
      { header: 'Storey', width: 40, align: 'right' },
      { header: withUnit(units, 'Displ.', 'displacement'), width: 65, align: 'right' },
      { header: 'at (s)', width: 40, align: 'right' },
      { header: 'Drift ratio', width: 60, align: 'right' },
      { header: withUnit(units, 'Floor force', 'force'), width: 70, align: 'right' },
      { header: withUnit(units, 'Shear', 'force'), width: 70, align: 'right' },
      { header: 'at (s)', width: 40, align: 'right' },
      { header: withUnit(units, 'Moment', 'moment'), width: 75, align: 'right' },
    ],
    peaks.displacement.map((d, i) => [
      String(i + 1),
      inUnits(units, 'displacement', d),
      time(at.displacement[i]),
      f.ratio(peaks.driftRatio[i]),
      inUnits(units, 'force', peaks.floorForce[i]),
      inUnits(units, 'force', peaks.shear[i]),
      time(at.shear[i]),
      inUnits(units, 'moment', peaks.overturningMoment[i]),
    ]),
  );
  write(
    doc,
    `Base shear ${inUnits(units, 'force', response.base.shear)} ${withUnit(units, '', 'force').trim()} at ${time(response.base.shearTime)} s; ` +
      `base moment ${inUnits(units, 'moment', response.base.moment)} ${withUnit(units, '', 'moment').trim()} at ${time(response.base.momentTime)} s. ` +
      'Each peak is the absolute maximum over the record; the peaks of different storeys and quantities come at different times.',
    { width: 495 },
  );
  const roof = response.histories.roofDisplacement;
  lineChart(doc, {
    title: 'Roof displacement relative to the ground',
    xLabel: 'Time (s)',
    yLabel: withUnit(units, 'Displacement', 'displacement'),
    width: 495,
    height: 200,
    series: [
      {
        label: 'Roof',
        points: roof.times.map((t, k) => [t, toDisplay(units, 'displacement', roof.values[k])]),
      },
    ],
  });

  if (calc.analysis) {
    heading(doc, 'Response history against the response spectrum (CQC)');
    const rows = historyComparison(peaks, calc.analysis.combined.cqc);
    const of = (storey: number, quantity: string) =>
      rows.find((r) => r.storey === storey && r.quantity === quantity)!;
    const ratio = (r: { ratio: number | null }) => (r.ratio === null ? '-' : r.ratio.toFixed(2));
    table(
      doc,
      [
        { header: 'Storey', width: 40, align: 'right' },
        { header: withUnit(units, 'Displ., history', 'displacement'), width: 75, align: 'right' },
        { header: withUnit(units, 'Displ., CQC', 'displacement'), width: 70, align: 'right' },
        { header: 'Ratio', width: 40, align: 'right' },
        { header: withUnit(units, 'Shear, history', 'force'), width: 85, align: 'right' },
        { header: withUnit(units, 'Shear, CQC', 'force'), width: 85, align: 'right' },
        { header: 'Ratio', width: 40, align: 'right' },
      ],
      peaks.displacement.map((_, i) => {
        const d = of(i + 1, 'displacement');
        const v = of(i + 1, 'shear');
        return [
          String(i + 1),
          inUnits(units, 'displacement', d.history),
          inUnits(units, 'displacement', d.spectrum),
          ratio(d),
          inUnits(units, 'force', v.history),
          inUnits(units, 'force', v.spectrum),
          ratio(v),
        ];
      }),
    );
    write(
      doc,
      'Both are elastic (no R, q or Cd). The record is scaled to the design spectrum only over the ' +
        'period range stated, so the ratios show how this record differs from the spectrum elsewhere.',
      { width: 495 },
    );
  }

  const free = results.freeVibration;
  if (free) {
    heading(doc, 'Free vibration');
    write(
      doc,
      `Started from ${free.startedFrom}, at rest, and let go: each level moves as the sum of its ` +
        `modes' damped cosines, u(t) = sum of phi_n q_n(t), found exactly at each sample.`,
      { width: 495 },
    );
    table(
      doc,
      [
        { header: 'Mode', width: 40, align: 'right' },
        { header: 'Period (s)', width: 70, align: 'right' },
        { header: withUnit(units, 'q_n(0), roof', 'displacement'), width: 110, align: 'right' },
      ],
      free.modes
        .filter(
          (m) =>
            Math.abs(m.initialCoordinate) >
            1e-12 * Math.max(...free.initialDisplacements.map(Math.abs)),
        )
        .map((m) => [
          String(m.number),
          f.period(m.period),
          inUnits(units, 'displacement', m.initialCoordinate),
        ]),
    );
    lineChart(doc, {
      title: 'Free vibration: roof displacement',
      xLabel: 'Time (s)',
      yLabel: withUnit(units, 'Displacement', 'displacement'),
      width: 495,
      height: 200,
      series: [
        {
          label: 'Roof',
          points: free.roofDisplacement.times.map((t, k) => [
            t,
            toDisplay(units, 'displacement', free.roofDisplacement.values[k]),
          ]),
        },
      ],
    });
  }
}
