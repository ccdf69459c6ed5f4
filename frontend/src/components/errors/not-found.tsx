import { Box, Button, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router';

export function NotFound() {
  return (
    <Box sx={{ p: 4 }}>
      <Typography variant="h1" gutterBottom>
        Page not found
      </Typography>
      <Typography sx={{ mb: 2 }}>There is no page at this address.</Typography>
      <Button component={RouterLink} to="/" variant="contained">
        Go to the start page
      </Button>
    </Box>
  );
}
