import { Box, Typography } from '@mui/material';

export function Forbidden() {
  return (
    <Box sx={{ p: 4 }}>
      <Typography variant="h1" gutterBottom>
        Not available to your role
      </Typography>
      <Typography>Ask your admin if you need access to this page.</Typography>
    </Box>
  );
}
