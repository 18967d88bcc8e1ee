import { resetPasswordSchema, type ResetPasswordInput, type User } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Typography from '@mui/material/Typography';
import { useForm } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { setPassword } from '../api/set-password';

export function SetPasswordDialog({ person, onClose }: { person: User; onClose: () => void }) {
  const notify = useNotify();
  const { control, handleSubmit, setError, formState } = useForm<ResetPasswordInput>({
    resolver: zodResolver(resetPasswordSchema),
    defaultValues: { password: '' },
  });

  const onSubmit = handleSubmit(async (input) => {
    try {
      await setPassword(person.id, input);
      notify(`New password set for ${person.displayName}.`);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['password'] });
    }
  });

  return (
    <FormDialog
      open
      title={`Set a new password for ${person.displayName}`}
      submitLabel="Set password"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <Typography sx={{ color: 'text.secondary' }}>
        The current password stops working at once. Give the new one to {person.displayName} privately.
      </Typography>
      <FormTextField
        control={control}
        name="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        autoFocus
        helperText="At least 10 characters."
      />
    </FormDialog>
  );
}
