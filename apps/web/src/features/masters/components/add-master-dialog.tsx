import { createMasterSchema, type CreateMasterInput, type DisplayUnit, type Material } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { materialOptions } from '../../../components/display/material-options';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormNumberField } from '../../../components/form/form-number-field';
import { FormSelectField } from '../../../components/form/form-select-field';
import { FormTextField } from '../../../components/form/form-text-field';
import { paths } from '../../../config/paths';
import { applyServerErrors } from '../../../lib/form-errors';
import { createMaster } from '../api/create-master';
import { useRevalidateMasters } from '../api/get-masters';

interface AddMasterDialogProps {
  unit: DisplayUnit;
  materials: readonly Material[];
  onClose: () => void;
}

/** A new master gauge; its calibration is recorded next, on its own page. */
export function AddMasterDialog({ unit, materials, onClose }: AddMasterDialogProps) {
  const notify = useNotify();
  const navigate = useNavigate();
  const revalidate = useRevalidateMasters();
  const { control, handleSubmit, setError, formState } = useForm<CreateMasterInput>({
    resolver: zodResolver(createMasterSchema),
    defaultValues: { code: '', description: '', unit, materialId: '' },
  });

  const onSubmit = handleSubmit(async (input) => {
    try {
      const master = await createMaster(input);
      void revalidate();
      notify(`${master.code} was added. Record its calibration next.`);
      void navigate(paths.master.getHref(master.id));
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['code', 'description', 'nominal', 'materialId'] });
    }
  });

  return (
    <FormDialog
      open
      title="Add master gauge"
      submitLabel="Add"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <FormTextField
        control={control}
        name="code"
        label="Id code"
        autoFocus
        autoComplete="off"
        helperText="e.g. MG-1.500-B"
      />
      <FormTextField control={control} name="description" label="Description" autoComplete="off" />
      <FormNumberField control={control} name="nominal" label="Nominal size" unit={unit} />
      <FormSelectField control={control} name="materialId" label="Material" options={materialOptions(materials)} />
    </FormDialog>
  );
}
