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

/** A calculation's status in words; colour only repeats what the words say. */
export function StatusChip({
  status,
  size = 'small',
}: {
  status: CalculationStatus;
  size?: 'small' | 'medium';
}) {
  return (
    <Chip
      size={size}
      color={COLOURS[status]}
      variant={status === 'draft' ? 'outlined' : 'filled'}
      label={STATUS_LABELS[status]}
    />
  );
}
