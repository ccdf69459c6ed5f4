import { Alert, Box, LinearProgress, Stack, Typography } from '@mui/material';
import type { AnalysisRequest } from '@tiermode/shared-types';
import { useState, type ReactNode } from 'react';
import { CautionBanner } from '@/components/feedback/caution-banner';
import { errorMessages } from '@/lib/api-client';
import '@/lib/charts';
import type { UnitSystem } from '@/lib/units';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { statelessModalDetail } from '../api/modal-detail';
import { useAnalysis } from '../api/run-analysis';
import { STARTING_INPUTS } from '../model/starting-inputs';
import { useAnalysisInputs } from '../model/use-analysis-inputs';
import { AnalysisSettings } from './analysis-settings';
import { Section } from '@/components/layouts/section';
import { AnalysisResults } from './results/analysis-results';
import { SpectrumEditor } from './spectrum-editor';
import { StoreyTable } from './storey-table';
import { UnitsToggle } from './units-toggle';

/**
 * The stateless analysis: storey table and spectrum in, modes and responses out as you type.
 * `saveAction` draws what saves the inputs on screen elsewhere (the route composes it: a new calc
 * in a project), given the valid inputs or null and the units shown.
 */
export function AnalysisPage({
  saveAction,
}: {
  saveAction?: (request: AnalysisRequest | null, units: UnitSystem) => ReactNode;
}) {
  const inputs = useAnalysisInputs(STARTING_INPUTS);
  const [units, setUnits] = useState<UnitSystem>('SI');
  const { request } = inputs;
  const settled = useDebouncedValue(request, 350);
  const analysis = useAnalysis(settled);
  const result = analysis.data?.result;
  const stale = analysis.isFetching || settled !== request;

  return (
    <Stack spacing={2}>
      <Stack
        direction="row"
        sx={{ alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: 1 }}
      >
        <Typography variant="h1">Analysis</Typography>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          {saveAction?.(request, units)}
          <UnitsToggle units={units} onChange={setUnits} />
        </Stack>
      </Stack>
      <Typography color="text.secondary">
        A planar shear building: floors rigid, one horizontal direction, linear elastic, fixed base,
        one damping ratio for every mode. Nothing here is saved until you save it as a calc in a
        project; the results follow the inputs as you type.
      </Typography>
      <CautionBanner />

      <Section title="Storey table">
        <StoreyTable
          rows={inputs.rows}
          units={units}
          onChange={inputs.setRows}
          flags={
            result?.modes[0]?.shape.length === inputs.rows.length ? result.plausibility : undefined
          }
        />
        <AnalysisSettings inputs={inputs} />
      </Section>

      <Section title="Design spectrum">
        <SpectrumEditor
          spectrum={inputs.spectrum}
          modes={result?.modes ?? []}
          onChange={inputs.setSpectrum}
        />
      </Section>

      <Box aria-live="polite">
        {stale && <LinearProgress aria-label="Updating the results" />}
        {analysis.isError && (
          <Alert severity="error" role="alert">
            {errorMessages(analysis.error).map((m) => (
              <div key={m}>{m}</div>
            ))}
          </Alert>
        )}
        {request === null && (
          <Alert severity="info">The results will update once every input above is valid.</Alert>
        )}
      </Box>

      {result && analysis.data && (
        <AnalysisResults
          result={result}
          detail={statelessModalDetail(analysis.data.inputs)}
          storeys={analysis.data.inputs.storeys}
          units={units}
        />
      )}
    </Stack>
  );
}
