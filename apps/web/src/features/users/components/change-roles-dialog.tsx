import { changeRolesSchema, type ChangeRolesInput, type User } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { applyServerErrors } from '../../../lib/form-errors';
import { roleList } from '../../../lib/roles';
import { changeRoles } from '../api/change-roles';
import { useRevalidateUsers } from '../api/get-users';
import { RoleCheckboxes } from './role-checkboxes';

export function ChangeRolesDialog({ person, onClose }: { person: User; onClose: () => void }) {
  const notify = useNotify();
  const revalidateUsers = useRevalidateUsers();
  const { control, handleSubmit, setError, formState } = useForm<ChangeRolesInput>({
    resolver: zodResolver(changeRolesSchema),
    defaultValues: { roles: person.roles },
  });

  const onSubmit = handleSubmit(async (input) => {
    try {
      const updated = await changeRoles(person.id, input);
      void revalidateUsers();
      notify(`${updated.displayName} now holds: ${roleList(updated.roles)}.`);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['roles'] });
    }
  });

  return (
    <FormDialog
      open
      title={`Change roles of ${person.displayName}`}
      submitLabel="Save roles"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
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
    </FormDialog>
  );
}
