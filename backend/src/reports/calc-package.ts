import {
  describeSpectrumSource,
  shapeNormalisationNote,
  toDisplay,
  unitLabel,
  type WholeCalculationDto,
  type CombinedResponse,
  type SealCheckResponse,
  type UnitSystem,
} from '@tiermode/shared-types';
import { formats as f, inUnits, isoDate, withUnit } from './formats';
import { lineChart } from './pdf-chart';
import { finish, heading, keyValues, MARGIN, newDocument, write, type Doc } from './pdf-kit';
import { table } from './pdf-table';
import { historySection } from './history-section';

const CAUTION =
  'This analysis is an aid to an engineer’s judgement. The locally adopted building code governs, ' +
  'and nothing here is for construction until the engineer of record has accepted it.';

const STATUS = {
  draft: 'Draft (preliminary)',
  submitted: 'Submitted for review (preliminary)',
  locked: 'Locked: calc of record',
  superseded: 'Superseded by a newer revision',
} as const;

function cover(doc: Doc, calc: WholeCalculationDto, check: SealCheckResponse | null, at: Date) {
  doc.fontSize(20);
  write(doc, calc.title, { bold: true });
  doc.fontSize(11).moveDown(0.3);
  write(doc, `Seismic modal response spectrum analysis: calc package, revision ${calc.revision}`);
  doc.fontSize(10).moveDown(1);
  keyValues(doc, [
    ['Project', calc.projectName],
    ['Revision', String(calc.revision)],
    ['Status', STATUS[calc.status]],
    ['Author', calc.author.name],
    ['Reviewer', calc.reviewer?.name ?? '-'],
    ['Analysed', `${isoDate(calc.analysedAt)}, engine ${calc.engineVersion ?? '-'}`],
    ['Submitted', isoDate(calc.submittedAt)],
    ['Locked', isoDate(calc.lockedAt)],
    ['Generated', isoDate(at.toISOString())],
  ]);
  doc.moveDown(0.5);
  if (calc.seal) {
    keyValues(doc, [
      ['Seal (SHA-256)', calc.seal.hash],
      ['Signature (Ed25519)', calc.seal.signature ?? 'none (sealed before seals were signed)'],
      ['Signing key id', calc.seal.keyId ?? '-'],
    ]);
    write(
      doc,
      check?.valid
        ? 'Verification: when this package was made, the hash recomputed from the stored data matched the seal, ' +
            "the signature verified with the server's key and the lock is on the audit trail. To check the signature " +
            'yourself, fetch the public key from /api/seal/public-key and verify the signature over the text ' +
            '"tiermode-seal:" followed by the hash (the README shows the openssl command).'
        : `WARNING: this seal does not verify (${check?.problems.join('; ') || 'unknown reason'}). Do not rely on this calc.`,
      { width: 495 },
    );
  } else {
    write(doc, 'Not locked: there is no seal. Every page is marked PRELIMINARY.', { width: 495 });
  }
  heading(doc, 'Cautions');
  write(doc, CAUTION, { width: 495 });
  doc.moveDown(0.3);
  write(
    doc,
    'The model is a planar shear building: rigid floors, one horizontal direction, linear elastic, fixed base, ' +
      'one damping ratio for every mode. The engineer of record confirms that it represents the structure.',
    { width: 495 },
  );
}

function inputs(doc: Doc, calc: WholeCalculationDto, units: UnitSystem) {
  const { storeys, spectrum, dampingRatio, modeCount } = calc.inputs;
  heading(doc, 'Inputs: storey table');
  table(
    doc,
    [
      { header: 'Storey', width: 50, align: 'right' },
      { header: 'Label', width: 130 },
      { header: withUnit(units, 'Height', 'length'), width: 90, align: 'right' },
      {
        header: withUnit(units, units === 'US' ? 'Seismic weight' : 'Mass', 'mass'),
        width: 100,
        align: 'right',
      },
      { header: withUnit(units, 'Stiffness', 'stiffness'), width: 125, align: 'right' },
    ],
    storeys.map((s, i) => [
      String(i + 1),
      s.label ?? '',
      inUnits(units, 'length', s.height),
      inUnits(units, 'mass', s.mass),
      inUnits(units, 'stiffness', s.stiffness),
    ]),
  );
  write(
    doc,
    `Storey 1 is at the base. Damping: ${(dampingRatio * 100).toFixed(2)}% of critical in every mode. ` +
      `Modes combined: ${modeCount ? `the first ${modeCount}` : 'all'}. Spectrum interpolation: ${spectrum.interpolation ?? 'linear'}.`,
    { width: 495 },
  );
  heading(doc, 'Inputs: design spectrum');
  write(
    doc,
    `Source: ${describeSpectrumSource(spectrum.source)}.${
      spectrum.source && spectrum.source.kind !== 'user'
        ? " Past the table's end the generator's own formula gives Sa while the table matches it."
        : ''
    }`,
    { width: 495 },
  );
  doc.moveDown(0.3);
  table(
    doc,
    [
      { header: 'Point', width: 60, align: 'right' },
      { header: 'Period T (s)', width: 120, align: 'right' },
      { header: 'Sa (g)', width: 120, align: 'right' },
    ],
    spectrum.points.map((p, i) => [String(i + 1), p.period.toFixed(3), f.g(p.sa)]),
  );
  lineChart(doc, {
    title: 'Design spectrum, with the modal periods',
    xLabel: 'Period T (s)',
    yLabel: 'Sa (g)',
    width: 495,
    height: 230,
    series: [
      { label: 'Design spectrum', points: spectrum.points.map((p) => [p.period, p.sa]) },
      {
        label: 'Modal periods',
        points: (calc.analysis?.modes ?? []).map((m) => [m.period, m.sa]),
        pointsOnly: true,
      },
    ],
  });
}

function method(doc: Doc) {
  heading(doc, 'Method');
  for (const line of [
    'Mass matrix M = diag(m₁ … mₙ); stiffness matrix K of the shear building, tridiagonal from the storey stiffnesses kᵢ.',
    'Modes: K φ = ω² M φ, solved through the symmetric form A = M^-1/2 K M^-1/2; T = 2π / ω.',
    'Participation: Lₙ = φₙᵀ M r, Mₙ = φₙᵀ M φₙ, Γₙ = Lₙ / Mₙ, effective modal mass Mₙ* = Lₙ² / Mₙ (r = 1 at every floor).',
    'Modal maxima for Aₙ = Sa(Tₙ) g: floor forces fₙ = Γₙ M φₙ Aₙ, displacements uₙ = Γₙ φₙ Aₙ / ωₙ², drifts, storey shears, overturning moments.',
    'Combination, each quantity on its own: SRSS r = √(Σ rₙ²); CQC r = √(Σᵢ Σⱼ ρᵢⱼ rᵢ rⱼ) with the Der Kiureghian (1981) coefficient ρᵢⱼ for equal damping ζ; ABS Σ |rₙ| for comparison.',
    'Sources: Chopra, Dynamics of Structures, chapters 10-13; Wilson, Der Kiureghian & Bayo (1981).',
  ]) {
    write(doc, `• ${line.replace(/[₁ₙᵢⱼᵀ²√Σ…]/g, (c) => SUBSTITUTES[c] ?? c)}`, { width: 495 });
    doc.moveDown(0.2);
  }
}

// Roboto's Latin and Greek subsets lack sub- and superscripts and some maths signs.
const SUBSTITUTES: Record<string, string> = {
  '₁': '1',
  ₙ: 'n',
  ᵢ: 'i',
  ⱼ: 'j',
  ᵀ: '^T',
  '²': '^2',
  '√': 'sqrt',
  Σ: 'Σ',
  '…': '...',
};

function results(doc: Doc, calc: WholeCalculationDto, units: UnitSystem) {
  const analysis = calc.analysis;
  heading(doc, 'Modes and participation');
  if (!analysis) {
    write(doc, 'Not analysed.');
    return;
  }
  table(
    doc,
    [
      { header: 'Mode', width: 40, align: 'right' },
      { header: 'Period (s)', width: 70, align: 'right' },
      { header: 'Freq. (Hz)', width: 65, align: 'right' },
      { header: 'Part. factor', width: 75, align: 'right' },
      { header: withUnit(units, units === 'US' ? 'W*' : 'M*', 'mass'), width: 80, align: 'right' },
      { header: 'M*/M (%)', width: 60, align: 'right' },
      { header: 'Cumul. (%)', width: 60, align: 'right' },
      { header: 'Sa (g)', width: 45, align: 'right' },
    ],
    analysis.modes.map((m) => [
      String(m.number),
      f.period(m.period),
      f.plain(m.frequency),
      f.plain(m.participationFactor) + (shapeNormalisationNote(m) ? ' †' : ''),
      inUnits(units, 'mass', m.effectiveMass),
      f.percent(m.effectiveMassRatio),
      f.percent(m.cumulativeMassRatio),
      f.g(m.sa),
    ]),
  );
  if (analysis.modes.some((m) => shapeNormalisationNote(m))) {
    write(doc, '† Shape +1 at its largest component, not the roof (see the warnings).', {
      width: 495,
    });
  }
  for (const w of analysis.warnings) write(doc, `Warning: ${w}`, { width: 495 });
  let height = 0;
  const elevations = calc.inputs.storeys.map((s) =>
    toDisplay(units, 'length', (height += s.height)),
  );
  lineChart(doc, {
    title: 'Mode shapes (roof = 1 unless noted), first three modes',
    xLabel: 'Mode shape',
    yLabel: withUnit(units, 'Elevation', 'length'),
    width: 495,
    height: 260,
    series: analysis.modes.slice(0, 3).map((m, i) => ({
      label: `Mode ${m.number} (T = ${f.period(m.period)} s)`,
      points: [[0, 0], ...m.shape.map((p, k) => [p, elevations[k]] as [number, number])],
      markers: true,
      dash: i === 0 ? undefined : i * 2,
    })),
  });
  const profile = (
    title: string,
    xLabel: string,
    pick: (c: CombinedResponse) => number[],
    shown: (si: number) => number,
  ) =>
    lineChart(doc, {
      title,
      xLabel,
      yLabel: withUnit(units, 'Elevation', 'length'),
      width: 495,
      height: 250,
      // CQC first, wide and pale, then SRSS narrow and dashed over it: where the two agree both
      // stay visible. ABS long-dashed.
      series: (
        [
          ['cqc', undefined, 3.2, '#aaaaaa'],
          ['srss', 2, 1.1, '#000000'],
          ['abs', 5, 1.1, '#555555'],
        ] as const
      ).map(([method, dash, width, grey]) => ({
        label: method === 'abs' ? 'ABS (upper bound)' : method.toUpperCase(),
        points: pick(analysis.combined[method]).map(
          (v, k) => [shown(v), elevations[k]] as [number, number],
        ),
        steps: true,
        dash,
        width,
        grey,
      })),
    });
  if (doc.y > 420) doc.addPage();
  profile(
    'Storey shear',
    withUnit(units, 'Storey shear', 'force'),
    (c) => c.storeyShear,
    (v) => toDisplay(units, 'force', v),
  );
  if (doc.y > 420) doc.addPage();
  profile(
    'Storey drift ratio',
    'Drift ratio',
    (c) => c.driftRatio,
    (v) => v,
  );

  const storeyColumns = [
    { header: 'Storey', width: 45, align: 'right' as const },
    { header: 'Label', width: 80 },
    { header: withUnit(units, 'Displ.', 'displacement'), width: 70, align: 'right' as const },
    { header: 'Drift ratio', width: 70, align: 'right' as const },
    { header: withUnit(units, 'Floor force', 'force'), width: 75, align: 'right' as const },
    { header: withUnit(units, 'Shear', 'force'), width: 75, align: 'right' as const },
    { header: withUnit(units, 'Moment', 'moment'), width: 80, align: 'right' as const },
  ];
  const storeyRows = (r: {
    displacement: number[];
    drift: number[];
    floorForce: number[];
    storeyShear: number[];
    overturningMoment: number[];
  }) =>
    r.displacement.map((d, i) => [
      String(i + 1),
      calc.inputs.storeys[i]?.label ?? '',
      inUnits(units, 'displacement', d),
      f.ratio(r.drift[i] / calc.inputs.storeys[i].height),
      inUnits(units, 'force', r.floorForce[i]),
      inUnits(units, 'force', r.storeyShear[i]),
      inUnits(units, 'moment', r.overturningMoment[i]),
    ]);
  for (const method of ['cqc', 'srss', 'abs'] as const) {
    heading(
      doc,
      `Combined responses (${method === 'abs' ? 'ABS, upper bound' : method.toUpperCase()}), storey by storey`,
    );
    table(doc, storeyColumns, storeyRows(analysis.combined[method]));
  }
  heading(doc, 'Base shear and base moment');
  table(
    doc,
    [
      { header: 'Combination', width: 160 },
      { header: withUnit(units, 'Base shear', 'force'), width: 150, align: 'right' },
      { header: withUnit(units, 'Base moment', 'moment'), width: 150, align: 'right' },
    ],
    (['srss', 'cqc', 'abs'] as const).map((method) => [
      method === 'abs' ? 'ABS (upper bound)' : method.toUpperCase(),
      inUnits(units, 'force', analysis.combined[method].baseShear),
      inUnits(units, 'moment', analysis.combined[method].baseMoment),
    ]),
  );
  for (const m of analysis.modes) {
    heading(doc, `Mode ${m.number} alone (T = ${f.period(m.period)} s), signed as its shape`);
    table(doc, storeyColumns, storeyRows(m.response));
  }
}

function review(doc: Doc, calc: WholeCalculationDto, units: UnitSystem) {
  heading(doc, 'Code-basis checks');
  const checks = calc.checks;
  if (!checks || calc.analysisStale) {
    write(
      doc,
      checks
        ? 'The stored checks are older than the inputs; analyse again before relying on them.'
        : 'No code basis is set for this calc; the engineer of record makes the code checks.',
      { width: 495 },
    );
  } else {
    write(
      doc,
      'The checks follow the named clauses as the software reads them; the engineer of record confirms that they apply under the locally adopted code.',
      { width: 495 },
    );
    for (const warning of checks.warnings ?? []) {
      write(doc, `WARNING: ${warning}`, { bold: true, width: 495 });
    }
    doc.moveDown(0.3);
    keyValues(doc, [
      ['Code basis', checks.code],
      [
        'ELF period',
        `${f.period(checks.elf.period)} s${checks.elf.capped ? ' (capped at Cu Ta)' : ''}`,
      ],
      [
        'ELF base shear',
        `${inUnits(units, 'force', checks.elf.baseShear)} ${unitLabel(units, 'force')} (${checks.elf.clause}${checks.elf.csGoverns ? `, ${checks.elf.csGoverns}` : ''})`,
      ],
      [
        'Modal base shear',
        `${inUnits(units, 'force', checks.modalBaseShear)} ${unitLabel(units, 'force')}`,
      ],
      [
        'Scale factors',
        `forces ${checks.scaleFactor.toFixed(3)}, drifts ${checks.driftScaleFactor.toFixed(3)}`,
      ],
    ]);
    table(
      doc,
      [
        { header: 'Storey', width: 50, align: 'right' },
        { header: 'Drift / height', width: 90, align: 'right' },
        { header: 'Limit', width: 70, align: 'right' },
        { header: 'Drift', width: 60 },
        { header: 'Theta', width: 70, align: 'right' },
        { header: 'P-delta', width: 155 },
      ],
      checks.storeys.map((st) => [
        String(st.storey),
        f.ratio(st.designDriftRatio),
        st.driftLimitRatio.toFixed(4),
        st.driftOk ? 'OK' : 'EXCEEDS',
        st.theta.toFixed(4),
        st.pDelta,
      ]),
    );
    for (const flag of checks.irregularities) {
      write(
        doc,
        `${flag.message} (${flag.clause})${flag.excepted ? ` Excepted: ${flag.exceptionReason}` : ''}`,
        { width: 495 },
      );
    }
    for (const note of checks.notes) write(doc, note, { width: 495 });
    if (checks.design) designValues(doc, calc, checks.design, units);
  }
  heading(doc, 'Review comments');
  if (calc.comments.length === 0) write(doc, 'None.');
  for (const c of calc.comments) {
    write(
      doc,
      `${c.author.name}, ${isoDate(c.createdAt)}, on ${c.target ?? 'the whole calc'}${c.resolved ? ' (resolved)' : ''}:`,
      { bold: true, width: 495 },
    );
    write(doc, c.body, { width: 495 });
    doc.moveDown(0.3);
  }
  heading(doc, 'Sign-off');
  if (calc.seal) {
    keyValues(doc, [
      ['Accepted by', calc.seal.reviewerName],
      ['Licence', `${calc.seal.licenseNumber}, ${calc.seal.licenseJurisdiction}`],
      ['Locked', isoDate(calc.seal.lockedAt)],
      ['Statement', calc.seal.statement],
      ['Seal (SHA-256)', calc.seal.hash],
    ]);
  } else {
    write(doc, 'Not signed off: this calc is preliminary until a licensed reviewer locks it.', {
      width: 495,
    });
  }
}

/** The design storey values beside the elastic ones, each column named. */
function designValues(
  doc: Doc,
  calc: WholeCalculationDto,
  design: NonNullable<NonNullable<WholeCalculationDto['checks']>['design']>,
  units: UnitSystem,
) {
  const analysis = calc.analysis;
  if (!analysis) return;
  const elastic = analysis.combined[design.combination];
  const left = design.analysisValues === 'elastic' ? 'elastic' : 'analysis';
  heading(doc, `Storey values for design (${design.combination.toUpperCase()})`);
  write(doc, design.explanation, { width: 495 });
  doc.moveDown(0.3);
  const pairs = [
    ['Shear', 'force', 'storeyShear'],
    ['Moment', 'moment', 'overturningMoment'],
    ['Floor force', 'force', 'floorForce'],
    ['Drift', 'displacement', 'drift'],
  ] as const;
  table(
    doc,
    [
      { header: 'Storey', width: 35, align: 'right' },
      ...pairs.flatMap(([title, quantity]) => [
        {
          header: `${withUnit(units, title, quantity)} ${left}`,
          width: 57,
          align: 'right' as const,
        },
        {
          header: `${withUnit(units, title, quantity)} design`,
          width: 57,
          align: 'right' as const,
        },
      ]),
    ],
    calc.inputs.storeys.map((_, i) => [
      String(i + 1),
      ...pairs.flatMap(([, quantity, key]) => [
        inUnits(units, quantity, elastic[key][i]),
        inUnits(units, quantity, design[key][i]),
      ]),
    ]),
  );
  if (design.analysisValues === 'design') {
    write(
      doc,
      "'analysis': the EN 1998-1 design spectrum already includes q, so these are design forces; design drifts are q times them.",
      { width: 495 },
    );
  }
}

/** Page numbers on every page, and PRELIMINARY across each page of a calc that is not locked. */
function decorate(doc: Doc, calc: WholeCalculationDto) {
  const range = doc.bufferedPageRange();
  const preliminary = calc.status !== 'locked' && calc.status !== 'superseded';
  for (let i = range.start; i < range.start + range.count; i += 1) {
    doc.switchToPage(i);
    const { width, height } = doc.page;
    if (preliminary) {
      doc.save();
      doc.rotate(-35, { origin: [width / 2, height / 2] });
      doc.font('bold').fontSize(72).fillColor('#c62828').fillOpacity(0.12);
      doc.text('PRELIMINARY', 0, height / 2 - 36, { width, align: 'center', lineBreak: false });
      doc.restore();
    }
    doc.font('text').fontSize(8).fillColor('#444444').fillOpacity(1);
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    doc.text(
      `${calc.title}, revision ${calc.revision} · ${STATUS[calc.status]} · page ${i + 1} of ${range.count}`,
      MARGIN,
      height - 30,
      { width: width - 2 * MARGIN, align: 'center', lineBreak: false },
    );
    doc.page.margins.bottom = bottom;
  }
}

/**
 * The calc package: cover, cautions, inputs, method, modes, figures, combined results, checks,
 * review comments and sign-off, as a PDF. A locked calc's package is made from its stored,
 * sealed data, and the cover says whether that data still matches the seal.
 */
export async function buildCalcPackage(
  calc: WholeCalculationDto,
  check: SealCheckResponse | null,
  generatedAt: Date,
  units: UnitSystem = calc.displayUnits,
): Promise<Buffer> {
  const doc = newDocument(`${calc.title}, revision ${calc.revision}`);
  cover(doc, calc, check, generatedAt);
  doc.addPage();
  inputs(doc, calc, units);
  method(doc);
  doc.addPage();
  results(doc, calc, units);
  historySection(doc, calc, units);
  review(doc, calc, units);
  decorate(doc, calc);
  return finish(doc);
}
