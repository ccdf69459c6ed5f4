import { Alert, AlertTitle, Box, Button } from '@mui/material';
import type { FallbackProps } from 'react-error-boundary';

/** Shown when a screen fails to render; nothing saved is lost by reloading. */
export function ErrorFallback({ error, resetErrorBoundary }: FallbackProps) {
  const message = error instanceof Error ? error.message : String(error);
  return (
    <Box sx={{ p: 4, maxWidth: 720, mx: 'auto' }}>
      <Alert severity="error">
        <AlertTitle>This page could not be shown</AlertTitle>
        {message}. Your saved work is on the server and is not affected.
      </Alert>
      <Button sx={{ mt: 2 }} variant="contained" onClick={resetErrorBoundary}>
        Try again
      </Button>
    </Box>
  );
}
