import { newPasswordSchema, PASSWORD_MIN_LENGTH } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { confirmPasswordReset } from '../api/password-reset';

const newPasswordFormSchema = z
  .object({
    password: newPasswordSchema,
    repeat: z.string(),
  })
  .refine((form) => form.password === form.repeat, { path: ['repeat'], message: 'The two passwords differ.' });
type NewPasswordForm = z.infer<typeof newPasswordFormSchema>;

/** A new password for the account behind the e-mailed link. */
export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const { control, handleSubmit, setError, formState } = useForm<NewPasswordForm>({
    resolver: zodResolver(newPasswordFormSchema),
    defaultValues: { password: '', repeat: '' },
  });
  const serverError = formState.errors.root?.server;

  const onSubmit = handleSubmit(async ({ password }) => {
    try {
      await confirmPasswordReset({ token, password });
      onDone();
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['password'] });
    }
  });

  return (
    <Stack component="form" noValidate spacing={2.5} onSubmit={(event) => void onSubmit(event)}>
      {serverError ? (
        <Alert severity={serverError.type === 'TOO_MANY_ATTEMPTS' ? 'warning' : 'error'}>{serverError.message}</Alert>
      ) : null}
      <FormTextField
        control={control}
        name="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        autoFocus
        helperText={`At least ${PASSWORD_MIN_LENGTH} characters.`}
      />
      <FormTextField
        control={control}
        name="repeat"
        label="New password again"
        type="password"
        autoComplete="new-password"
      />
      <Button type="submit" variant="contained" size="large" loading={formState.isSubmitting} fullWidth>
        Set new password
      </Button>
    </Stack>
  );
}
