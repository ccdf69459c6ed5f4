import SaveIcon from '@mui/icons-material/Save';
import { Alert, Box, Button, LinearProgress, Stack, Typography } from '@mui/material';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { CautionBanner } from '@/components/feedback/caution-banner';
import { NewCalculationDialog } from '@/features/calculations/components/new-calculation-dialog';
import { useAppAbility } from '@/lib/ability';
import { errorMessages } from '@/lib/api-client';
import '@/lib/charts';
import type { UnitSystem } from '@/lib/units';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { useAnalysis } from '../api/run-analysis';
import { STARTING_INPUTS } from '../model/starting-inputs';
import { useAnalysisInputs } from '../model/use-analysis-inputs';
import { AnalysisSettings } from './analysis-settings';
import { AnalysisResults, Section } from './results/analysis-results';
import { SpectrumEditor } from './spectrum-editor';
import { StoreyTable } from './storey-table';
import { UnitsToggle } from './units-toggle';

/** The stateless analysis: storey table and spectrum in, modes and responses out as you type. */
export function AnalysisPage() {
  const inputs = useAnalysisInputs(STARTING_INPUTS);
  const [units, setUnits] = useState<UnitSystem>('SI');
  const { request } = inputs;
  const settled = useDebouncedValue(request, 350);
  const analysis = useAnalysis(settled);
  const result = analysis.data?.result;
  const stale = analysis.isFetching || settled !== request;
  const ability = useAppAbility();
  const navigate = useNavigate();
  const [saving, setSaving] = useState(false);

  return (
    <Stack spacing={2}>
      <Stack
        direction="row"
        sx={{ alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: 1 }}
      >
        <Typography variant="h1">Analysis</Typography>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          {ability.can('create', 'Calculation') && (
            <Button
              variant="outlined"
              startIcon={<SaveIcon />}
              disabled={request === null}
              onClick={() => setSaving(true)}
            >
              Save as a calc
            </Button>
          )}
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
        <AnalysisResults result={result} storeys={analysis.data.inputs.storeys} units={units} />
      )}
      {saving && request && (
        <NewCalculationDialog
          inputs={request}
          displayUnits={units}
          intro="The calc starts as a draft with the storeys, spectrum and settings on this page, in the project you choose."
          onClose={() => setSaving(false)}
          onCreated={(calc) => void navigate(`/calculations/${calc.id}`)}
        />
      )}
    </Stack>
  );
}
