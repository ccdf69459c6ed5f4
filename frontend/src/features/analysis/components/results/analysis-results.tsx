import { Alert, Box, Typography } from '@mui/material';
import type { AnalysisSummary, StoreyInput } from '@tiermode/shared-types';
import type { ModalDetailSource } from '../../api/modal-detail';
import { Section } from '@/components/layouts/section';
import type { UnitSystem } from '@/lib/units';
import { elevations } from '../../model/storey-rows';
import { FetchedCorrelationTable } from './correlation-table';
import { MassChart } from './mass-chart';
import { MethodView } from './method-view';
import { ModeShapesPanel } from './mode-shapes-panel';
import { ImplausibleResultsAlert } from './implausible-results-alert';
import { ModesTable } from './modes-table';
import { ResponseProfiles } from './response-profiles';
import { StoreyResponsesTable } from './storey-responses-table';

/**
 * Everything an analysis returns, for the storeys it was computed from: warnings, modes and
 * participation, responses and their combinations, and the method step by step.
 */
export function AnalysisResults({
  result,
  detail,
  storeys,
  units,
}: {
  result: AnalysisSummary;
  /** Where the per-mode storey responses and rho come from, fetched when a screen shows them. */
  detail: ModalDetailSource;
  storeys: StoreyInput[];
  units: UnitSystem;
}) {
  const levels = elevations(storeys);
  return (
    <>
      <ImplausibleResultsAlert flags={result.plausibility ?? []} />
      {result.warnings.length > 0 && (
        <Alert severity="warning" aria-label="Warnings">
          {result.warnings.map((w) => (
            <div key={w}>{w}</div>
          ))}
        </Alert>
      )}
      <Section title="Modes">
        <ModesTable modes={result.modes} />
        <Box sx={{ mt: 2, maxWidth: 720 }}>
          <MassChart modes={result.modes} />
        </Box>
      </Section>
      <Section title="Mode shapes">
        <ModeShapesPanel modes={result.modes} storeys={storeys} units={units} />
      </Section>
      <Section title="Responses">
        <ResponseProfiles
          result={result}
          elevations={levels.slice(0, result.combined.cqc.storeyShear.length)}
          units={units}
        />
        <Typography variant="h3" sx={{ mt: 2 }} gutterBottom>
          Storey by storey
        </Typography>
        <StoreyResponsesTable result={result} detail={detail} storeys={storeys} units={units} />
        <Typography variant="h3" sx={{ mt: 2 }} gutterBottom>
          Correlation coefficients (CQC)
        </Typography>
        <FetchedCorrelationTable result={result} detail={detail} />
      </Section>
      <Section title="Method, step by step">
        <MethodView storeys={storeys} result={result} detail={detail} units={units} />
      </Section>
    </>
  );
}
