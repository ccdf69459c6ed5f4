import { Alert, Box, Button, Stack, TextField } from '@mui/material';
import { PASSWORD_MIN_LENGTH } from '@tiermode/shared-types';
import { useFormik } from 'formik';
import * as yup from 'yup';
import { errorMessages } from '@/lib/api-client';
import { useSetPassword } from '../api/set-password';

const schema = yup.object({
  password: yup
    .string()
    .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`)
    .required('Choose a password'),
  confirm: yup
    .string()
    .oneOf([yup.ref('password')], 'The two passwords differ')
    .required('Type the password again'),
});

/** Choose a password with the one-time link from the account mail. */
export function SetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const save = useSetPassword();
  const formik = useFormik({
    initialValues: { password: '', confirm: '' },
    validationSchema: schema,
    onSubmit: async (values) => {
      await save.mutateAsync({ token, password: values.password }).then(onDone, () => undefined);
    },
  });
  const error = (name: 'password' | 'confirm') =>
    formik.touched[name] && formik.errors[name] ? formik.errors[name] : undefined;
  return (
    <Box
      component="form"
      noValidate
      onSubmit={formik.handleSubmit}
      aria-label="Choose your password"
    >
      <Stack spacing={2}>
        {save.isError && (
          <Alert severity="error" role="alert">
            {errorMessages(save.error).join(' ')}
          </Alert>
        )}
        <TextField
          id="password"
          name="password"
          label="New password"
          type="password"
          autoComplete="new-password"
          value={formik.values.password}
          onChange={formik.handleChange}
          onBlur={formik.handleBlur}
          error={Boolean(error('password'))}
          helperText={error('password') ?? 'At least 10 characters; common passwords are refused'}
        />
        <TextField
          id="confirm"
          name="confirm"
          label="The same again"
          type="password"
          autoComplete="new-password"
          value={formik.values.confirm}
          onChange={formik.handleChange}
          onBlur={formik.handleBlur}
          error={Boolean(error('confirm'))}
          helperText={error('confirm')}
        />
        <Button type="submit" variant="contained" disabled={formik.isSubmitting}>
          {formik.isSubmitting ? 'Saving…' : 'Save my password'}
        </Button>
      </Stack>
    </Box>
  );
}
