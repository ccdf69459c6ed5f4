import { Chip } from '@mui/material';
import type { CalculationStatus } from '@tiermode/shared-types';

const STATUS_LABELS: Record<CalculationStatus, string> = {
  draft: 'Draft',
  submitted: 'Submitted for review',
  locked: 'Locked: calc of record',
  superseded: 'Superseded',
};

const COLOURS = {
  draft: 'default',
  submitted: 'info',
  locked: 'success',
  superseded: 'warning',
} as const;

/**
 * A calculation's status in words; colour only repeats what the words say. A draft the reviewer
 * sent back reads "Returned with comments (3)", not a plain Draft.
 */
export function StatusChip({
  status,
  size = 'small',
  returnedWithComments = null,
}: {
  status: CalculationStatus;
  size?: 'small' | 'medium';
  /** For a returned draft: how many of its comments are still open; null when not returned. */
  returnedWithComments?: number | null;
}) {
  if (status === 'draft' && returnedWithComments !== null) {
    return (
      <Chip
        size={size}
        color="warning"
        variant="outlined"
        label={
          returnedWithComments > 0
            ? `Returned with comments (${returnedWithComments})`
            : 'Returned, comments resolved'
        }
      />
    );
  }
  return (
    <Chip
      size={size}
      color={COLOURS[status]}
      variant={status === 'draft' ? 'outlined' : 'filled'}
      label={STATUS_LABELS[status]}
    />
  );
}
