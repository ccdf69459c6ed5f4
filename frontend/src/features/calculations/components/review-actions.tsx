import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  Link,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import type { CalculationDto, UserDto } from '@tiermode/shared-types';
import { useFormik } from 'formik';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router';
import * as yup from 'yup';
import { canOn, useAppAbility } from '@/lib/ability';
import { errorMessages } from '@/lib/api-client';
import { useReviewStep } from '../api/calculations';

interface Props {
  calc: CalculationDto;
  /** The signed-in user, whose licence the lock dialog shows. */
  user: UserDto;
  /** True while the page holds edits that are not saved. */
  dirty: boolean;
  /** Called with the new draft after a revision is started. */
  onRevised: (calc: CalculationDto) => void;
}

function Failure({ error }: { error: unknown }) {
  return (
    <Alert severity="error" role="alert">
      {errorMessages(error).map((m) => (
        <div key={m}>{m}</div>
      ))}
    </Alert>
  );
}

/** A dialog with one required text, for returning (a comment) and locking (a statement). */
function TextDialog({
  title,
  intro,
  label,
  action,
  required,
  max,
  pending,
  error,
  onClose,
  onConfirm,
}: {
  title: string;
  intro: React.ReactNode;
  label: string;
  action: string;
  required: string;
  max: number;
  pending: boolean;
  error: unknown;
  onClose: () => void;
  onConfirm: (text: string) => Promise<unknown>;
}) {
  const form = useFormik({
    initialValues: { text: '' },
    validationSchema: yup.object({
      text: yup.string().trim().required(required).max(max, `At most ${max} characters`),
    }),
    onSubmit: async ({ text }) => {
      await onConfirm(text.trim()).catch(() => undefined);
    },
  });
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="review-dialog-title">
      <form onSubmit={form.handleSubmit} noValidate>
        <DialogTitle id="review-dialog-title">{title}</DialogTitle>
        <DialogContent>
          <Stack spacing={2}>
            <Box>{intro}</Box>
            <TextField
              autoFocus
              multiline
              minRows={4}
              label={label}
              name="text"
              value={form.values.text}
              onChange={form.handleChange}
              onBlur={form.handleBlur}
              error={form.touched.text && Boolean(form.errors.text)}
              helperText={form.touched.text && form.errors.text}
            />
            {error ? <Failure error={error} /> : null}
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={pending}>
            {action}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}

/** Submit, return, lock and revise: each shown only to whoever may do it, with the reason when not. */
export function ReviewActions({ calc, user, dirty, onRevised }: Props) {
  const ability = useAppAbility();
  const [dialog, setDialog] = useState<'return' | 'lock' | null>(null);
  const submit = useReviewStep(calc.id, 'submit');
  const giveBack = useReviewStep(calc.id, 'return');
  const lock = useReviewStep(calc.id, 'lock');
  const revise = useReviewStep(calc.id, 'revise');
  const record = {
    id: calc.id,
    status: calc.status,
    authorId: calc.author.id,
    projectMemberIds: calc.projectMemberIds,
  };
  const may = (action: 'submit' | 'return' | 'lock' | 'revise') =>
    canOn(ability, action, 'Calculation', record);

  const submitBlocker = dirty
    ? 'Save your changes first.'
    : calc.analysisStale
      ? 'Analyse the saved inputs first: the results are older than the inputs.'
      : null;

  return (
    <Stack spacing={2}>
      {calc.status === 'draft' && may('submit') && (
        <Stack spacing={1}>
          <Typography>
            When the inputs and results are ready, submit the calc: the reviewers are told by mail,
            and it cannot change until one of them returns it.
          </Typography>
          {submitBlocker && <Alert severity="info">{submitBlocker}</Alert>}
          <div>
            <Button
              variant="contained"
              disabled={Boolean(submitBlocker) || submit.isPending}
              onClick={() => submit.mutate({})}
            >
              Submit for review
            </Button>
          </div>
          {submit.isError && <Failure error={submit.error} />}
        </Stack>
      )}
      {calc.status === 'submitted' && (may('return') || may('lock')) && (
        <Stack direction="row" spacing={1}>
          {may('return') && (
            <Button variant="outlined" onClick={() => setDialog('return')}>
              Return to the designer
            </Button>
          )}
          {may('lock') && (
            <Button variant="contained" color="success" onClick={() => setDialog('lock')}>
              Lock as the calc of record
            </Button>
          )}
        </Stack>
      )}
      {calc.status === 'submitted' && !may('lock') && user.role === 'reviewer' && (
        <Alert severity="info">
          {calc.author.id === user.id
            ? 'You wrote this calc, so another reviewer must lock it.'
            : 'Locking needs a licence that is recorded and not expired; ask your admin to check yours.'}
        </Alert>
      )}
      {calc.status === 'submitted' && user.role === 'designer' && (
        <Alert severity="info">Submitted for review: waiting for a reviewer.</Alert>
      )}
      {calc.nextRevision && (
        <Alert severity="info" aria-label="Next revision">
          Revision {calc.nextRevision.revision} of this calc exists (
          {calc.nextRevision.status === 'draft'
            ? 'a draft'
            : calc.nextRevision.status === 'submitted'
              ? 'under review'
              : calc.nextRevision.status}
          ):{' '}
          <Link component={RouterLink} to={`/calculations/${calc.nextRevision.id}`}>
            open revision {calc.nextRevision.revision}
          </Link>
          .
        </Alert>
      )}
      {calc.status === 'locked' && !calc.nextRevision && may('revise') && (
        <Stack spacing={1}>
          <Typography>
            This calc is sealed and will never change. To change anything, start a new revision: a
            draft with the same inputs, revision {calc.revision + 1}. Once that one is locked, this
            one becomes superseded.
          </Typography>
          <div>
            <Button
              variant="outlined"
              disabled={revise.isPending}
              onClick={() => revise.mutate({}, { onSuccess: onRevised })}
            >
              Start revision {calc.revision + 1}
            </Button>
          </div>
          {revise.isError && <Failure error={revise.error} />}
        </Stack>
      )}
      {dialog === 'return' && (
        <TextDialog
          title="Return to the designer"
          intro={
            <DialogContentText>
              The calc goes back to draft and {calc.author.name} is told by mail, with your comment.
            </DialogContentText>
          }
          label="What should change"
          action="Return the calc"
          required="Say what the designer should change"
          max={10_000}
          pending={giveBack.isPending}
          error={giveBack.error}
          onClose={() => setDialog(null)}
          onConfirm={(comment) => giveBack.mutateAsync({ comment }).then(() => setDialog(null))}
        />
      )}
      {dialog === 'lock' && (
        <TextDialog
          title="Lock as the calc of record"
          intro={
            <Stack spacing={1}>
              <DialogContentText>
                Locking seals revision {calc.revision} of “{calc.title}”: its inputs, its results,
                the engine version, your name and licence, your statement and the time are hashed
                together, and nothing in it can change again.
              </DialogContentText>
              <Alert severity="info" icon={false} aria-label="Your licence">
                Signing as {user.name}, licence {user.licenseNumber ?? '(none recorded)'},{' '}
                {user.licenseJurisdiction ?? '(no jurisdiction recorded)'}, valid through{' '}
                {user.licenseExpiresOn ?? '(no expiry recorded)'}.
              </Alert>
            </Stack>
          }
          label="Statement of acceptance"
          action="Lock and seal"
          required="State what you accept"
          max={5_000}
          pending={lock.isPending}
          error={lock.error}
          onClose={() => setDialog(null)}
          onConfirm={(statement) => lock.mutateAsync({ statement }).then(() => setDialog(null))}
        />
      )}
    </Stack>
  );
}
