import { grindRequestStepSchema, type GrindRequestDetail, type GrindRequestStepInput } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Typography from '@mui/material/Typography';
import { useForm } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { recordGrindStep } from '../api/replacements';

interface MarkGroundDialogProps {
  request: GrindRequestDetail;
  onDone: () => Promise<unknown>;
  onClose: () => void;
}

/** The shop floor says the part was ground; the Bench then re-inspects it. */
export function MarkGroundDialog({ request, onDone, onClose }: MarkGroundDialogProps) {
  const notify = useNotify();
  const { control, handleSubmit, setError, formState } = useForm<GrindRequestStepInput>({
    resolver: zodResolver(grindRequestStepSchema),
    defaultValues: { status: 'ground', note: '' },
  });
  const onSubmit = handleSubmit(async (input) => {
    try {
      await recordGrindStep(request.id, { status: 'ground', ...(input.note ? { note: input.note } : {}) });
      await onDone();
      notify(`${request.requestNumber} is marked as ground. Re-inspect ${request.serial} at the Bench.`);
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['note'] });
    }
  });
  return (
    <FormDialog
      open
      title={`Mark ${request.serial} as ground`}
      submitLabel="Mark as ground"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <Typography>
        Record that {request.serial} was ground towards the target. Its height is known again only after it is
        re-inspected at the Bench.
      </Typography>
      <FormTextField control={control} name="note" label="Note (optional)" multiline minRows={2} />
    </FormDialog>
  );
}
