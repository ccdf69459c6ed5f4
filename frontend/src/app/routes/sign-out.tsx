import { LinearProgress } from '@mui/material';
import { useEffect, useRef } from 'react';
import { useNavigate } from 'react-router';
import { useLogout } from '@/features/auth/api/logout';

/**
 * Signing out is a page to go to, so that a page with unsaved edits asks first (its leave
 * guard blocks the navigation here like any other).
 */
export function SignOutRoute() {
  const logout = useLogout();
  const navigate = useNavigate();
  const started = useRef(false);
  useEffect(() => {
    if (started.current) return;
    started.current = true;
    logout.mutate(undefined, { onSettled: () => void navigate('/sign-in', { replace: true }) });
  }, [logout, navigate]);
  return <LinearProgress aria-label="Signing out" />;
}
