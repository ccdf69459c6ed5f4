import {
  Alert,
  Box,
  Card,
  CardContent,
  LinearProgress,
  MenuItem,
  Stack,
  TextField,
  ToggleButton,
  ToggleButtonGroup,
  Typography,
} from '@mui/material';
import type { AnalysisRequest, SpectrumInput } from '@tiermode/shared-types';
import { useMemo, useState, type ReactNode } from 'react';
import { CautionBanner } from '@/components/feedback/caution-banner';
import { errorMessages } from '@/lib/api-client';
import '@/lib/charts';
import type { UnitSystem } from '@/lib/units';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { useAnalysis } from '../api/run-analysis';
import {
  elevations,
  startingBuilding,
  storeyProblems,
  toStoreyInputs,
  type StoreyRow,
} from '../model/storey-rows';
import { CorrelationTable } from './results/correlation-table';
import { MassChart } from './results/mass-chart';
import { MethodView } from './results/method-view';
import { ModeShapeChart } from './results/mode-shape-chart';
import { ModesTable } from './results/modes-table';
import { ResponseProfiles } from './results/response-profiles';
import { SpectrumEditor } from './spectrum-editor';
import { StoreyTable } from './storey-table';

const STARTING_SPECTRUM: SpectrumInput = {
  points: [
    { period: 0, sa: 0.4 },
    { period: 0.12, sa: 1.0 },
    { period: 0.6, sa: 1.0 },
    { period: 1.2, sa: 0.5 },
    { period: 2.4, sa: 0.25 },
    { period: 4, sa: 0.15 },
  ],
  interpolation: 'linear',
};

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Card variant="outlined" component="section" aria-label={title}>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          {title}
        </Typography>
        {children}
      </CardContent>
    </Card>
  );
}

/** The stateless analysis: storey table and spectrum in, modes and responses out as you type. */
export function AnalysisPage() {
  const [rows, setRows] = useState<StoreyRow[]>(startingBuilding);
  const [spectrum, setSpectrum] = useState<SpectrumInput>(STARTING_SPECTRUM);
  const [damping, setDamping] = useState('5');
  const [modeCount, setModeCount] = useState<'all' | number>('all');
  const [units, setUnits] = useState<UnitSystem>('SI');

  const dampingRatio = Number(damping) / 100;
  const dampingProblem = !(dampingRatio > 0 && dampingRatio < 1)
    ? 'Damping must be more than 0% and less than 100%'
    : null;
  const request = useMemo<AnalysisRequest | null>(() => {
    if (storeyProblems(rows).length > 0 || dampingProblem) return null;
    return {
      storeys: toStoreyInputs(rows),
      spectrum,
      dampingRatio,
      ...(modeCount !== 'all' && modeCount <= rows.length ? { modeCount } : {}),
    };
  }, [rows, spectrum, dampingRatio, dampingProblem, modeCount]);
  const settled = useDebouncedValue(request, 350);
  const analysis = useAnalysis(settled);
  const result = analysis.data?.result;
  const analysedStoreys = analysis.data?.inputs.storeys ?? [];
  const levels = elevations(analysedStoreys);
  const stale = analysis.isFetching || settled !== request;

  return (
    <Stack spacing={2}>
      <Stack
        direction="row"
        sx={{ alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: 1 }}
      >
        <Typography variant="h1">Analysis</Typography>
        <ToggleButtonGroup
          exclusive
          size="small"
          value={units}
          onChange={(_, value: UnitSystem | null) => value && setUnits(value)}
          aria-label="Units"
        >
          <ToggleButton value="SI">SI (t, kN, m)</ToggleButton>
          <ToggleButton value="US">US (kip, ft, in)</ToggleButton>
        </ToggleButtonGroup>
      </Stack>
      <Typography color="text.secondary">
        A planar shear building: floors rigid, one horizontal direction, linear elastic, fixed base,
        one damping ratio for every mode. Nothing here is saved; the results follow the inputs as
        you type.
      </Typography>
      <CautionBanner />

      <Section title="Storey table">
        <StoreyTable rows={rows} units={units} onChange={setRows} />
        <Stack direction="row" spacing={2} sx={{ mt: 2 }}>
          <TextField
            label="Damping (% of critical)"
            size="small"
            value={damping}
            onChange={(e) => setDamping(e.target.value)}
            error={Boolean(dampingProblem)}
            helperText={dampingProblem ?? 'The same for every mode'}
            slotProps={{ htmlInput: { inputMode: 'decimal' } }}
          />
          <TextField
            select
            label="Modes combined"
            size="small"
            sx={{ minWidth: 180 }}
            value={String(modeCount)}
            onChange={(e) =>
              setModeCount(e.target.value === 'all' ? 'all' : Number(e.target.value))
            }
          >
            <MenuItem value="all">All {rows.length}</MenuItem>
            {Array.from({ length: Math.min(rows.length - 1, 30) }, (_, i) => (
              <MenuItem key={i + 1} value={String(i + 1)}>
                First {i + 1}
              </MenuItem>
            ))}
          </TextField>
        </Stack>
      </Section>

      <Section title="Design spectrum">
        <SpectrumEditor spectrum={spectrum} modes={result?.modes ?? []} onChange={setSpectrum} />
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

      {result && (
        <>
          {result.warnings.length > 0 && (
            <Alert severity="warning" aria-label="Warnings">
              {result.warnings.map((w) => (
                <div key={w}>{w}</div>
              ))}
            </Alert>
          )}
          <Section title="Modes">
            <ModesTable modes={result.modes} />
            <Box sx={{ display: 'grid', gridTemplateColumns: { md: '1fr 1fr' }, gap: 2, mt: 2 }}>
              <ModeShapeChart
                modes={result.modes}
                elevations={levels.slice(0, result.modes[0]?.shape.length)}
                units={units}
              />
              <MassChart modes={result.modes} />
            </Box>
          </Section>
          <Section title="Responses">
            <ResponseProfiles
              result={result}
              elevations={levels.slice(0, result.combined.cqc.storeyShear.length)}
              units={units}
            />
            <Typography variant="h3" sx={{ mt: 2 }} gutterBottom>
              Correlation coefficients (CQC)
            </Typography>
            <CorrelationTable correlation={result.correlation} />
          </Section>
          <Section title="Method, step by step">
            <MethodView storeys={analysedStoreys} result={result} units={units} />
          </Section>
        </>
      )}
    </Stack>
  );
}
