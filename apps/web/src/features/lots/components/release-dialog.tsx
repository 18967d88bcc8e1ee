import { releaseInputSchema, type ReleaseInput } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Typography from '@mui/material/Typography';
import { useForm } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { releasePart } from '../api/decide-part';

interface ReleaseDialogProps {
  partId: string;
  serial: string;
  onDone: () => Promise<unknown>;
  onClose: () => void;
}

/** Releases a conforming part (or one used as is) for sets and sale. */
export function ReleaseDialog({ partId, serial, onDone, onClose }: ReleaseDialogProps) {
  const notify = useNotify();
  const { control, handleSubmit, setError, formState } = useForm<ReleaseInput>({
    resolver: zodResolver(releaseInputSchema),
    defaultValues: { note: '' },
  });
  const onSubmit = handleSubmit(async (input) => {
    try {
      await releasePart(partId, input.note ? input : {});
      await onDone();
      notify(`${serial} was released.`);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['note'] });
    }
  });
  return (
    <FormDialog
      open
      title={`Release ${serial}?`}
      submitLabel="Release"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <Typography>A released part can be built into sets and sold.</Typography>
      <FormTextField control={control} name="note" label="Note (optional)" />
    </FormDialog>
  );
}
