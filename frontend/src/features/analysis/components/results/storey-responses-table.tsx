import { ScrollFrame } from '@/components/data-display/scroll-frame';
import {
  MenuItem,
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableRow,
  TextField,
} from '@mui/material';
import type { AnalysisResponse, AnalysisSummary, StoreyInput } from '@tiermode/shared-types';
import { useState } from 'react';
import { formatNumber, toDisplay, unitLabel, type Quantity, type UnitSystem } from '@/lib/units';
import { useWholeAnalysis, type ModalDetailSource } from '../../api/modal-detail';
import { DetailStatus } from './detail-status';

type Choice = 'cqc' | 'srss' | 'abs' | `mode-${number}`;

const COMBINATIONS = [
  { value: 'cqc', label: 'CQC (combined)' },
  { value: 'srss', label: 'SRSS (combined)' },
  { value: 'abs', label: 'ABS, upper bound (combined)' },
] as const;

/** One table's values, SI, per level or storey. */
interface Values {
  floorForce: number[];
  storeyShear: number[];
  overturningMoment: number[];
  displacement: number[];
  drift: number[];
  baseShear: number;
  baseMoment: number | null;
}

/** The values chosen; null for a single mode until the whole analysis has come. */
function valuesOf(
  result: AnalysisSummary,
  whole: AnalysisResponse | undefined,
  choice: Choice,
): Values | null {
  if (choice === 'cqc' || choice === 'srss' || choice === 'abs') return result.combined[choice];
  if (!whole) return null;
  const mode = whole.modes.find((m) => `mode-${m.number}` === choice) ?? whole.modes[0];
  return { ...mode.response, baseMoment: mode.response.overturningMoment[0] ?? null };
}

/**
 * The responses storey by storey as numbers, with units: any combination (SRSS, CQC, ABS) or
 * any single mode (signed, as its shape). The table scrolls inside its frame on a narrow screen.
 */
export function StoreyResponsesTable({
  result,
  detail,
  storeys,
  units,
}: {
  result: AnalysisSummary;
  /** Where a single mode's values come from: only fetched once one is chosen. */
  detail: ModalDetailSource;
  storeys: StoreyInput[];
  units: UnitSystem;
}) {
  const [choice, setChoice] = useState<Choice>('cqc');
  const { whole, loading, error } = useWholeAnalysis(result, detail, choice.startsWith('mode-'));
  const values = valuesOf(result, whole, choice);
  const show = (quantity: Quantity, si: number) => formatNumber(toDisplay(units, quantity, si));
  const u = (quantity: Quantity) => unitLabel(units, quantity);
  const levels = storeys.map((_, i) => i);
  return (
    <>
      <TextField
        select
        size="small"
        label="Values"
        value={choice}
        onChange={(e) => setChoice(e.target.value as Choice)}
        sx={{ minWidth: 260, mb: 1 }}
      >
        {COMBINATIONS.map((c) => (
          <MenuItem key={c.value} value={c.value}>
            {c.label}
          </MenuItem>
        ))}
        {result.modes.map((m) => (
          <MenuItem key={m.number} value={`mode-${m.number}`}>
            Mode {m.number} alone (T = {formatNumber(m.period)} s, signed)
          </MenuItem>
        ))}
      </TextField>
      {values === null && <DetailStatus loading={loading} error={error} />}
      {values !== null && (
        <ScrollFrame label="Storey responses, scrolling" maxHeight={480}>
          <Table size="small" stickyHeader aria-label="Storey responses">
            <TableHead>
              <TableRow>
                <TableCell>Storey</TableCell>
                <TableCell>Label</TableCell>
                <TableCell align="right">Floor force ({u('force')})</TableCell>
                <TableCell align="right">Storey shear ({u('force')})</TableCell>
                <TableCell align="right">Overturning moment ({u('moment')})</TableCell>
                <TableCell align="right">Displacement ({u('displacement')})</TableCell>
                <TableCell align="right">Drift ({u('displacement')})</TableCell>
                <TableCell align="right">Drift ratio</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {levels.map((i) => (
                <TableRow key={i}>
                  <TableCell>{i + 1}</TableCell>
                  <TableCell>{storeys[i].label ?? ''}</TableCell>
                  <TableCell align="right">{show('force', values.floorForce[i])}</TableCell>
                  <TableCell align="right">{show('force', values.storeyShear[i])}</TableCell>
                  <TableCell align="right">{show('moment', values.overturningMoment[i])}</TableCell>
                  <TableCell align="right">
                    {show('displacement', values.displacement[i])}
                  </TableCell>
                  <TableCell align="right">{show('displacement', values.drift[i])}</TableCell>
                  <TableCell align="right">
                    {formatNumber(values.drift[i] / storeys[i].height)}
                  </TableCell>
                </TableRow>
              ))}
              <TableRow>
                <TableCell colSpan={3}>Base</TableCell>
                <TableCell align="right">{show('force', values.baseShear)}</TableCell>
                <TableCell align="right">
                  {values.baseMoment === null ? '' : show('moment', values.baseMoment)}
                </TableCell>
                <TableCell colSpan={3} />
              </TableRow>
            </TableBody>
          </Table>
        </ScrollFrame>
      )}
    </>
  );
}
