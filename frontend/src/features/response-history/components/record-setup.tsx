import UploadFileIcon from '@mui/icons-material/UploadFile';
import {
  Alert,
  Box,
  Button,
  MenuItem,
  Stack,
  TextField,
  ToggleButton,
  ToggleButtonGroup,
  Typography,
} from '@mui/material';
import {
  ACCELERATION_UNITS,
  decimated,
  defaultScalingRange,
  type AccelerationUnits,
  type RecordScaling,
  type StoredGroundMotionRecord,
} from '@tiermode/shared-types';
import { useState } from 'react';
import { FileDrop } from '@/components/feedback/file-drop';
import { errorMessages } from '@/lib/api-client';
import { formatNumber } from '@/lib/units';
import { useDemoRecord, useImportRecord } from '../api/response-history';
import { peakInG, recordInG, UNIT_NAMES } from '../model/history-model';
import { NumberField } from './free-vibration-panel';
import { TimeChart } from './time-chart';

/**
 * The ground-motion record: the built-in invented demo record or a file (one column at a stated
 * step, or time and acceleration), its units chosen by the engineer, drawn as given; then how it
 * is scaled. Nothing is saved until the tab's save.
 */
export function RecordSetup({
  record,
  scaling,
  fundamentalPeriod,
  onRecord,
  onScaling,
  readOnly,
}: {
  record: StoredGroundMotionRecord | null;
  scaling: RecordScaling;
  /** s; the default scaling range is 0.2 T1 to 2 T1. */
  fundamentalPeriod: number | null;
  onRecord: (record: StoredGroundMotionRecord) => void;
  onScaling: (scaling: RecordScaling) => void;
  readOnly: boolean;
}) {
  const [source, setSource] = useState<'demo' | 'upload'>(record?.origin ?? 'demo');
  const [units, setUnits] = useState<AccelerationUnits>('g');
  const [timeStep, setTimeStep] = useState<number | undefined>(undefined);
  const demo = useDemoRecord(!readOnly && source === 'demo');
  const upload = useImportRecord();
  const shownInG = record ? decimated(recordInG(record), record.timeStep, 2000) : null;

  return (
    <Stack spacing={2}>
      {!readOnly && (
        <>
          <ToggleButtonGroup
            exclusive
            size="small"
            value={source}
            onChange={(_, next: 'demo' | 'upload' | null) => next && setSource(next)}
            aria-label="Where the record comes from"
          >
            <ToggleButton value="demo">Invented demo record</ToggleButton>
            <ToggleButton value="upload">A record file</ToggleButton>
          </ToggleButtonGroup>
          {source === 'demo' && (
            <Stack spacing={1} sx={{ alignItems: 'flex-start' }}>
              <Typography variant="body2" color="text.secondary">
                {demo.data?.description ?? 'Loading the demo record…'}
              </Typography>
              <Button
                variant="outlined"
                disabled={!demo.data}
                onClick={() => demo.data && onRecord(demo.data.record)}
              >
                Use the demo record
              </Button>
            </Stack>
          )}
          {source === 'upload' && (
            <Stack spacing={1}>
              <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 2 }}>
                <TextField
                  select
                  label="Accelerations in"
                  value={units}
                  onChange={(e) => setUnits(e.target.value as AccelerationUnits)}
                  sx={{ minWidth: 180 }}
                >
                  {ACCELERATION_UNITS.map((u) => (
                    <MenuItem key={u} value={u}>
                      {UNIT_NAMES[u]}
                    </MenuItem>
                  ))}
                </TextField>
                <NumberField
                  label="Time step (s), for one column"
                  value={timeStep ?? Number.NaN}
                  onChange={setTimeStep}
                />
              </Stack>
              <FileDrop
                accept={{ 'text/csv': ['.csv'], 'text/plain': ['.txt', '.dat', '.acc'] }}
                inputLabel="Record file"
                kinds="CSV or plain text (.csv, .txt, .dat, .acc)"
                icon={<UploadFileIcon />}
                uploading={upload.isPending}
                progress={0}
                onFile={(file) =>
                  upload.mutate(
                    { file, units, timeStep },
                    { onSuccess: (read) => read.record && onRecord(read.record) },
                  )
                }
              >
                Drop a record file here, or choose one: one column of accelerations (give the time
                step), or two columns, time (s) and acceleration. A header row is skipped. The
                record is used as given: no baseline correction or filtering.
              </FileDrop>
              {upload.data?.record && (
                <Alert severity="success">
                  Read {upload.data.record.accelerations.length} values, time step{' '}
                  {upload.data.timeStepFrom}.
                </Alert>
              )}
              {upload.error && (
                <Alert severity="error" role="alert">
                  {errorMessages(upload.error).join(' ')}
                </Alert>
              )}
            </Stack>
          )}
        </>
      )}

      {record ? (
        <Stack spacing={1}>
          <Typography data-testid="record-summary">
            <strong>{record.name}</strong> · {record.accelerations.length} samples at{' '}
            {formatNumber(record.timeStep)} s (
            {formatNumber((record.accelerations.length - 1) * record.timeStep)} s) · peak{' '}
            {formatNumber(peakInG(record))} g as given ({UNIT_NAMES[record.units]} in the file)
          </Typography>
          {record.origin === 'demo' && (
            <Alert severity="warning">
              An invented, synthetic record for trying the product: not an earthquake, not a site,
              not for design.
            </Alert>
          )}
          {shownInG && (
            <TimeChart
              label="The record's ground acceleration as given, in g"
              yLabel="Ground acceleration (g)"
              height={180}
              series={[{ label: 'As given (unscaled)', ...shownInG }]}
            />
          )}
        </Stack>
      ) : (
        <Alert severity="info">
          {readOnly
            ? 'No record is kept with this calc.'
            : 'No record yet: use the demo record or read a file.'}
        </Alert>
      )}

      {(record || !readOnly) && (
        <Box>
          <Typography variant="h3" gutterBottom>
            Scaling
          </Typography>
          <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 2 }}>
            <TextField
              select
              label="Scale the record"
              value={scaling.method === 'factor' ? 'factor' : scaling.rule}
              disabled={readOnly}
              onChange={(e) => {
                const choice = e.target.value;
                const range =
                  scaling.method === 'spectrum'
                    ? scaling.periodRange
                    : defaultScalingRange(fundamentalPeriod ?? 1);
                onScaling(
                  choice === 'factor'
                    ? { method: 'factor', factor: 1 }
                    : {
                        method: 'spectrum',
                        rule: choice as 'mean' | 'not-below-90',
                        periodRange: [+range[0].toPrecision(3), +range[1].toPrecision(3)],
                      },
                );
              }}
              sx={{ minWidth: 300 }}
            >
              <MenuItem value="factor">By a factor I give</MenuItem>
              <MenuItem value="mean">To the design spectrum: its mean over a range</MenuItem>
              <MenuItem value="not-below-90">
                To the design spectrum: nowhere below 90 % over a range
              </MenuItem>
            </TextField>
            {scaling.method === 'factor' && (
              <NumberField
                label="Factor"
                value={scaling.factor}
                disabled={readOnly}
                onChange={(factor) => onScaling({ method: 'factor', factor })}
              />
            )}
            {scaling.method === 'spectrum' && (
              <>
                <NumberField
                  key={`from-${scaling.periodRange[0]}`}
                  label="From period (s)"
                  value={scaling.periodRange[0]}
                  disabled={readOnly}
                  onChange={(from) =>
                    onScaling({ ...scaling, periodRange: [from, scaling.periodRange[1]] })
                  }
                />
                <NumberField
                  key={`to-${scaling.periodRange[1]}`}
                  label="To period (s)"
                  value={scaling.periodRange[1]}
                  disabled={readOnly}
                  onChange={(to) =>
                    onScaling({ ...scaling, periodRange: [scaling.periodRange[0], to] })
                  }
                />
              </>
            )}
          </Stack>
          <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 1 }}>
            The usual range is 0.2 T1 to 2 T1 (EN 1998-1 3.2.3.1.2(4); ASCE 7-22 Chapter 16 sets its
            own bounds from the first-mode periods and the 90 % mass period, from memory): it starts
            there{fundamentalPeriod ? ` (T1 = ${formatNumber(fundamentalPeriod)} s)` : ''}. The rule
            of &quot;nowhere below 90 %&quot; is the one EN 1998-1 3.2.3.1.2(4)c sets for the mean
            of a set of records; the code&apos;s own rules on the number and choice of records
            govern.
          </Typography>
        </Box>
      )}
    </Stack>
  );
}
