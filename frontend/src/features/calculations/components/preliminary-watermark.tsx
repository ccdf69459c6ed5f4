import { Box } from '@mui/material';
import type { ReactNode } from 'react';

/**
 * "Preliminary" across everything that is not a calc of record (product.md: drafts are
 * preliminary). Drawn faintly over the content and ignored by the pointer, so nothing is hidden
 * or blocked; screen readers get the words once, from the note above the content.
 */
export function PreliminaryWatermark({ show, children }: { show: boolean; children: ReactNode }) {
  if (!show) return <>{children}</>;
  return (
    <Box sx={{ position: 'relative' }} data-testid="preliminary-watermark">
      <Box
        aria-hidden
        sx={{
          position: 'absolute',
          inset: 0,
          pointerEvents: 'none',
          zIndex: 1,
          overflow: 'hidden',
          backgroundImage: `url("data:image/svg+xml,${encodeURIComponent(
            '<svg xmlns="http://www.w3.org/2000/svg" width="420" height="300"><text x="50%" y="55%" text-anchor="middle" transform="rotate(-28 210 150)" font-family="Roboto, sans-serif" font-size="54" font-weight="700" fill="rgba(183,28,28,0.09)">PRELIMINARY</text></svg>',
          )}")`,
          backgroundRepeat: 'repeat',
        }}
      />
      {children}
    </Box>
  );
}
