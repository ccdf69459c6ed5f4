import type { CalculationInputs } from './calculations';
import type { CodeBasisParameters } from './checks';
import type { RecordScaling, ResponseHistorySetup } from './response-history';

/** One value that changed: what it is, before and after (SI base units, as stored). */
export interface FieldChange {
  /** e.g. "mass", "dampingRatio", "points[3]", "sds" */
  field: string;
  old: unknown;
  new: unknown;
}

/** One storey's changes; storeys are matched by number (1 = the base). */
export interface StoreyChange {
  storey: number;
  /** `added` or `removed` when the storey exists on one side only. */
  kind: 'changed' | 'added' | 'removed';
  fields: FieldChange[];
}

/**
 * `GET /api/calculations/:id/changes?since=submission|revision`: since the submission the
 * reviewer last returned, or since the locked revision the calc was made from.
 */
export interface CalculationChanges {
  since: 'submission' | 'revision';
  /**
   * What the calc is compared with: the submission the reviewer last returned (`at` = when it
   * was returned), or the previous revision (`at` = when it was locked).
   */
  baseline: { calculationId: string; revision: number; at: string | null };
  storeys: StoreyChange[];
  /** Points (`points[i]`, 1-based, and `points.length`), `interpolation` and `source`. */
  spectrum: FieldChange[];
  /** `code` and each parameter of the basis; `basis` when one side has none. */
  basis: FieldChange[];
  /** `dampingRatio`, `modeCount`, `targetMassRatio`. */
  settings: FieldChange[];
  /**
   * The response history, in words: `response history` when one side has none, else
   * `ground-motion record`, `record scaling`, `free vibration`.
   */
  history: FieldChange[];
  /** True when nothing above changed. */
  unchanged: boolean;
}

/** What is compared: a calc's inputs and basis, and its response history setup. */
export interface ComparedInputs {
  inputs: CalculationInputs;
  basis: CodeBasisParameters | null;
  /** Absent: not compared (e.g. a submission returned before records were kept with calcs). */
  history?: ResponseHistorySetup | null;
}

const describeScaling = (scaling: RecordScaling) =>
  scaling.method === 'factor'
    ? `x ${scaling.factor}`
    : `${scaling.rule === 'mean' ? 'design spectrum mean' : 'not below 90 % of the design spectrum'} over ${scaling.periodRange[0]} to ${scaling.periodRange[1]} s`;

/** A response history setup's parts in words, for the changes table. */
function historyParts(setup: ResponseHistorySetup) {
  const { record } = setup;
  const start = setup.freeVibration?.start;
  return {
    record: `${record.name} (${record.accelerations.length} samples at ${record.timeStep} s, ${record.units})`,
    scaling: describeScaling(setup.scaling),
    freeVibration: !setup.freeVibration
      ? 'none'
      : `${start?.kind === 'mode' ? `mode ${start.mode}, ${start.amplitude} m` : 'a given shape'}, ${setup.freeVibration.duration} s at ${setup.freeVibration.timeStep} s`,
  };
}

function historyFieldChanges(
  before: ResponseHistorySetup | null | undefined,
  after: ResponseHistorySetup | null | undefined,
): FieldChange[] {
  if (before === undefined || after === undefined) return [];
  if (!before || !after) {
    if (!before && !after) return [];
    return [
      {
        field: 'response history',
        old: before ? historyParts(before).record : null,
        new: after ? historyParts(after).record : null,
      },
    ];
  }
  const a = historyParts(before);
  const b = historyParts(after);
  return [
    ...(same(before.record, after.record)
      ? []
      : [{ field: 'ground-motion record', old: a.record, new: b.record }]),
    ...(same(before.scaling, after.scaling)
      ? []
      : [{ field: 'record scaling', old: a.scaling, new: b.scaling }]),
    ...(same(before.freeVibration, after.freeVibration)
      ? []
      : [{ field: 'free vibration', old: a.freeVibration, new: b.freeVibration }]),
  ];
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** Listed point by point up to this many; past it the count of further differences is given. */
const MAX_POINTS_LISTED = 50;

function fieldChanges(
  before: Record<string, unknown>,
  after: Record<string, unknown>,
  fields: readonly string[],
): FieldChange[] {
  return fields
    .filter((field) => !same(before[field], after[field]))
    .map((field) => ({ field, old: before[field] ?? null, new: after[field] ?? null }));
}

/**
 * Every difference between two sets of inputs and bases, storey by storey and field by field:
 * what a reviewer reads before signing a resubmitted calc, and what the audit trail names when
 * a calc is edited.
 */
export function inputChanges(
  before: ComparedInputs,
  after: ComparedInputs,
): Omit<CalculationChanges, 'since' | 'baseline'> {
  const a = before.inputs;
  const b = after.inputs;
  const storeys: StoreyChange[] = [];
  const count = Math.max(a.storeys.length, b.storeys.length);
  for (let i = 0; i < count; i += 1) {
    const was = a.storeys[i];
    const now = b.storeys[i];
    const fields = ['label', 'height', 'mass', 'stiffness'] as const;
    if (was && now) {
      const changed = fieldChanges(
        { ...was, label: was.label ?? '' },
        { ...now, label: now.label ?? '' },
        fields,
      );
      if (changed.length > 0) storeys.push({ storey: i + 1, kind: 'changed', fields: changed });
    } else {
      const present = (was ?? now) as unknown as Record<string, unknown>;
      storeys.push({
        storey: i + 1,
        kind: was ? 'removed' : 'added',
        fields: fields.map((field) => ({
          field,
          old: was ? (present[field] ?? null) : null,
          new: now ? (present[field] ?? null) : null,
        })),
      });
    }
  }

  const spectrum: FieldChange[] = [];
  const pa = a.spectrum.points;
  const pb = b.spectrum.points;
  if (pa.length !== pb.length) {
    spectrum.push({ field: 'points.length', old: pa.length, new: pb.length });
  }
  const differing: number[] = [];
  for (let i = 0; i < Math.max(pa.length, pb.length); i += 1) {
    if (!same(pa[i], pb[i])) differing.push(i);
  }
  for (const i of differing.slice(0, MAX_POINTS_LISTED)) {
    spectrum.push({ field: `points[${i + 1}]`, old: pa[i] ?? null, new: pb[i] ?? null });
  }
  if (differing.length > MAX_POINTS_LISTED) {
    spectrum.push({
      field: 'points (further)',
      old: null,
      new: `${differing.length - MAX_POINTS_LISTED} more points differ`,
    });
  }
  if ((a.spectrum.interpolation ?? 'linear') !== (b.spectrum.interpolation ?? 'linear')) {
    spectrum.push({
      field: 'interpolation',
      old: a.spectrum.interpolation ?? 'linear',
      new: b.spectrum.interpolation ?? 'linear',
    });
  }
  const sourceA = a.spectrum.source ?? { kind: 'user' };
  const sourceB = b.spectrum.source ?? { kind: 'user' };
  if (!same(sourceA, sourceB)) spectrum.push({ field: 'source', old: sourceA, new: sourceB });

  let basis: FieldChange[] = [];
  if (!before.basis || !after.basis) {
    if (before.basis !== after.basis) {
      basis = [{ field: 'basis', old: before.basis, new: after.basis }];
    }
  } else {
    const x = before.basis as unknown as Record<string, unknown>;
    const y = after.basis as unknown as Record<string, unknown>;
    const keys = [...new Set([...Object.keys(x), ...Object.keys(y)])];
    basis = fieldChanges(x, y, ['code', ...keys.filter((k) => k !== 'code')]);
  }

  const settings = fieldChanges(
    a as unknown as Record<string, unknown>,
    b as unknown as Record<string, unknown>,
    ['dampingRatio', 'modeCount', 'targetMassRatio'],
  );
  const history = historyFieldChanges(before.history, after.history);
  return {
    storeys,
    spectrum,
    basis,
    settings,
    history,
    unchanged:
      storeys.length + spectrum.length + basis.length + settings.length + history.length === 0,
  };
}

/**
 * The changes in a few words each, for the audit trail and the history: "storey 2 mass",
 * "storey 6 added", "spectrum points", "basis sds", "damping".
 */
export function changeNames(changes: Omit<CalculationChanges, 'since' | 'baseline'>): string[] {
  const names = changes.storeys.flatMap((s) =>
    s.kind === 'changed'
      ? s.fields.map((f) => `storey ${s.storey} ${f.field}`)
      : [`storey ${s.storey} ${s.kind}`],
  );
  if (changes.spectrum.some((f) => f.field.startsWith('points'))) names.push('spectrum points');
  for (const f of changes.spectrum) {
    if (!f.field.startsWith('points')) names.push(`spectrum ${f.field}`);
  }
  for (const f of changes.basis) names.push(f.field === 'basis' ? 'basis' : `basis ${f.field}`);
  for (const f of changes.settings) names.push(f.field === 'dampingRatio' ? 'damping' : f.field);
  for (const f of changes.history) names.push(f.field);
  return names;
}
