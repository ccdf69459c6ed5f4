import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  MenuItem,
  TextField,
} from '@mui/material';
import type {
  CalculationDto,
  CalculationInputs,
  DisplayUnits,
  ProjectDto,
} from '@tiermode/shared-types';
import { useFormik } from 'formik';
import type { ReactNode } from 'react';
import * as yup from 'yup';
import { canOn, useAppAbility } from '@/lib/ability';
import { errorMessages } from '@/lib/api-client';
import { useCreateCalculation } from '../api/calculations';

/**
 * Names a new draft calc in a project; it starts from `inputs`, which the designer then edits.
 * Without a `projectId` the designer picks one of `projects` that they may add calcs to.
 */
export function NewCalculationDialog({
  projectId,
  projects = [],
  inputs,
  displayUnits,
  intro = 'The draft starts from an example five-storey building; replace its storeys and spectrum with the project’s own.',
  onClose,
  onCreated,
}: {
  projectId?: string;
  /** The projects to choose from when no `projectId` is given. */
  projects?: ProjectDto[];
  inputs: CalculationInputs;
  displayUnits?: DisplayUnits;
  intro?: ReactNode;
  onClose: () => void;
  onCreated: (calc: CalculationDto) => void;
}) {
  const ability = useAppAbility();
  const choices = projects.filter((p) =>
    canOn(ability, 'create', 'Calculation', { projectMemberIds: p.memberIds }),
  );
  const form = useFormik({
    initialValues: { title: '', projectId: projectId ?? '' },
    validationSchema: yup.object({
      title: yup
        .string()
        .trim()
        .required('Give the calc a title')
        .max(200, 'A title can be at most 200 characters'),
      projectId: yup.string().required('Choose the project the calc belongs to'),
    }),
    onSubmit: async ({ title }) => {
      const calc = await create
        .mutateAsync({ title: title.trim(), inputs, ...(displayUnits ? { displayUnits } : {}) })
        .catch(() => null);
      if (calc) onCreated(calc);
    },
  });
  const create = useCreateCalculation(form.values.projectId);
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="new-calc-title">
      <form onSubmit={form.handleSubmit} noValidate>
        <DialogTitle id="new-calc-title">New calculation</DialogTitle>
        <DialogContent>
          <DialogContentText sx={{ mb: 2 }}>{intro}</DialogContentText>
          {projectId === undefined && (
            <TextField
              select
              fullWidth
              label="Project"
              name="projectId"
              value={form.values.projectId}
              onChange={form.handleChange}
              onBlur={form.handleBlur}
              error={form.touched.projectId && Boolean(form.errors.projectId)}
              helperText={
                (form.touched.projectId && form.errors.projectId) ||
                (choices.length === 0
                  ? 'You are not a member of any project yet: create one under Projects first.'
                  : 'Projects you are a member of')
              }
              sx={{ mb: 2 }}
            >
              {choices.map((p) => (
                <MenuItem key={p.id} value={p.id}>
                  {p.name}
                </MenuItem>
              ))}
            </TextField>
          )}
          <TextField
            autoFocus
            fullWidth
            label="Title"
            name="title"
            placeholder="e.g. Lateral modal analysis, north-south"
            value={form.values.title}
            onChange={form.handleChange}
            onBlur={form.handleBlur}
            error={form.touched.title && Boolean(form.errors.title)}
            helperText={form.touched.title && form.errors.title}
          />
          {create.isError && (
            <Alert severity="error" sx={{ mt: 2 }}>
              {errorMessages(create.error).join(' ')}
            </Alert>
          )}
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={form.isSubmitting}>
            Create the draft
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
