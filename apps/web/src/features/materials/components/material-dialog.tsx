import { MATERIAL_CONFIDENCES, materialInputSchema, type Material, type MaterialInput } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormNumberField } from '../../../components/form/form-number-field';
import { FormSelectField } from '../../../components/form/form-select-field';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRevalidateMaterials } from '../api/get-materials';
import { saveMaterial } from '../api/save-material';

const CONFIDENCE_OPTIONS = MATERIAL_CONFIDENCES.map((value) => ({
  value,
  label: value === 'firm' ? 'Firm — read in a published source' : 'From memory — to be checked',
}));

/** Adds a material (`material` null) or edits one. */
export function MaterialDialog({ material, onClose }: { material: Material | null; onClose: () => void }) {
  const notify = useNotify();
  const revalidate = useRevalidateMaterials();
  const { control, handleSubmit, setError, formState } = useForm<MaterialInput>({
    resolver: zodResolver(materialInputSchema),
    defaultValues: material
      ? {
          name: material.name,
          expansionPerK: material.expansionPerK,
          source: material.source,
          confidence: material.confidence,
        }
      : { name: '', source: '', confidence: 'firm' },
  });

  const onSubmit = handleSubmit(async (input) => {
    try {
      const saved = await saveMaterial(material?.id ?? null, input);
      void revalidate();
      notify(material ? `${saved.name} was saved.` : `${saved.name} was added.`);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['name', 'expansionPerK', 'source', 'confidence'] });
    }
  });

  return (
    <FormDialog
      open
      title={material ? `Edit ${material.name}` : 'Add material'}
      submitLabel={material ? 'Save' : 'Add'}
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <FormTextField control={control} name="name" label="Name" autoFocus autoComplete="off" />
      <FormNumberField
        control={control}
        name="expansionPerK"
        label="Expansion coefficient"
        unit="× 10⁻⁶/K"
        helperText="Linear coefficient near 20 °C, e.g. 11.5 for hardened steel."
      />
      <FormTextField
        control={control}
        name="source"
        label="Source"
        multiline
        helperText="Where the value was read: standard, handbook or maker's data sheet."
      />
      <FormSelectField control={control} name="confidence" label="Confidence" options={CONFIDENCE_OPTIONS} />
    </FormDialog>
  );
}
