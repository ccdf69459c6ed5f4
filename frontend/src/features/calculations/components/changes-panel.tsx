import { ScrollFrame } from '@/components/data-display/scroll-frame';
import {
  alpha,
  Alert,
  Box,
  LinearProgress,
  MenuItem,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import {
  formatDateTime,
  type CalculationChanges,
  type CalculationDto,
  type FieldChange,
  type StoreyInput,
} from '@tiermode/shared-types';
import { useState } from 'react';
import { errorMessages } from '@/lib/api-client';
import { formatNumber, massHeader, toDisplay, unitLabel, type UnitSystem } from '@/lib/units';
import { useChanges } from '../api/calculations';

type Since = 'submission' | 'revision';
type Field = 'label' | 'height' | 'mass' | 'stiffness';
const QUANTITY = { height: 'length', mass: 'mass', stiffness: 'stiffness' } as const;

/** A value as the storey table shows it, in the chosen units. */
function shown(field: Field, value: unknown, units: UnitSystem): string {
  if (value === null || value === undefined) return '—';
  if (field === 'label') return typeof value === 'string' && value ? value : '(none)';
  return formatNumber(toDisplay(units, QUANTITY[field], Number(value)), 6);
}

/**
 * "old → new" in the chosen units; where six significant figures would show the same number on
 * both sides, every digit, so a change is never shown as "280 → 280".
 */
function changedPair(field: Field, old: unknown, now: unknown, units: UnitSystem): string {
  const [a, b] = [shown(field, old, units), shown(field, now, units)];
  if (a !== b || field === 'label') return `${a} → ${b}`;
  const full = (v: unknown) =>
    String(Number(toDisplay(units, QUANTITY[field], Number(v)).toPrecision(15)));
  return `${full(old)} → ${full(now)}`;
}

/** Any other changed value, in words: numbers plainly, objects as JSON. */
const plain = (value: unknown): string =>
  value === null || value === undefined
    ? '—'
    : typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean'
      ? String(value)
      : JSON.stringify(value);

function FieldList({ title, changes }: { title: string; changes: FieldChange[] }) {
  if (changes.length === 0) return null;
  return (
    <Box>
      <Typography variant="subtitle2">{title}</Typography>
      <Box component="ul" sx={{ m: 0, pl: 3 }} aria-label={title}>
        {changes.map((c) => (
          <li key={c.field}>
            <Typography variant="body2" sx={{ overflowWrap: 'anywhere' }}>
              {c.field}: {plain(c.old)} → {plain(c.new)}
            </Typography>
          </li>
        ))}
      </Box>
    </Box>
  );
}

/**
 * What changed since the submission the reviewer returned, or since the revision it came from: the
 * storey table with each changed cell marked (old → new), added and removed storeys, and the
 * spectrum, basis, settings and response history that changed.
 */
export function ChangesPanel({ calc, units }: { calc: CalculationDto; units: UnitSystem }) {
  const options: { value: Since; label: string }[] = [
    ...(calc.returnedAt
      ? [
          {
            value: 'submission' as const,
            label: `The submission returned ${formatDateTime(calc.returnedAt)}`,
          },
        ]
      : []),
    ...(calc.previousRevisionId
      ? [{ value: 'revision' as const, label: `Revision ${calc.revision - 1}` }]
      : []),
  ];
  const [since, setSince] = useState<Since | null>(options[0]?.value ?? null);
  const changes = useChanges(calc.id, since);
  if (options.length === 0) {
    return (
      <Typography color="text.secondary">
        Nothing to compare with yet: no submission of this calc has been returned, and it is
        revision 1.
      </Typography>
    );
  }
  return (
    <Box sx={{ display: 'grid', gap: 1.5, gridTemplateColumns: 'minmax(0, 1fr)' }}>
      <TextField
        select
        size="small"
        label="Compare with"
        value={since ?? ''}
        onChange={(e) => setSince(e.target.value as Since)}
        sx={{ maxWidth: 360 }}
      >
        {options.map((o) => (
          <MenuItem key={o.value} value={o.value}>
            {o.label}
          </MenuItem>
        ))}
      </TextField>
      {changes.isPending && <LinearProgress aria-label="Comparing" />}
      {changes.isError && <Alert severity="info">{errorMessages(changes.error).join(' ')}</Alert>}
      {changes.data && (
        <ChangesView changes={changes.data} storeys={calc.inputs.storeys} units={units} />
      )}
    </Box>
  );
}

function ChangesView({
  changes,
  storeys,
  units,
}: {
  changes: CalculationChanges;
  storeys: StoreyInput[];
  units: UnitSystem;
}) {
  if (changes.unchanged) {
    return (
      <Alert severity="success" aria-label="Changes">
        Nothing changed: the inputs and the basis are as they were.
      </Alert>
    );
  }
  const byStorey = new Map(changes.storeys.map((s) => [s.storey, s]));
  const count = Math.max(storeys.length, ...changes.storeys.map((s) => s.storey));
  const fields: { field: Field; header: string }[] = [
    { field: 'label', header: 'Label' },
    { field: 'height', header: `Height (${unitLabel(units, 'length')})` },
    { field: 'mass', header: massHeader(units) },
    { field: 'stiffness', header: `Stiffness (${unitLabel(units, 'stiffness')})` },
  ];
  return (
    <>
      <Typography variant="body2">
        {changes.storeys.length} storey(s) changed; marked cells read old → new.
      </Typography>
      <ScrollFrame label="Changes by storey, scrolling" maxHeight={420}>
        <Table size="small" stickyHeader aria-label="Changes by storey">
          <TableHead>
            <TableRow>
              <TableCell>Storey</TableCell>
              {fields.map((f) => (
                <TableCell key={f.field} align={f.field === 'label' ? 'left' : 'right'}>
                  {f.header}
                </TableCell>
              ))}
            </TableRow>
          </TableHead>
          <TableBody>
            {Array.from({ length: count }, (_, i) => i + 1).map((number) => {
              const change = byStorey.get(number);
              const now = storeys[number - 1] as unknown as Record<string, unknown> | undefined;
              return (
                <TableRow
                  key={number}
                  data-change={change?.kind ?? 'same'}
                  sx={{
                    ...(change?.kind === 'added'
                      ? { bgcolor: (t) => alpha(t.palette.success.main, 0.12) }
                      : {}),
                    ...(change?.kind === 'removed' ? { textDecoration: 'line-through' } : {}),
                  }}
                >
                  <TableCell>
                    {number}
                    {change && change.kind !== 'changed' ? ` (${change.kind})` : ''}
                  </TableCell>
                  {fields.map((f) => {
                    const moved = change?.fields.find((c) => c.field === f.field);
                    const align = f.field === 'label' ? 'left' : 'right';
                    if (moved && change?.kind === 'changed') {
                      return (
                        <TableCell
                          key={f.field}
                          align={align}
                          data-changed="true"
                          sx={{
                            bgcolor: (t) => alpha(t.palette.warning.main, 0.18),
                            fontWeight: 500,
                          }}
                        >
                          {changedPair(f.field, moved.old, moved.new, units)}
                        </TableCell>
                      );
                    }
                    const value = moved ? (moved.new ?? moved.old) : now?.[f.field];
                    return (
                      <TableCell key={f.field} align={align}>
                        {shown(f.field, f.field === 'label' ? (value ?? '') : value, units)}
                      </TableCell>
                    );
                  })}
                </TableRow>
              );
            })}
          </TableBody>
        </Table>
      </ScrollFrame>
      <FieldList title="Design spectrum" changes={changes.spectrum} />
      <FieldList title="Code basis" changes={changes.basis} />
      <FieldList title="Damping and modes" changes={changes.settings} />
      <FieldList title="Response history" changes={changes.history} />
    </>
  );
}
