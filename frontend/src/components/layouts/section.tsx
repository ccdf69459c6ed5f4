import { Card, CardContent, Typography } from '@mui/material';
import type { ReactNode } from 'react';

/** A titled card: one part of a page, named for screen readers by its title. */
export function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Card variant="outlined" component="section" aria-label={title}>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          {title}
        </Typography>
        {children}
      </CardContent>
    </Card>
  );
}
