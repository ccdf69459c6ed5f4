import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
} from '@mui/material';
import type { CalculationDto } from '@tiermode/shared-types';
import { useState } from 'react';
import { errorMessages } from '@/lib/api-client';
import { useDeleteDraft } from '../api/calculations';

/**
 * The author throws away a draft that never went to review, after saying so in a dialog. The
 * audit trail keeps its events and records the deletion.
 */
export function DeleteDraftButton({
  calc,
  onDeleted,
}: {
  calc: CalculationDto;
  onDeleted: () => void;
}) {
  const [open, setOpen] = useState(false);
  const remove = useDeleteDraft(calc.id);
  return (
    <>
      <Button color="error" onClick={() => setOpen(true)}>
        Delete draft
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} aria-labelledby="delete-draft-title">
        <DialogTitle id="delete-draft-title">Delete this draft?</DialogTitle>
        <DialogContent>
          <DialogContentText>
            “{calc.title}”, revision {calc.revision}, its comments and its {calc.attachments.length}{' '}
            attached file(s) are deleted for good. The history keeps a record that you deleted it.
          </DialogContentText>
          {remove.isError && (
            <Alert severity="error" role="alert" sx={{ mt: 2 }}>
              {errorMessages(remove.error).join(' ')}
            </Alert>
          )}
        </DialogContent>
        <DialogActions>
          <Button onClick={() => setOpen(false)}>Keep it</Button>
          <Button
            color="error"
            variant="contained"
            disabled={remove.isPending}
            onClick={() => remove.mutate(undefined, { onSuccess: onDeleted })}
          >
            Delete draft
          </Button>
        </DialogActions>
      </Dialog>
    </>
  );
}
