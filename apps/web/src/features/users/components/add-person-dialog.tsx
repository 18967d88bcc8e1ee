import { createUserSchema, type CreateUserInput } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { createUser } from '../api/create-user';
import { useRevalidateUsers } from '../api/get-users';
import { RoleCheckboxes } from './role-checkboxes';

export function AddPersonDialog({ onClose }: { onClose: () => void }) {
  const notify = useNotify();
  const revalidateUsers = useRevalidateUsers();
  const { control, handleSubmit, setError, formState } = useForm<CreateUserInput>({
    resolver: zodResolver(createUserSchema),
    defaultValues: { email: '', displayName: '', roles: [], password: '' },
  });

  const onSubmit = handleSubmit(async (input) => {
    try {
      const person = await createUser(input);
      void revalidateUsers();
      notify(`${person.displayName} was added and can sign in now.`);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, {
        fields: ['email', 'displayName', 'roles', 'password'],
        codes: { USER_EMAIL_TAKEN: 'email' },
      });
    }
  });

  return (
    <FormDialog
      open
      title="Add person"
      submitLabel="Create"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <FormTextField control={control} name="email" label="E-mail" type="email" autoComplete="off" autoFocus />
      <FormTextField
        control={control}
        name="displayName"
        label="Name"
        autoComplete="off"
        helperText="As it should appear on records and certificates."
      />
      <Controller
        control={control}
        name="roles"
        render={({ field, fieldState }) => (
          <RoleCheckboxes
            value={field.value}
            onChange={field.onChange}
            error={fieldState.error?.message}
            inputRef={field.ref}
          />
        )}
      />
      <FormTextField
        control={control}
        name="password"
        label="Password"
        type="password"
        autoComplete="new-password"
        helperText="At least 10 characters. Give it to the person privately."
      />
    </FormDialog>
  );
}
