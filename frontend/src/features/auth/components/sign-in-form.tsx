import { Alert, Box, Button, Stack, TextField } from '@mui/material';
import type { LoginResponse } from '@tiermode/shared-types';
import { useFormik } from 'formik';
import * as yup from 'yup';
import { errorMessages } from '@/lib/api-client';
import { useLogin } from '../api/login';

const schema = yup.object({
  email: yup
    .string()
    .trim()
    .email('Enter a valid email address')
    .required('Enter your email address'),
  password: yup.string().required('Enter your password'),
});

interface SignInFormProps {
  onSignedIn: (response: LoginResponse) => void;
}

export function SignInForm({ onSignedIn }: SignInFormProps) {
  const signIn = useLogin();
  const formik = useFormik({
    initialValues: { email: '', password: '' },
    validationSchema: schema,
    onSubmit: async (values) => {
      // A refusal is shown from the mutation's error state; the typed values stay.
      await signIn
        .mutateAsync({ email: values.email.trim(), password: values.password })
        .then(onSignedIn, () => undefined);
    },
  });
  const fieldError = (name: 'email' | 'password') =>
    formik.touched[name] && formik.errors[name] ? formik.errors[name] : undefined;

  return (
    <Box component="form" noValidate onSubmit={formik.handleSubmit} aria-label="Sign in">
      <Stack spacing={2}>
        {signIn.isError && (
          <Alert severity="error" role="alert">
            {errorMessages(signIn.error).join(' ')}
          </Alert>
        )}
        <TextField
          id="email"
          name="email"
          label="Email"
          type="email"
          autoComplete="username"
          autoFocus
          value={formik.values.email}
          onChange={formik.handleChange}
          onBlur={formik.handleBlur}
          error={Boolean(fieldError('email'))}
          helperText={fieldError('email')}
        />
        <TextField
          id="password"
          name="password"
          label="Password"
          type="password"
          autoComplete="current-password"
          value={formik.values.password}
          onChange={formik.handleChange}
          onBlur={formik.handleBlur}
          error={Boolean(fieldError('password'))}
          helperText={fieldError('password')}
        />
        <Button type="submit" variant="contained" size="large" disabled={formik.isSubmitting}>
          {formik.isSubmitting ? 'Signing in…' : 'Sign in'}
        </Button>
      </Stack>
    </Box>
  );
}
