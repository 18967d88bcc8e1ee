import { dispositionInputSchema, type DispositionInput, type DisplayUnit } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormNumberField } from '../../../components/form/form-number-field';
import { FormSelectField } from '../../../components/form/form-select-field';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { disposePart } from '../api/decide-part';
import { GrindingCautions } from './grinding-cautions';

const KINDS = [
  { value: 'rework', label: 'Rework — grind to a target height' },
  { value: 'scrap', label: 'Scrap' },
  { value: 'use-as-is', label: 'Use as is' },
];

interface DispositionDialogProps {
  partId: string;
  serial: string;
  unit: DisplayUnit;
  onDone: () => Promise<unknown>;
  onClose: () => void;
}

/** An engineer decides what happens to a part that failed: rework, scrap or use as is. */
export function DispositionDialog({ partId, serial, unit, onDone, onClose }: DispositionDialogProps) {
  const notify = useNotify();
  const { control, handleSubmit, setError, formState, resetField } = useForm<DispositionInput>({
    resolver: zodResolver(dispositionInputSchema),
    defaultValues: { kind: 'rework', unit },
  });
  const kind = useWatch({ control, name: 'kind' });
  // The fields of the other decisions are hidden: what was typed there is neither checked nor sent.
  useEffect(() => {
    resetField('targetHeight');
    resetField('reason');
  }, [kind, resetField]);
  const onSubmit = handleSubmit(async (input) => {
    try {
      const body: DispositionInput =
        input.kind === 'rework'
          ? { kind: 'rework', unit, targetHeight: input.targetHeight }
          : { kind: input.kind, reason: input.reason };
      await disposePart(partId, body);
      await onDone();
      notify(`The disposition of ${serial} was recorded.`);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['kind', 'targetHeight', 'reason'] });
    }
  });
  return (
    <FormDialog
      open
      title={`Disposition of ${serial}`}
      submitLabel="Record disposition"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <FormSelectField control={control} name="kind" label="Decision" options={KINDS} />
      {kind === 'rework' ? (
        <>
          <FormNumberField
            control={control}
            name="targetHeight"
            label="Target height"
            unit={unit}
            helperText="Leave empty for the middle of the band. The stock to remove and the passes follow."
          />
          <GrindingCautions />
        </>
      ) : (
        <FormTextField control={control} name="reason" label="Reason" multiline minRows={2} />
      )}
    </FormDialog>
  );
}
