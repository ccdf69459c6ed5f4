import MenuIcon from '@mui/icons-material/Menu';
import {
  AppBar,
  Box,
  Button,
  Drawer,
  IconButton,
  List,
  ListItem,
  ListItemButton,
  ListItemIcon,
  ListItemText,
  Toolbar,
  Typography,
  useMediaQuery,
  useTheme,
} from '@mui/material';
import { useState, type ReactNode } from 'react';
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

/**
 * Top bar with the product name and the signed-in user; the allowed pages in a drawer, always
 * open on a wide screen and opened from the menu button below the medium breakpoint (phones,
 * tablets upright), where it closes again once a page is chosen.
 */
export function AppShell({ entries, userName, roleLabel, onSignOut, children }: AppShellProps) {
  const theme = useTheme();
  const narrow = useMediaQuery(theme.breakpoints.down('md'));
  const [open, setOpen] = useState(false);
  const navigation = (
    <Box component="nav" aria-label="Main">
      <List>
        {entries.map((entry) => (
          // Each link in its own <li>: a list holds list items only (screen readers count them).
          <ListItem key={entry.to} disablePadding>
            <ListItemButton
              component={NavLink}
              to={entry.to}
              end={entry.to === '/'}
              onClick={() => setOpen(false)}
              sx={{ '&.active': { bgcolor: 'action.selected', fontWeight: 500 } }}
            >
              <ListItemIcon sx={{ minWidth: 40 }}>{entry.icon}</ListItemIcon>
              <ListItemText primary={entry.label} />
            </ListItemButton>
          </ListItem>
        ))}
      </List>
    </Box>
  );
  return (
    <Box sx={{ display: 'flex', minHeight: '100vh' }}>
      <AppBar
        position="fixed"
        sx={{ zIndex: (t) => (narrow ? t.zIndex.appBar : t.zIndex.drawer + 1) }}
      >
        <Toolbar sx={{ gap: 1 }}>
          {narrow && (
            <IconButton
              color="inherit"
              edge="start"
              aria-label="Open the navigation"
              onClick={() => setOpen(true)}
            >
              <MenuIcon />
            </IconButton>
          )}
          <Typography variant="h6" component="div" sx={{ flexGrow: 1, letterSpacing: 0.5 }}>
            Tiermode
          </Typography>
          <Box
            sx={{ textAlign: 'right', mr: { xs: 0, sm: 2 }, minWidth: 0 }}
            data-testid="signed-in-user"
          >
            <Typography variant="body2" noWrap>
              {userName}
            </Typography>
            <Typography variant="caption" sx={{ opacity: 0.85 }}>
              {roleLabel}
            </Typography>
          </Box>
          <Button color="inherit" variant="outlined" onClick={onSignOut} sx={{ flexShrink: 0 }}>
            Sign out
          </Button>
        </Toolbar>
      </AppBar>
      {narrow ? (
        <Drawer
          variant="temporary"
          open={open}
          onClose={() => setOpen(false)}
          sx={{ '& .MuiDrawer-paper': { width: DRAWER_WIDTH, boxSizing: 'border-box' } }}
        >
          {navigation}
        </Drawer>
      ) : (
        <Drawer
          variant="permanent"
          sx={{
            width: DRAWER_WIDTH,
            flexShrink: 0,
            '& .MuiDrawer-paper': { width: DRAWER_WIDTH, boxSizing: 'border-box' },
          }}
        >
          <Toolbar />
          {navigation}
        </Drawer>
      )}
      <Box component="main" sx={{ flexGrow: 1, p: { xs: 1.5, sm: 2, md: 3 }, minWidth: 0 }}>
        <Toolbar />
        {children}
      </Box>
    </Box>
  );
}
