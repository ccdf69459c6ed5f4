import {
  toDisplay,
  unitLabel,
  type AnalysisResponse,
  type CalculationInputs,
  type ChecksResponse,
  type Quantity,
  type ResponseHistoryResult,
  type UnitSystem,
} from '@tiermode/shared-types';

export interface Table {
  name: string;
  headers: string[];
  rows: (string | number | null)[][];
}

/**
 * Six significant figures: every digit an engineer can use from a result (the engine's own
 * accuracy is far finer, the inputs' far coarser), without the binary tail of 0.899999999341419.
 */
export const SIGNIFICANT = 6;
const sig = (value: number) =>
  Number.isFinite(value) ? Number(value.toPrecision(SIGNIFICANT)) : null;

const labelOf = (inputs: CalculationInputs, i: number) => inputs.storeys[i]?.label ?? '';

/**
 * The stored results as tables, in the chosen units: the modes, each mode's responses storey by
 * storey, the combined responses (SRSS, CQC, ABS) with the base shear and moment, where the
 * checks were made the design storey values beside the elastic ones, and where the calc has a
 * response history its peaks storey by storey with their times.
 */
export function resultTables(
  inputs: CalculationInputs,
  analysis: AnalysisResponse,
  units: UnitSystem,
  checks: ChecksResponse | null = null,
  history: ResponseHistoryResult | null = null,
): Table[] {
  const show = (quantity: Quantity, si: number) => sig(toDisplay(units, quantity, si));
  const u = (quantity: Quantity) => unitLabel(units, quantity);
  // US customary units show a mass as its weight (kip), as the storey table does.
  const massTitle = units === 'US' ? 'Effective modal weight' : 'Effective modal mass';
  const modes: Table = {
    name: 'Modes',
    headers: [
      'Mode',
      'Period (s)',
      'Frequency (Hz)',
      'Circular frequency (rad/s)',
      'Participation factor (shape +1 at the level in the last column)',
      `${massTitle} (${u('mass')})`,
      'Effective mass ratio (%)',
      'Cumulative mass ratio (%)',
      'Sa (g)',
      'Shape +1 at level',
    ],
    rows: analysis.modes.map((m) => [
      m.number,
      sig(m.period),
      sig(m.frequency),
      sig(m.circularFrequency),
      sig(m.participationFactor),
      show('mass', m.effectiveMass),
      sig(m.effectiveMassRatio * 100),
      sig(m.cumulativeMassRatio * 100),
      sig(m.sa),
      // The roof unless the roof barely moves in this mode (analyses before engine 1.1: roof).
      m.normalisationLevel ?? inputs.storeys.length,
    ]),
  };
  const storeyHeaders = [
    'Storey',
    'Label',
    `Displacement (${u('displacement')})`,
    `Drift (${u('displacement')})`,
    `Floor force (${u('force')})`,
    `Storey shear (${u('force')})`,
    `Overturning moment (${u('moment')})`,
  ];
  const modal: Table = {
    name: 'Modal responses',
    headers: ['Mode', ...storeyHeaders],
    rows: analysis.modes.flatMap((m) =>
      m.response.displacement.map((d, i) => [
        m.number,
        i + 1,
        labelOf(inputs, i),
        show('displacement', d),
        show('displacement', m.response.drift[i]),
        show('force', m.response.floorForce[i]),
        show('force', m.response.storeyShear[i]),
        show('moment', m.response.overturningMoment[i]),
      ]),
    ),
  };
  const methods = [
    ['SRSS', analysis.combined.srss],
    ['CQC', analysis.combined.cqc],
    ['ABS', analysis.combined.abs],
  ] as const;
  const combined: Table = {
    name: 'Combined responses',
    headers: ['Combination', ...storeyHeaders, 'Drift ratio'],
    rows: methods.flatMap(([method, r]) => [
      ...r.displacement.map((d, i) => [
        method,
        i + 1,
        labelOf(inputs, i),
        show('displacement', d),
        show('displacement', r.drift[i]),
        show('force', r.floorForce[i]),
        show('force', r.storeyShear[i]),
        show('moment', r.overturningMoment[i]),
        sig(r.driftRatio[i]),
      ]),
      [
        method,
        'Base',
        '',
        null,
        null,
        null,
        show('force', r.baseShear),
        show('moment', r.baseMoment),
        null,
      ],
    ]),
  };
  const tables = [modes, modal, combined];
  const design = checks?.design;
  if (design) {
    const elastic = analysis.combined[design.combination];
    const left = design.analysisValues === 'elastic' ? 'elastic' : 'design, analysis';
    const pairs = [
      ['Floor force', 'force', 'floorForce'],
      ['Storey shear', 'force', 'storeyShear'],
      ['Overturning moment', 'moment', 'overturningMoment'],
      ['Displacement', 'displacement', 'displacement'],
      ['Drift', 'displacement', 'drift'],
    ] as const;
    tables.push({
      name: 'Design storey values',
      headers: [
        'Storey',
        'Label',
        ...pairs.flatMap(([title, quantity]) => [
          `${title}, ${left} (${u(quantity)})`,
          `${title}, design (${u(quantity)})`,
        ]),
      ],
      rows: inputs.storeys.map((_, i) => [
        i + 1,
        labelOf(inputs, i),
        ...pairs.flatMap(([, quantity, key]) => [
          show(quantity, elastic[key][i]),
          show(quantity, design[key][i]),
        ]),
      ]),
    });
  }
  if (history) {
    const { peaks, peakTimes: at } = history.response;
    const quantities = [
      ['Displacement', 'displacement', 'displacement'],
      ['Drift', 'displacement', 'drift'],
      ['Floor force', 'force', 'floorForce'],
      ['Storey shear', 'force', 'shear'],
      ['Overturning moment', 'moment', 'overturningMoment'],
    ] as const;
    tables.push({
      name: 'Response history peaks',
      headers: [
        'Storey',
        'Label',
        ...quantities.flatMap(([title, quantity]) => [
          `${title} (${u(quantity)})`,
          `${title} at (s)`,
        ]),
        'Drift ratio',
        `Record scale factor`,
      ],
      rows: inputs.storeys.map((_, i) => [
        i + 1,
        labelOf(inputs, i),
        ...quantities.flatMap(([, quantity, key]) => [
          show(quantity, peaks[key][i]),
          sig(at[key][i]),
        ]),
        sig(peaks.driftRatio[i]),
        sig(history.scaling.factor),
      ]),
    });
  }
  return tables;
}
