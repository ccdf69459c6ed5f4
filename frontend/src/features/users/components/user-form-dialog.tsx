import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  FormControlLabel,
  MenuItem,
  Stack,
  Switch,
  TextField,
} from '@mui/material';
import { ROLES, ROLE_LABELS, type UserDto } from '@tiermode/shared-types';
import { useFormik } from 'formik';
import { errorMessages } from '@/lib/api-client';
import { useCreateUser } from '../api/create-user';
import { useUpdateUser } from '../api/update-user';
import {
  initialValues,
  toCreateRequest,
  toUpdateRequest,
  userFormSchema,
  type UserFormValues,
} from './user-form';

interface UserFormDialogProps {
  /** The person to edit; absent to add a new one. */
  user?: UserDto;
  onClose: () => void;
}

/** Add or edit a person. A refused save keeps every value typed and shows the server's reasons. */
export function UserFormDialog({ user, onClose }: UserFormDialogProps) {
  const create = useCreateUser();
  const update = useUpdateUser();
  const saving = user ? update : create;
  const formik = useFormik<UserFormValues>({
    initialValues: initialValues(user),
    validationSchema: userFormSchema(!user),
    onSubmit: async (values) => {
      // A refusal is shown from the mutation's error state; the dialog keeps every value.
      const saved = user
        ? update.mutateAsync({ id: user.id, body: toUpdateRequest(user, values) })
        : create.mutateAsync(toCreateRequest(values));
      await saved.then(onClose, () => undefined);
    },
  });
  const field = (name: keyof UserFormValues) => ({
    id: `user-${name}`,
    name,
    value: formik.values[name],
    onChange: formik.handleChange,
    onBlur: formik.handleBlur,
    error: Boolean(formik.touched[name] && formik.errors[name]),
    helperText: formik.touched[name] ? formik.errors[name] : undefined,
  });

  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="user-dialog-title">
      <form noValidate onSubmit={formik.handleSubmit}>
        <DialogTitle id="user-dialog-title">
          {user ? `Edit ${user.name}` : 'Add a person'}
        </DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ mt: 1 }}>
            {saving.isError && (
              <Alert severity="error" role="alert">
                {errorMessages(saving.error).map((m) => (
                  <div key={m}>{m}</div>
                ))}
              </Alert>
            )}
            <TextField label="Name" autoFocus {...field('name')} />
            <TextField label="Email" type="email" {...field('email')} />
            <TextField select label="Role" {...field('role')}>
              {ROLES.map((role) => (
                <MenuItem key={role} value={role}>
                  {ROLE_LABELS[role]}
                </MenuItem>
              ))}
            </TextField>
            <TextField
              label={user ? 'New password (leave blank to keep)' : 'First password'}
              type="password"
              autoComplete="new-password"
              {...field('password')}
              helperText={
                (formik.touched.password && formik.errors.password) ||
                'At least 10 characters; common passwords are refused'
              }
            />
            {formik.values.role === 'reviewer' && (
              <>
                <TextField label="Licence number" {...field('licenseNumber')} />
                <TextField label="Licence jurisdiction" {...field('licenseJurisdiction')} />
                <TextField
                  label="Licence valid through"
                  type="date"
                  slotProps={{ inputLabel: { shrink: true } }}
                  {...field('licenseExpiresOn')}
                />
              </>
            )}
            {user && (
              <FormControlLabel
                control={
                  <Switch
                    name="active"
                    checked={formik.values.active}
                    onChange={formik.handleChange}
                  />
                }
                label={formik.values.active ? 'Active' : 'Deactivated: cannot sign in'}
              />
            )}
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={formik.isSubmitting}>
            {formik.isSubmitting ? 'Saving…' : 'Save'}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
