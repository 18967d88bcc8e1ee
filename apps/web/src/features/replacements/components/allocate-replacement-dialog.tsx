import {
  allocateReplacementSchema,
  type AllocateReplacementInput,
  type AllocatedReplacement,
  type DisplayUnit,
  type ReplacementCandidate,
} from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Typography from '@mui/material/Typography';
import { useForm } from 'react-hook-form';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { formatHeight } from '../../sets/set-format';
import { allocateReplacement } from '../api/replacements';

interface AllocateReplacementDialogProps {
  originalSetId: string;
  setNumber: string;
  customerName: string;
  part: ReplacementCandidate;
  unit: DisplayUnit;
  onDone: (made: AllocatedReplacement) => Promise<unknown>;
  onClose: () => void;
}

/** Sends one fitting part as a replacement: the only question is the customer's order reference. */
export function AllocateReplacementDialog(props: AllocateReplacementDialogProps) {
  const { originalSetId, setNumber, customerName, part, unit, onDone, onClose } = props;
  const { control, handleSubmit, setError, formState } = useForm<AllocateReplacementInput>({
    resolver: zodResolver(allocateReplacementSchema),
    defaultValues: { originalSetId, partId: part.id, orderReference: '' },
  });
  const onSubmit = handleSubmit(async (input) => {
    try {
      await onDone(await allocateReplacement(input));
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['orderReference'] });
    }
  });
  return (
    <FormDialog
      open
      title={`Use ${part.serial} as a replacement`}
      submitLabel="Allocate replacement"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <Typography>
        {part.serial} ({formatHeight(part.height, unit)}) goes to {customerName} as a replacement matching set{' '}
        {setNumber}. It gets its own set number and certificate.
      </Typography>
      <FormTextField
        control={control}
        name="orderReference"
        label="Customer's order reference"
        helperText="The order this replacement ships on; a new reference makes a new order for the customer."
        autoFocus
      />
    </FormDialog>
  );
}
