import {
  Alert,
  LinearProgress,
  MenuItem,
  Stack,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  TextField,
  Typography,
} from '@mui/material';
import type {
  FreeVibrationRequest,
  FreeVibrationSetup,
  ModeSummary,
  StoreyInput,
} from '@tiermode/shared-types';
import { ScrollFrame } from '@/components/data-display/scroll-frame';
import { errorMessages } from '@/lib/api-client';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { formatNumber, fromDisplay, toDisplay, unitLabel, type UnitSystem } from '@/lib/units';
import { useFreeVibration } from '../api/response-history';
import { startDisplacements, bareStoreys, elevationsOf } from '../model/history-model';
import { BuildingMotion } from './building-motion';
import { useTimeline } from '../model/use-timeline';
import { TimeChart } from './time-chart';

/**
 * Free vibration: the building let go from a mode's shape (which then vibrates alone) or from
 * any deflected shape, each level moving as the sum of its modes' damped cosines. The engineer
 * chooses the start; the server answers the exact sum (POST /api/free-vibration), drawn moving
 * with each mode's part of the roof displacement plotted beneath.
 */
export function FreeVibrationPanel({
  storeys,
  dampingRatio,
  modes,
  units,
  setup,
  onChange,
}: {
  storeys: StoreyInput[];
  dampingRatio: number;
  /** The analysis's modes (their shapes are the mode starts). */
  modes: ModeSummary[];
  units: UnitSystem;
  setup: FreeVibrationSetup;
  onChange: (setup: FreeVibrationSetup) => void;
}) {
  const length = unitLabel(units, 'displacement');
  const initial = startDisplacements(
    setup.start,
    modes.map((m) => m.shape),
  );
  const request: FreeVibrationRequest | null =
    initial && initial.length === storeys.length
      ? {
          storeys: bareStoreys(storeys),
          dampingRatio,
          initialDisplacements: initial,
          duration: setup.duration,
          timeStep: setup.timeStep,
        }
      : null;
  const settled = useDebouncedValue(request, 300);
  const run = useFreeVibration(settled);
  const answer = run.data;
  const timeline = useTimeline(answer?.times ?? []);
  const elevations = elevationsOf(storeys);
  const change = (next: Partial<FreeVibrationSetup>) => onChange({ ...setup, ...next });
  const start = setup.start;
  const largest = Math.max(...(answer?.modes.map((m) => Math.abs(m.initialCoordinate)) ?? [0]));
  const moving = answer?.modes.filter((m) => Math.abs(m.initialCoordinate) > 1e-9 * largest) ?? [];
  const roof = storeys.length - 1;

  return (
    <Stack spacing={2}>
      <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 2 }}>
        <TextField
          select
          label="Start from"
          value={start.kind}
          onChange={(e) =>
            change({
              start:
                e.target.value === 'mode'
                  ? { kind: 'mode', mode: 1, amplitude: 0.05 }
                  : { kind: 'shape', displacements: initial ?? storeys.map(() => 0) },
            })
          }
          sx={{ minWidth: 220 }}
        >
          <MenuItem value="mode">The shape of one mode</MenuItem>
          <MenuItem value="shape">A deflected shape I give</MenuItem>
        </TextField>
        {start.kind === 'mode' && (
          <>
            <TextField
              select
              label="Mode"
              value={start.mode}
              onChange={(e) => change({ start: { ...start, mode: Number(e.target.value) } })}
              sx={{ minWidth: 180 }}
            >
              {modes.map((m) => (
                <MenuItem key={m.number} value={m.number}>
                  Mode {m.number} (T = {formatNumber(m.period)} s)
                </MenuItem>
              ))}
            </TextField>
            <NumberField
              key={`amplitude-${units}`}
              label={`Roof displacement at the start (${length})`}
              value={toDisplay(units, 'displacement', start.amplitude)}
              onChange={(shown) =>
                change({
                  start: { ...start, amplitude: fromDisplay(units, 'displacement', shown) },
                })
              }
            />
          </>
        )}
        {start.kind === 'shape' && (
          <TextField
            key={`shape-${units}`}
            label={`Displacement of each level, level 1 first (${length})`}
            helperText="Numbers separated by spaces or new lines, one per level"
            multiline
            minRows={2}
            defaultValue={start.displacements
              .map((u) => formatNumber(toDisplay(units, 'displacement', u), 6).replaceAll(',', ''))
              .join(' ')}
            onChange={(e) => {
              const values = e.target.value
                .trim()
                .split(/[\s;]+/)
                .map(Number);
              if (values.length === storeys.length && values.every(Number.isFinite)) {
                change({
                  start: {
                    kind: 'shape',
                    displacements: values.map((v) => fromDisplay(units, 'displacement', v)),
                  },
                });
              }
            }}
            sx={{ minWidth: 320 }}
          />
        )}
        <NumberField
          label="Duration (s)"
          value={setup.duration}
          onChange={(duration) => change({ duration })}
        />
        <NumberField
          label="Time step (s)"
          value={setup.timeStep}
          onChange={(timeStep) => change({ timeStep })}
        />
      </Stack>
      {start.kind === 'shape' && initial?.length !== storeys.length && (
        <Alert severity="warning">
          Give one displacement per level ({storeys.length}); the drawing waits for them.
        </Alert>
      )}
      {run.isFetching && <LinearProgress aria-label="Finding the free vibration" />}
      {run.error && (
        <Alert severity="error" role="alert">
          {errorMessages(run.error).join(' ')}
        </Alert>
      )}
      {answer && answer.displacements.length === storeys.length && (
        <Stack
          direction={{ xs: 'column', md: 'row' }}
          spacing={2}
          sx={{ alignItems: 'flex-start' }}
        >
          <BuildingMotion
            elevations={elevations}
            times={answer.times}
            displacements={answer.displacements}
            timeline={timeline}
            units={units}
            label={
              start.kind === 'mode'
                ? `Free vibration from the shape of mode ${start.mode}`
                : 'Free vibration from the shape given'
            }
          />
          <Stack spacing={1} sx={{ flex: 1, minWidth: 0, width: '100%' }}>
            <TimeChart
              label="Roof displacement in time, and each mode's part of it"
              yLabel={`Roof displacement (${length})`}
              cursor={timeline.time}
              series={[
                {
                  label: 'Roof (sum of the modes)',
                  times: answer.times,
                  values: answer.displacements[roof].map((u) =>
                    toDisplay(units, 'displacement', u),
                  ),
                },
                ...moving.slice(0, 5).map((m) => ({
                  label: `Mode ${m.number}`,
                  times: answer.times,
                  values: m.coordinate.map((q) =>
                    toDisplay(units, 'displacement', m.shape[roof] * q),
                  ),
                  dashed: true,
                })),
              ]}
            />
            <Typography variant="caption" color="text.secondary">
              u(t) = Σ φₙ qₙ(t), qₙ(t) = e^(−ζωₙt)[qₙ(0) cos ω_D t + ζωₙqₙ(0)/ω_D sin ω_D t], ζ ={' '}
              {formatNumber(dampingRatio)} in every mode. {moving.length} of {answer.modes.length}{' '}
              modes take part
              {moving.length > 5 ? ' (the first five are drawn)' : ''}
              {start.kind === 'mode'
                ? `: mode ${start.mode} alone, as a mode's shape starts only that mode.`
                : '.'}
            </Typography>
            <ScrollFrame label="Free vibration: each mode's start" maxHeight={240}>
              <Table size="small" stickyHeader>
                <TableHead>
                  <TableRow>
                    <TableCell>Mode</TableCell>
                    <TableCell align="right">T (s)</TableCell>
                    <TableCell align="right">qₙ(0) ({length})</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {moving.map((m) => (
                    <TableRow key={m.number}>
                      <TableCell>{m.number}</TableCell>
                      <TableCell align="right">{formatNumber(m.period)}</TableCell>
                      <TableCell align="right">
                        {formatNumber(toDisplay(units, 'displacement', m.initialCoordinate))}
                      </TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            </ScrollFrame>
          </Stack>
        </Stack>
      )}
      {answer?.warnings.map((w) => (
        <Alert key={w} severity="info">
          {w}
        </Alert>
      ))}
    </Stack>
  );
}

/** A number typed in a text field: reported only once it reads as a finite number. */
export function NumberField({
  label,
  value,
  onChange,
  disabled,
}: {
  label: string;
  value: number;
  onChange: (value: number) => void;
  disabled?: boolean;
}) {
  return (
    <TextField
      label={label}
      defaultValue={Number.isFinite(value) ? formatNumber(value, 6).replaceAll(',', '') : ''}
      disabled={disabled}
      slotProps={{ htmlInput: { inputMode: 'decimal' } }}
      onChange={(e) => {
        const n = Number(e.target.value.trim());
        if (e.target.value.trim() !== '' && Number.isFinite(n)) onChange(n);
      }}
      sx={{ width: 200 }}
    />
  );
}
