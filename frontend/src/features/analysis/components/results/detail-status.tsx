import { Alert, LinearProgress } from '@mui/material';
import { errorMessages } from '@/lib/api-client';

/** While the per-mode values are fetched, or why they could not be. */
export function DetailStatus({ loading, error }: { loading: boolean; error: unknown }) {
  if (error) {
    return (
      <Alert severity="error" role="alert">
        {errorMessages(error).map((m) => (
          <div key={m}>{m}</div>
        ))}
      </Alert>
    );
  }
  return loading ? <LinearProgress aria-label="Fetching the per-mode values" /> : null;
}
