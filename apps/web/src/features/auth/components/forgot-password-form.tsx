import { passwordResetRequestSchema, type PasswordResetRequestInput } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { requestPasswordReset } from '../api/password-reset';

/** Asks for a reset link; afterwards says only what the server says, for any address. */
export function ForgotPasswordForm() {
  const [answer, setAnswer] = useState<string | null>(null);
  const { control, handleSubmit, setError, formState } = useForm<PasswordResetRequestInput>({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: '' },
  });
  const serverError = formState.errors.root?.server;

  const onSubmit = handleSubmit(async (input) => {
    try {
      setAnswer(await requestPasswordReset(input));
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['email'] });
    }
  });

  if (answer)
    return (
      <Alert severity="success" role="status">
        {answer} It works for 30 minutes. Check your spam folder if it does not arrive.
      </Alert>
    );

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
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting} fullWidth>
        Send me a reset link
      </Button>
    </Stack>
  );
}
