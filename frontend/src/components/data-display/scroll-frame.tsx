import { TableContainer } from '@mui/material';
import type { ReactNode } from 'react';

/**
 * A frame a wide or long table scrolls inside, so the page itself never scrolls sideways on a
 * phone. It takes the keyboard focus (arrow keys scroll it) and is named as a region, as a
 * scrollable region must be (WCAG 2.1.1; axe's scrollable-region-focusable).
 */
export function ScrollFrame({
  label,
  maxHeight,
  children,
}: {
  label: string;
  maxHeight?: number;
  children: ReactNode;
}) {
  return (
    <TableContainer
      tabIndex={0}
      role="region"
      aria-label={label}
      sx={{
        ...(maxHeight ? { maxHeight } : {}),
        '&:focus-visible': { outline: 2, outlineColor: 'primary.main', outlineStyle: 'solid' },
      }}
    >
      {children}
    </TableContainer>
  );
}
