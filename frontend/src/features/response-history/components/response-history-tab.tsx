import {
  Alert,
  Button,
  FormControlLabel,
  LinearProgress,
  Stack,
  Switch,
  Typography,
} from '@mui/material';
import {
  defaultScalingRange,
  formatDateTime,
  type CalculationDto,
  type FreeVibrationSetup,
  type RecordScaling,
  type ResponseHistorySetup,
  type StoredGroundMotionRecord,
} from '@tiermode/shared-types';
import { useEffect, useState } from 'react';
import { Section } from '@/components/layouts/section';
import { sameJson } from '@/lib/same-json';
import type { UnitSystem } from '@/lib/units';
import { errorMessages } from '@/lib/api-client';
import { useStoredHistoryResults } from '../api/response-history';
import { DEFAULT_FREE_VIBRATION } from '../model/history-model';
import { FreeVibrationPanel } from './free-vibration-panel';
import { HistoryResults } from './history-results';
import { RecordSetup } from './record-setup';
import { RecordSpectrumPanel } from './record-spectrum-panel';

/**
 * A calc's response history: the record and its scaling, and the free vibration's start, kept
 * with the calc (PATCH history) and sealed with it; the results the analysis made from them; and
 * the free vibration drawn live. Anyone who can read the calc sees it; its designers edit it.
 */
export function ResponseHistoryTab({
  calc,
  units,
  editable,
  saving,
  onSave,
  onDirtyChange,
}: {
  calc: CalculationDto;
  units: UnitSystem;
  editable: boolean;
  saving: boolean;
  onSave: (history: ResponseHistorySetup | null) => void;
  /** Told whether the tab holds changes not kept yet (the page asks before they are lost). */
  onDirtyChange: (dirty: boolean) => void;
}) {
  const analysis = calc.analysis;
  const firstPeriod = analysis?.modes[0]?.period ?? null;
  const saved = calc.history;
  const [record, setRecord] = useState<StoredGroundMotionRecord | null>(saved?.record ?? null);
  const [scaling, setScaling] = useState<RecordScaling>(
    saved?.scaling ?? {
      method: 'spectrum',
      rule: 'mean',
      periodRange: defaultScalingRange(firstPeriod ?? 1).map((t) => +t.toPrecision(3)) as [
        number,
        number,
      ],
    },
  );
  const [free, setFree] = useState<FreeVibrationSetup>(
    saved?.freeVibration ?? DEFAULT_FREE_VIBRATION,
  );
  const [keepFree, setKeepFree] = useState(saved ? saved.freeVibration !== undefined : true);
  // When the kept setup changes (saved here, or by someone else), the form starts again from it;
  // a refetch of the same setup leaves the form as it is.
  const [shown, setShown] = useState(saved);
  if (saved !== shown) {
    setShown(saved);
    if (!sameJson(saved, shown)) {
      setRecord(saved?.record ?? null);
      if (saved) setScaling(saved.scaling);
      setFree(saved?.freeVibration ?? DEFAULT_FREE_VIBRATION);
      setKeepFree(saved ? saved.freeVibration !== undefined : true);
    }
  }
  const draft: ResponseHistorySetup | null = record
    ? { record, scaling, ...(keepFree ? { freeVibration: free } : {}) }
    : null;
  const dirty = editable && draft !== null && !sameJson(draft, saved);
  useEffect(() => onDirtyChange(dirty), [dirty, onDirtyChange]);
  const stored = useStoredHistoryResults(calc.id, calc.hasHistoryResults, calc.analysedAt);
  const results = calc.hasHistoryResults ? (stored.data ?? null) : null;
  const fresh = calc.hasHistoryResults && !calc.analysisStale && analysis !== null;

  return (
    <Stack spacing={2}>
      <Alert severity="info" role="note">
        Linear response history by modal superposition: every mode, classical damping (
        {(calc.inputs.dampingRatio * 100).toPrecision(3)} % in each), the ground rigid (no
        soil-structure interaction), the record used as given (its processing is yours). It shows
        how this building answers one record; the local code and the engineer of record govern how
        records are chosen, how many, and what is designed from them.
      </Alert>
      <Section title="Ground-motion record">
        <Stack spacing={2}>
          <RecordSetup
            record={record}
            scaling={scaling}
            fundamentalPeriod={firstPeriod}
            onRecord={setRecord}
            onScaling={setScaling}
            readOnly={!editable}
          />
          {record && analysis && (
            <RecordSpectrumPanel
              record={record}
              scaling={scaling}
              dampingRatio={calc.inputs.dampingRatio}
              design={calc.inputs.spectrum}
              modalPeriods={analysis.modes.map((m) => m.period)}
            />
          )}
          {!analysis && (
            <Alert severity="info">Analyse the calc to see the record beside its modes.</Alert>
          )}
        </Stack>
      </Section>

      <Section title="Free vibration">
        {analysis ? (
          <Stack spacing={1}>
            {editable && (
              <FormControlLabel
                control={<Switch checked={keepFree} onChange={(_, on) => setKeepFree(on)} />}
                label="Keep this free vibration with the calc (its peaks go into the calc package)"
              />
            )}
            {!editable && (
              <Typography variant="body2" color="text.secondary">
                {results?.freeVibration
                  ? `The calc keeps the free vibration from ${results.freeVibration.startedFrom}; choose any other start to see it move (nothing is saved).`
                  : 'Choose a start to see the building move (nothing is saved).'}
              </Typography>
            )}
            <FreeVibrationPanel
              storeys={calc.inputs.storeys}
              dampingRatio={calc.inputs.dampingRatio}
              modes={analysis.modes}
              units={units}
              setup={free}
              onChange={setFree}
            />
          </Stack>
        ) : (
          <Alert severity="info">
            Analyse the calc first: the free vibration starts from its modes.
          </Alert>
        )}
      </Section>

      {editable && (
        <Stack
          direction="row"
          spacing={1}
          sx={{ alignItems: 'center', flexWrap: 'wrap' }}
          aria-label="Saving the response history"
        >
          <Button
            variant="contained"
            disabled={!dirty || saving}
            onClick={() => draft && onSave(draft)}
          >
            Keep with the calc
          </Button>
          {saved && (
            <Button color="error" disabled={saving} onClick={() => onSave(null)}>
              Remove the response history
            </Button>
          )}
          <Typography role="status" color={dirty ? 'warning.main' : 'text.secondary'}>
            {saving
              ? 'Saving…'
              : dirty
                ? 'Not kept yet'
                : saved
                  ? 'Kept with the calc; Analyse makes its response history'
                  : 'Choose a record to begin'}
          </Typography>
        </Stack>
      )}

      <Section title="Response to the record">
        {!saved && <Alert severity="info">No record is kept with this calc.</Alert>}
        {saved && !fresh && (
          <Alert severity="warning" role="alert">
            {calc.hasHistoryResults
              ? `This response history is older than the inputs or the record (analysed ${formatDateTime(calc.analysedAt, '')}): analyse again before relying on it.`
              : 'Not made yet: analyse the calc to make the response history.'}
          </Alert>
        )}
        {saved && fresh && stored.isPending && (
          <LinearProgress aria-label="Fetching the response history" />
        )}
        {saved && fresh && stored.isError && (
          <Alert severity="error" role="alert">
            {errorMessages(stored.error).map((m) => (
              <div key={m}>{m}</div>
            ))}
          </Alert>
        )}
        {saved && results && analysis && fresh && (
          <HistoryResults
            results={results}
            setup={saved}
            analysis={analysis}
            storeys={calc.inputs.storeys}
            dampingRatio={calc.inputs.dampingRatio}
            units={units}
          />
        )}
      </Section>
    </Stack>
  );
}
