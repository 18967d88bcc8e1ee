import { retireSchema, type RetireInput } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Typography from '@mui/material/Typography';
import { useForm } from 'react-hook-form';
import { applyServerErrors } from '../../lib/form-errors';
import { useNotify } from '../feedback/notifications';
import { FormDialog } from './form-dialog';
import { FormTextField } from './form-text-field';

interface ReasonDialogProps {
  title: string;
  text: string;
  submitLabel: string;
  /** Said when the action succeeded. */
  done: string;
  onConfirm: (input: RetireInput) => Promise<unknown>;
  onClose: () => void;
}

/** An action that takes something out of use and must say why, e.g. retiring a gauge. */
export function ReasonDialog({ title, text, submitLabel, done, onConfirm, onClose }: ReasonDialogProps) {
  const notify = useNotify();
  const { control, handleSubmit, setError, formState } = useForm<RetireInput>({
    resolver: zodResolver(retireSchema),
    defaultValues: { reason: '' },
  });
  const onSubmit = handleSubmit(async (input) => {
    try {
      await onConfirm(input);
      notify(done);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['reason'] });
    }
  });
  return (
    <FormDialog
      open
      title={title}
      submitLabel={submitLabel}
      destructive
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <Typography>{text}</Typography>
      <FormTextField control={control} name="reason" label="Reason" multiline minRows={2} autoFocus />
    </FormDialog>
  );
}
