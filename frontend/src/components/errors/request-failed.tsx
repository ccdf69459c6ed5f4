import { Alert, Box } from '@mui/material';
import { AxiosError } from 'axios';
import { errorMessages } from '@/lib/api-client';
import { Forbidden } from './forbidden';
import { NotFound } from './not-found';

/** What a page shows when loading its subject failed: 403 and 404 get their own pages. */
export function RequestFailed({ error }: { error: unknown }) {
  const status = error instanceof AxiosError ? error.response?.status : undefined;
  if (status === 403) return <Forbidden />;
  if (status === 404) return <NotFound />;
  return (
    <Box sx={{ p: 2 }}>
      <Alert severity="error" role="alert">
        {errorMessages(error).join(' ')}
      </Alert>
    </Box>
  );
}
