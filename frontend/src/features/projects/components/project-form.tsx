import { MenuItem, Stack, TextField } from '@mui/material';
import { CODE_BASES, CODE_BASIS_LABELS } from '@tiermode/shared-types';
import type { FormikProps } from 'formik';
import type { ProjectFormValues } from './project-schema';

/** The fields of a project, shared by the create dialog and the project page. */
export function ProjectFields({
  form,
  readOnly = false,
}: {
  form: FormikProps<ProjectFormValues>;
  readOnly?: boolean;
}) {
  const field = (name: keyof ProjectFormValues) => ({
    name,
    value: form.values[name],
    onChange: form.handleChange,
    onBlur: form.handleBlur,
    error: Boolean(form.touched[name] && form.errors[name]),
    helperText: form.touched[name] && form.errors[name],
    slotProps: { htmlInput: { readOnly } },
  });
  return (
    <Stack spacing={2}>
      <TextField label="Name" {...field('name')} />
      <TextField label="Site" multiline minRows={2} {...field('site')} />
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <TextField
          select
          label="Code basis"
          sx={{ minWidth: 220 }}
          {...field('codeBasis')}
          disabled={readOnly}
        >
          {CODE_BASES.map((code) => (
            <MenuItem key={code} value={code}>
              {CODE_BASIS_LABELS[code]}
            </MenuItem>
          ))}
        </TextField>
        <TextField
          label="Structural system"
          placeholder="e.g. Reinforced concrete walls"
          sx={{ flex: 1 }}
          {...field('structuralSystem')}
        />
      </Stack>
    </Stack>
  );
}
