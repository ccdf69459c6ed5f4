import {
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
} from '@mui/material';
import { useEffect } from 'react';
import { useBlocker } from 'react-router';

/**
 * Asks before unsaved edits are lost: leaving the page by a link, the navigation, Back or
 * signing out (the router's blocker, answered in a dialog), and reloading or closing the tab
 * (the browser's own beforeunload prompt). Moving between tabs of the same page is not leaving.
 */
export function LeaveGuard({ when, what = 'edits' }: { when: boolean; what?: string }) {
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      when && currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (!when) return;
    const ask = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      // Older browsers show the prompt only when returnValue is set.
      event.returnValue = '';
    };
    window.addEventListener('beforeunload', ask);
    return () => window.removeEventListener('beforeunload', ask);
  }, [when]);
  const open = blocker.state === 'blocked';
  return (
    <Dialog open={open} onClose={() => blocker.reset?.()} aria-labelledby="leave-guard-title">
      <DialogTitle id="leave-guard-title">Leave without saving?</DialogTitle>
      <DialogContent>
        <DialogContentText>
          You have unsaved {what} here. If you leave now they are lost; stay to save them first.
        </DialogContentText>
      </DialogContent>
      <DialogActions>
        <Button onClick={() => blocker.reset?.()} autoFocus>
          Stay
        </Button>
        <Button color="error" onClick={() => blocker.proceed?.()}>
          Leave and lose them
        </Button>
      </DialogActions>
    </Dialog>
  );
}
