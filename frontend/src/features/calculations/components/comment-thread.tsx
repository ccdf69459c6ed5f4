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
import type { CalculationDto, ReviewCommentDto } from '@tiermode/shared-types';
import { useState } from 'react';
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

/** What a comment can be about: the whole calc, one storey ("storey:3"), or one result. */
function commentTargets(storeyCount: number): { value: string; label: string }[] {
  return [
    ...Array.from({ length: storeyCount }, (_, i) => ({
      value: `storey:${i + 1}`,
      label: `Storey ${i + 1}`,
    })),
    ...RESULT_TARGETS.map((t) => ({ value: t, label: t })),
  ];
}

/** The chosen "About" as the API takes it: a storey number, or a target in words. */
function aboutOf(value: string): { storey?: number; target?: string } {
  if (value.startsWith('storey:')) return { storey: Number(value.slice('storey:'.length)) };
  return value ? { target: value } : {};
}

/** How a comment's subject reads: "Storey 3", a result, or the whole calc. */
const commentSubject = (c: ReviewCommentDto) =>
  c.storey !== null ? `Storey ${c.storey}` : (c.target ?? 'Whole calc');

const schema = yup.object({
  target: yup.string(),
  body: yup
    .string()
    .trim()
    .required('Write the comment')
    .max(10_000, 'A comment can be at most 10000 characters'),
});

function CommentHeader({ comment }: { comment: ReviewCommentDto }) {
  return (
    <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
      <Typography variant="subtitle2">{comment.author.name}</Typography>
      <Typography variant="caption" color="text.secondary">
        {formatDateTime(comment.createdAt)}
      </Typography>
      {comment.parentId === null && (
        <Chip size="small" variant="outlined" label={commentSubject(comment)} />
      )}
      {comment.resolved && <Chip size="small" color="success" label="Resolved" />}
    </Stack>
  );
}

/** A reply box under one comment. */
function ReplyForm({ calc, comment }: { calc: CalculationDto; comment: ReviewCommentDto }) {
  const add = useAddComment(calc.id);
  const [open, setOpen] = useState(false);
  const [body, setBody] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  if (!open) {
    return (
      <div>
        <Button size="small" onClick={() => setOpen(true)}>
          Reply
        </Button>
      </div>
    );
  }
  const send = async () => {
    if (!body.trim()) {
      setProblem('Write the reply');
      return;
    }
    await add.mutateAsync({ body: body.trim(), parentId: comment.id });
    setBody('');
    setOpen(false);
  };
  return (
    <Stack
      spacing={1}
      sx={{ mt: 1 }}
      component="form"
      aria-label={`Reply to ${comment.author.name}`}
    >
      <TextField
        multiline
        minRows={2}
        size="small"
        label="Reply"
        value={body}
        onChange={(e) => {
          setBody(e.target.value);
          setProblem(null);
        }}
        error={problem !== null}
        helperText={problem}
      />
      {add.isError && (
        <Typography color="error" role="alert">
          {errorMessages(add.error).join(' ')}
        </Typography>
      )}
      <Stack direction="row" spacing={1}>
        <Button
          variant="outlined"
          size="small"
          disabled={add.isPending}
          onClick={() => void send().catch(() => undefined)}
        >
          Send the reply
        </Button>
        <Button size="small" onClick={() => setOpen(false)}>
          Cancel
        </Button>
      </Stack>
    </Stack>
  );
}

/**
 * The review's comments, each tied to a storey or a result, with their replies under them, and
 * a form for a new one.
 */
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
      await add.mutateAsync({ body: values.body.trim(), ...aboutOf(values.target) });
      helpers.resetForm();
    },
  });
  const firsts = calc.comments.filter((c) => c.parentId === null);
  const repliesTo = (id: string) => calc.comments.filter((c) => c.parentId === id);

  return (
    <Stack spacing={2}>
      {firsts.length === 0 ? (
        <Typography color="text.secondary">No comments yet.</Typography>
      ) : (
        <List aria-label="Review comments" disablePadding>
          {firsts.map((c) => (
            <ListItem
              key={c.id}
              divider
              alignItems="flex-start"
              sx={{ flexDirection: 'column', alignItems: 'stretch', opacity: c.resolved ? 0.7 : 1 }}
            >
              <CommentHeader comment={c} />
              <Typography sx={{ whiteSpace: 'pre-wrap', mt: 0.5, overflowWrap: 'anywhere' }}>
                {c.body}
              </Typography>
              {repliesTo(c.id).length > 0 && (
                <List
                  aria-label={`Replies to ${c.author.name}`}
                  disablePadding
                  sx={{ pl: 3, borderLeft: 2, borderColor: 'divider', mt: 1 }}
                >
                  {repliesTo(c.id).map((r) => (
                    <ListItem
                      key={r.id}
                      disableGutters
                      sx={{ flexDirection: 'column', alignItems: 'stretch', pl: 1 }}
                    >
                      <CommentHeader comment={r} />
                      <Typography
                        sx={{ whiteSpace: 'pre-wrap', mt: 0.5, overflowWrap: 'anywhere' }}
                      >
                        {r.body}
                      </Typography>
                    </ListItem>
                  ))}
                </List>
              )}
              <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
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
              </Stack>
              {canComment && <ReplyForm calc={calc} comment={c} />}
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
              <MenuItem key={t.value} value={t.value}>
                {t.label}
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
