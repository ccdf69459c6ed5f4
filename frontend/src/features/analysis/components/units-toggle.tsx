import { ToggleButton, ToggleButtonGroup } from '@mui/material';
import type { UnitSystem } from '@/lib/units';

/** SI or US customary: how values are shown and typed; the API always works in SI. */
export function UnitsToggle({
  units,
  onChange,
}: {
  units: UnitSystem;
  onChange: (units: UnitSystem) => void;
}) {
  return (
    <ToggleButtonGroup
      exclusive
      size="small"
      value={units}
      onChange={(_, value: UnitSystem | null) => value && onChange(value)}
      aria-label="Units"
    >
      <ToggleButton value="SI">SI (t, kN, m)</ToggleButton>
      <ToggleButton value="US">US (kip, ft, in)</ToggleButton>
    </ToggleButtonGroup>
  );
}
