import {
  AppBar,
  Box,
  Button,
  Drawer,
  List,
  ListItem,
  ListItemButton,
  ListItemIcon,
  ListItemText,
  Toolbar,
  Typography,
} from '@mui/material';
import type { ReactNode } from 'react';
import { NavLink } from 'react-router';

export interface NavEntry {
  label: string;
  to: string;
  icon: ReactNode;
}

interface AppShellProps {
  entries: NavEntry[];
  userName: string;
  roleLabel: string;
  onSignOut: () => void;
  children: ReactNode;
}

const DRAWER_WIDTH = 232;

/** Top bar with the product name and the signed-in user; a drawer with the allowed pages. */
export function AppShell({ entries, userName, roleLabel, onSignOut, children }: AppShellProps) {
  return (
    <Box sx={{ display: 'flex', minHeight: '100vh' }}>
      <AppBar position="fixed" sx={{ zIndex: (t) => t.zIndex.drawer + 1 }}>
        <Toolbar>
          <Typography variant="h6" component="div" sx={{ flexGrow: 1, letterSpacing: 0.5 }}>
            Tiermode
          </Typography>
          <Box sx={{ textAlign: 'right', mr: 2 }} data-testid="signed-in-user">
            <Typography variant="body2">{userName}</Typography>
            <Typography variant="caption" sx={{ opacity: 0.85 }}>
              {roleLabel}
            </Typography>
          </Box>
          <Button color="inherit" variant="outlined" onClick={onSignOut}>
            Sign out
          </Button>
        </Toolbar>
      </AppBar>
      <Drawer
        variant="permanent"
        sx={{
          width: DRAWER_WIDTH,
          flexShrink: 0,
          '& .MuiDrawer-paper': { width: DRAWER_WIDTH, boxSizing: 'border-box' },
        }}
      >
        <Toolbar />
        <Box component="nav" aria-label="Main">
          <List>
            {entries.map((entry) => (
              // Each link in its own <li>: a list holds list items only (screen readers count them).
              <ListItem key={entry.to} disablePadding>
                <ListItemButton
                  component={NavLink}
                  to={entry.to}
                  end={entry.to === '/'}
                  sx={{ '&.active': { bgcolor: 'action.selected', fontWeight: 500 } }}
                >
                  <ListItemIcon sx={{ minWidth: 40 }}>{entry.icon}</ListItemIcon>
                  <ListItemText primary={entry.label} />
                </ListItemButton>
              </ListItem>
            ))}
          </List>
        </Box>
      </Drawer>
      <Box component="main" sx={{ flexGrow: 1, p: 3, minWidth: 0 }}>
        <Toolbar />
        {children}
      </Box>
    </Box>
  );
}
