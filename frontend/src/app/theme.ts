import { createTheme } from '@mui/material/styles';

/** Tiermode's own look: a deep slate-blue with a warm ochre accent, on Roboto (bundled). */
export const theme = createTheme({
  palette: {
    primary: { main: '#23465f', contrastText: '#ffffff' },
    secondary: { main: '#9a5b12', contrastText: '#ffffff' },
    // MUI's stock info (#0288d1) and warning (#ed6c02) carry white text below the 4.5:1 contrast
    // WCAG 2.1 AA asks of small text (1.4.3); these darker shades reach it.
    info: { main: '#0b5c8a', contrastText: '#ffffff' },
    warning: { main: '#a34700', contrastText: '#ffffff' },
    background: { default: '#f5f6f4', paper: '#ffffff' },
  },
  shape: { borderRadius: 6 },
  typography: {
    fontFamily: 'Roboto, "Helvetica Neue", Arial, sans-serif',
    h1: { fontSize: '1.75rem', fontWeight: 500 },
    h2: { fontSize: '1.4rem', fontWeight: 500 },
    h3: { fontSize: '1.15rem', fontWeight: 500 },
  },
  components: {
    MuiButton: { defaultProps: { disableElevation: true } },
    MuiAppBar: { defaultProps: { elevation: 0 } },
  },
});
