import { Box, Card, CardContent, Typography } from '@mui/material';
import { useSyncExternalStore } from 'react';
import { Navigate, useNavigate, useSearchParams } from 'react-router';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { readSession, subscribeSession } from '@/lib/session';

/** Only same-site paths are followed after sign-in. */
function safeRedirect(target: string | null): string {
  return target && target.startsWith('/') && !target.startsWith('//') ? target : '/';
}

export function SignInRoute() {
  const session = useSyncExternalStore(subscribeSession, readSession);
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const redirectTo = safeRedirect(params.get('redirectTo'));
  if (session) return <Navigate to={redirectTo} replace />;

  return (
    <Box
      sx={{
        minHeight: '100vh',
        display: 'grid',
        placeItems: 'center',
        bgcolor: 'background.default',
        p: 2,
      }}
    >
      <Card sx={{ width: '100%', maxWidth: 420 }} variant="outlined">
        <CardContent sx={{ p: 4 }}>
          <Typography variant="h1" component="h1" gutterBottom>
            Tiermode
          </Typography>
          <Typography color="text.secondary" sx={{ mb: 3 }}>
            Seismic modal analysis of shear buildings, from storey table to sealed calc of record.
          </Typography>
          {params.get('passwordSet') && (
            <Typography color="success.dark" sx={{ mb: 2 }} role="status">
              Your password is saved. Sign in with it.
            </Typography>
          )}
          {params.get('ended') && (
            <Typography color="warning.dark" sx={{ mb: 2 }} role="status">
              Your session has ended. Please sign in again.
            </Typography>
          )}
          <SignInForm onSignedIn={() => void navigate(redirectTo, { replace: true })} />
        </CardContent>
      </Card>
    </Box>
  );
}
