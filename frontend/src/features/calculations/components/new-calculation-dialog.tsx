import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogContentText,
  DialogTitle,
  TextField,
} from '@mui/material';
import type { CalculationDto, CalculationInputs } from '@tiermode/shared-types';
import { useFormik } from 'formik';
import * as yup from 'yup';
import { errorMessages } from '@/lib/api-client';
import { useCreateCalculation } from '../api/calculations';

/** Names a new draft calc in a project; it starts from `inputs`, which the designer then edits. */
export function NewCalculationDialog({
  projectId,
  inputs,
  onClose,
  onCreated,
}: {
  projectId: string;
  inputs: CalculationInputs;
  onClose: () => void;
  onCreated: (calc: CalculationDto) => void;
}) {
  const create = useCreateCalculation(projectId);
  const form = useFormik({
    initialValues: { title: '' },
    validationSchema: yup.object({
      title: yup
        .string()
        .trim()
        .required('Give the calc a title')
        .max(200, 'A title can be at most 200 characters'),
    }),
    onSubmit: async ({ title }) => {
      const calc = await create.mutateAsync({ title: title.trim(), inputs }).catch(() => null);
      if (calc) onCreated(calc);
    },
  });
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="new-calc-title">
      <form onSubmit={form.handleSubmit} noValidate>
        <DialogTitle id="new-calc-title">New calculation</DialogTitle>
        <DialogContent>
          <DialogContentText sx={{ mb: 2 }}>
            The draft starts from an example five-storey building; replace its storeys and spectrum
            with the project’s own.
          </DialogContentText>
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
