import { MenuItem, Stack, TextField } from '@mui/material';
import {
  MASS_TARGETS,
  modeChoiceValue,
  parseModeChoice,
  type AnalysisInputsState,
} from '../model/use-analysis-inputs';

/** Damping and the number of modes combined, under the storey table. */
export function AnalysisSettings({
  inputs,
  readOnly = false,
}: {
  inputs: AnalysisInputsState;
  readOnly?: boolean;
}) {
  const { rows, damping, setDamping, dampingProblem, modeCount, setModeCount } = inputs;
  return (
    <Stack direction="row" spacing={2} sx={{ mt: 2 }}>
      <TextField
        label="Damping (% of critical)"
        size="small"
        value={damping}
        onChange={(e) => setDamping(e.target.value)}
        error={Boolean(dampingProblem)}
        helperText={dampingProblem ?? 'The same for every mode'}
        slotProps={{ htmlInput: { inputMode: 'decimal', readOnly } }}
      />
      <TextField
        select
        label="Modes combined"
        size="small"
        sx={{ minWidth: 180 }}
        value={modeChoiceValue(modeCount)}
        disabled={readOnly}
        onChange={(e) => setModeCount(parseModeChoice(e.target.value))}
      >
        <MenuItem value="all">All {rows.length}</MenuItem>
        {MASS_TARGETS.map((ratio) => (
          <MenuItem key={ratio} value={`mass-${ratio}`}>
            Fewest reaching {Math.round(ratio * 100)}% of the mass
          </MenuItem>
        ))}
        {Array.from({ length: Math.min(rows.length - 1, 30) }, (_, i) => (
          <MenuItem key={i + 1} value={String(i + 1)}>
            First {i + 1}
          </MenuItem>
        ))}
      </TextField>
    </Stack>
  );
}
