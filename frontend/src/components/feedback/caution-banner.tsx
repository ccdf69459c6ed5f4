import { Alert, AlertTitle } from '@mui/material';

/** The caution that stands on every results, checks, library and report view (product.md). */
export const CAUTION_TEXT =
  'This analysis is an aid to an engineer’s judgement. The locally adopted building code governs, ' +
  'and nothing here is for construction until the engineer of record has accepted it.';

export function CautionBanner() {
  return (
    <Alert severity="warning" variant="outlined" role="note" aria-label="Caution" sx={{ mb: 2 }}>
      <AlertTitle>Caution</AlertTitle>
      {CAUTION_TEXT}
    </Alert>
  );
}
