import type { User } from '@evenset/contracts';
import Typography from '@mui/material/Typography';
import { useForm } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRevalidateUsers } from '../api/get-users';
import { setAccountActive } from '../api/set-account-active';

const WORDING = {
  deactivate: {
    title: (name: string) => `Deactivate ${name}?`,
    text: (name: string) =>
      `${name} will no longer be able to sign in. Everything they recorded stays as it is, and you can reactivate the account later.`,
    submit: 'Deactivate',
    done: (name: string) => `${name} was deactivated and can no longer sign in.`,
  },
  reactivate: {
    title: (name: string) => `Reactivate ${name}?`,
    text: (name: string) => `${name} will be able to sign in again, with the same roles and password as before.`,
    submit: 'Reactivate',
    done: (name: string) => `${name} was reactivated and can sign in again.`,
  },
} as const;

/** Asks before switching an account off or on, naming the person so nobody picks the wrong row. */
export function ConfirmAccountDialog({ person, onClose }: { person: User; onClose: () => void }) {
  const notify = useNotify();
  const revalidateUsers = useRevalidateUsers();
  const { handleSubmit, setError, formState } = useForm();
  const wording = person.active ? WORDING.deactivate : WORDING.reactivate;

  const onSubmit = handleSubmit(async () => {
    try {
      await setAccountActive(person.id, !person.active);
      void revalidateUsers();
      notify(wording.done(person.displayName));
      onClose();
    } catch (error) {
      // e.g. the server refuses to let admins deactivate themselves; its message says so.
      applyServerErrors(error, setError, { fields: [] });
    }
  });

  return (
    <FormDialog
      open
      title={wording.title(person.displayName)}
      submitLabel={wording.submit}
      destructive={person.active}
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <Typography>{wording.text(person.displayName)}</Typography>
    </FormDialog>
  );
}
