import { loginSchema, type LoginInput } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useForm } from 'react-hook-form';
import { FormTextField } from '../../../components/form/form-text-field';
import { ApiError } from '../../../lib/api-client';
import { applyServerErrors } from '../../../lib/form-errors';
import { useAuth } from '../hooks/use-auth';

/** E-mail and password; on success the sign-in page moves on by itself. */
export function SignInForm() {
  const { signIn } = useAuth();
  const { control, handleSubmit, setError, setFocus, formState } = useForm<LoginInput>({
    resolver: zodResolver(loginSchema),
    defaultValues: { email: '', password: '' },
  });
  const serverError = formState.errors.root?.server;

  const onSubmit = handleSubmit(async (input) => {
    try {
      await signIn(input);
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['email', 'password'] });
      // Back to the password, selected: retyping replaces it, a typo can still be fixed.
      if (error instanceof ApiError && error.status === 401) setFocus('password', { shouldSelect: true });
    }
  });

  return (
    <Stack component="form" noValidate spacing={2.5} onSubmit={(event) => void onSubmit(event)}>
      {serverError ? (
        <Alert severity={serverError.type === 'TOO_MANY_ATTEMPTS' ? 'warning' : 'error'}>{serverError.message}</Alert>
      ) : null}
      <FormTextField
        control={control}
        name="email"
        label="E-mail"
        type="email"
        autoComplete="username"
        autoFocus
        slotProps={{ htmlInput: { inputMode: 'email', autoCapitalize: 'none', spellCheck: false } }}
      />
      <FormTextField
        control={control}
        name="password"
        label="Password"
        type="password"
        autoComplete="current-password"
      />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting} fullWidth>
        Sign in
      </Button>
    </Stack>
  );
}
