import { formatDateTime } from '@tiermode/shared-types';
import {
  Button,
  Checkbox,
  Chip,
  FormControlLabel,
  List,
  ListItem,
  MenuItem,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import type { CalculationDto } from '@tiermode/shared-types';
import { useFormik } from 'formik';
import * as yup from 'yup';
import { canOn, useAppAbility } from '@/lib/ability';
import { errorMessages } from '@/lib/api-client';
import { useAddComment, useResolveComment } from '../api/calculations';

const RESULT_TARGETS = [
  'Periods and mode shapes',
  'Participation and mass ratios',
  'Design spectrum',
  'CQC base shear',
  'Storey drifts',
  'Storey shears',
  'Overturning moments',
];

/** What a comment can be about: the whole calc, one storey, or one result. */
function commentTargets(storeyCount: number): string[] {
  return [...Array.from({ length: storeyCount }, (_, i) => `Storey ${i + 1}`), ...RESULT_TARGETS];
}

const schema = yup.object({
  target: yup.string(),
  body: yup
    .string()
    .trim()
    .required('Write the comment')
    .max(10_000, 'A comment can be at most 10000 characters'),
});

/** The review's comments, each tied to a storey or a result, and a form for a new one. */
export function CommentThread({ calc }: { calc: CalculationDto }) {
  const ability = useAppAbility();
  const add = useAddComment(calc.id);
  const resolve = useResolveComment();
  const open = calc.status === 'draft' || calc.status === 'submitted';
  const record = {
    id: calc.id,
    status: calc.status,
    authorId: calc.author.id,
    projectMemberIds: calc.projectMemberIds,
  };
  const canComment = open && canOn(ability, 'comment', 'Calculation', record);
  const canResolve =
    open &&
    canOn(ability, 'update', 'ReviewComment', { id: '', projectMemberIds: calc.projectMemberIds });
  const form = useFormik({
    initialValues: { target: '', body: '' },
    validationSchema: schema,
    onSubmit: async (values, helpers) => {
      await add.mutateAsync({
        body: values.body.trim(),
        ...(values.target ? { target: values.target } : {}),
      });
      helpers.resetForm();
    },
  });

  return (
    <Stack spacing={2}>
      {calc.comments.length === 0 ? (
        <Typography color="text.secondary">No comments yet.</Typography>
      ) : (
        <List aria-label="Review comments" disablePadding>
          {calc.comments.map((c) => (
            <ListItem
              key={c.id}
              divider
              alignItems="flex-start"
              sx={{ flexDirection: 'column', alignItems: 'stretch', opacity: c.resolved ? 0.7 : 1 }}
            >
              <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
                <Typography variant="subtitle2">{c.author.name}</Typography>
                <Typography variant="caption" color="text.secondary">
                  {formatDateTime(c.createdAt)}
                </Typography>
                <Chip size="small" variant="outlined" label={c.target ?? 'Whole calc'} />
                {c.resolved && <Chip size="small" color="success" label="Resolved" />}
              </Stack>
              <Typography sx={{ whiteSpace: 'pre-wrap', mt: 0.5 }}>{c.body}</Typography>
              {canResolve && (
                <FormControlLabel
                  control={
                    <Checkbox
                      checked={c.resolved}
                      onChange={(e) =>
                        resolve.mutate({ commentId: c.id, resolved: e.target.checked })
                      }
                    />
                  }
                  label="Resolved"
                />
              )}
            </ListItem>
          ))}
        </List>
      )}
      {resolve.isError && (
        <Typography color="error" role="alert">
          {errorMessages(resolve.error).join(' ')}
        </Typography>
      )}
      {canComment && (
        <Stack component="form" spacing={1} onSubmit={form.handleSubmit} aria-label="New comment">
          <TextField
            select
            size="small"
            label="About"
            name="target"
            value={form.values.target}
            onChange={form.handleChange}
            sx={{ maxWidth: 320 }}
          >
            <MenuItem value="">Whole calc</MenuItem>
            {commentTargets(calc.inputs.storeys.length).map((t) => (
              <MenuItem key={t} value={t}>
                {t}
              </MenuItem>
            ))}
          </TextField>
          <TextField
            multiline
            minRows={3}
            label="Comment"
            name="body"
            value={form.values.body}
            onChange={form.handleChange}
            onBlur={form.handleBlur}
            error={form.touched.body && Boolean(form.errors.body)}
            helperText={form.touched.body && form.errors.body}
          />
          {add.isError && (
            <Typography color="error" role="alert">
              {errorMessages(add.error).join(' ')}
            </Typography>
          )}
          <div>
            <Button type="submit" variant="outlined" disabled={form.isSubmitting}>
              Add the comment
            </Button>
          </div>
        </Stack>
      )}
    </Stack>
  );
}
