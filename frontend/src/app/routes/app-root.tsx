import { Alert, Box, LinearProgress } from '@mui/material';
import { ROLE_LABELS } from '@tiermode/shared-types';
import { useEffect, useMemo, useSyncExternalStore } from 'react';
import { Navigate, Outlet, useLocation, useNavigate } from 'react-router';
import { AppShell } from '@/components/layouts/app-shell';
import { useMe } from '@/features/auth/api/get-me';
import { AbilityProvider } from '@casl/react';
import { buildAbility } from '@/lib/ability';
import { errorMessages, onUnauthorized } from '@/lib/api-client';
import { readSession, subscribeSession } from '@/lib/session';
import { navigationFor } from '../navigation';

/** Every signed-in page: needs a session, loads the user and its rules, draws the shell. */
export function AppRoot() {
  const session = useSyncExternalStore(subscribeSession, readSession);
  const location = useLocation();
  const navigate = useNavigate();
  const me = useMe(Boolean(session));
  const ability = useMemo(() => buildAbility(me.data?.rules ?? []), [me.data]);

  useEffect(
    () => onUnauthorized(() => void navigate('/sign-in?ended=1', { replace: true })),
    [navigate],
  );

  if (!session) {
    const redirectTo = encodeURIComponent(location.pathname + location.search);
    return <Navigate to={`/sign-in?redirectTo=${redirectTo}`} replace />;
  }
  if (me.isPending) return <LinearProgress aria-label="Loading your account" />;
  if (me.isError) {
    return (
      <Box sx={{ p: 4 }}>
        <Alert severity="error">{errorMessages(me.error).join(' ')}</Alert>
      </Box>
    );
  }

  const { user } = me.data;
  return (
    <AbilityProvider value={ability}>
      <AppShell
        entries={navigationFor(ability)}
        userName={user.name}
        roleLabel={ROLE_LABELS[user.role] + (user.licensed ? ' (licensed)' : '')}
        onSignOut={() => void navigate('/sign-out')}
      >
        <Outlet />
      </AppShell>
    </AbilityProvider>
  );
}
