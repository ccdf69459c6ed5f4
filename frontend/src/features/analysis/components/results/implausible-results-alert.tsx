import { Alert, AlertTitle } from '@mui/material';
import type { PlausibilityFlag } from '@tiermode/shared-types';

/**
 * Results no real building gives (a units slip, usually), above everything else, each naming the
 * storey to look at. Shown in red: a number like this must not pass for a result.
 */
export function ImplausibleResultsAlert({ flags }: { flags: readonly PlausibilityFlag[] }) {
  if (flags.length === 0) return null;
  return (
    <Alert severity="error" role="alert" aria-label="Implausible results">
      <AlertTitle>These results look impossible for a real building</AlertTitle>
      {flags.map((flag) => (
        <div key={flag.message}>{flag.message}</div>
      ))}
      Nothing below can be relied on until the inputs are corrected.
    </Alert>
  );
}
