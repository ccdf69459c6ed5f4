import { Alert, Box, Card, CardContent, Typography } from '@mui/material';
import { useNavigate, useSearchParams } from 'react-router';
import { SetPasswordForm } from '@/features/auth/components/set-password-form';

export function SetPasswordRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get('token');
  return (
    <Box sx={{ minHeight: '100vh', display: 'grid', placeItems: 'center', p: 2 }}>
      <Card sx={{ width: '100%', maxWidth: 420 }} variant="outlined">
        <CardContent sx={{ p: 4 }}>
          <Typography variant="h1" gutterBottom>
            Choose your password
          </Typography>
          {token ? (
            <SetPasswordForm
              token={token}
              onDone={() => void navigate('/sign-in?passwordSet=1', { replace: true })}
            />
          ) : (
            <Alert severity="error">
              This link has no token. Open the link from your account mail again.
            </Alert>
          )}
        </CardContent>
      </Card>
    </Box>
  );
}
