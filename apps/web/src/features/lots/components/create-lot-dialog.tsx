import { createLotSchema, serialPatternSchema, type Spec } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import { useForm, useWatch } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { z } from 'zod';
import { useNotify } from '../../../components/feedback/notifications';
import { FieldGrid } from '../../../components/form/field-grid';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormNumberField } from '../../../components/form/form-number-field';
import { FormSelectField } from '../../../components/form/form-select-field';
import { FormTextField } from '../../../components/form/form-text-field';
import { paths } from '../../../config/paths';
import { applyServerErrors } from '../../../lib/form-errors';
import { createLot, createParts } from '../api/create-lot';
import { useRevalidateLots } from '../api/get-lots';
import { serialPreviewText, serialsOf } from '../serial-pattern';

const pattern = serialPatternSchema.shape;
const lotFormSchema = createLotSchema
  .extend({ prefix: pattern.prefix, start: pattern.start, digits: pattern.digits })
  .superRefine((form, ctx) => {
    if (String(form.start + form.quantity - 1).length > form.digits)
      ctx.addIssue({ code: 'custom', path: ['digits'], message: 'The last serial needs more digits than this.' });
  });
type LotForm = z.infer<typeof lotFormSchema>;

const today = new Date().toISOString().slice(0, 10);

/** A new lot of a released spec revision, with its parts' serials made from a pattern. */
export function CreateLotDialog({ specs, onClose }: { specs: readonly Spec[]; onClose: () => void }) {
  const notify = useNotify();
  const navigate = useNavigate();
  const revalidate = useRevalidateLots();
  const { control, handleSubmit, setError, formState } = useForm<LotForm>({
    resolver: zodResolver(lotFormSchema),
    defaultValues: { lotNumber: '', specId: '', grindDate: today, notes: '', prefix: '', start: 1, digits: 3 },
  });
  const [prefix, start, digits, quantity] = useWatch({ control, name: ['prefix', 'start', 'digits', 'quantity'] });
  const previewable = [start, digits, quantity].every((n) => Number.isInteger(n)) && quantity > 0 && quantity <= 1000;
  const preview = previewable ? serialPreviewText(serialsOf(prefix, start, quantity, digits)) : null;

  const onSubmit = handleSubmit(async ({ prefix: p, start: s, digits: d, ...lotInput }) => {
    try {
      const lot = await createLot(lotInput);
      await createParts(lot.id, { prefix: p, start: s, digits: d, count: lotInput.quantity });
      void revalidate();
      notify(`Lot ${lot.lotNumber} was created with ${lotInput.quantity} parts.`);
      void navigate(paths.lot.getHref(lot.id));
    } catch (error) {
      applyServerErrors(error, setError, { fields: ['lotNumber', 'specId', 'quantity', 'grindDate', 'notes'] });
    }
  });

  return (
    <FormDialog
      open
      title="New lot"
      submitLabel="Create lot"
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <FormSelectField
        control={control}
        name="specId"
        label="Spec revision"
        helperText="Released revisions only."
        options={specs.map((spec) => ({
          value: spec.id,
          label: `${spec.partNumber} rev ${spec.revision} — ${spec.definition.title}`,
        }))}
      />
      <FieldGrid>
        <FormTextField
          control={control}
          name="lotNumber"
          label="Lot number"
          autoComplete="off"
          helperText="e.g. L-2026-041"
        />
        <FormNumberField control={control} name="quantity" label="Quantity" />
        <FormTextField
          control={control}
          name="grindDate"
          label="Grind date"
          type="date"
          slotProps={{ inputLabel: { shrink: true } }}
        />
      </FieldGrid>
      <FieldGrid>
        <FormTextField
          control={control}
          name="prefix"
          label="Serial prefix"
          autoComplete="off"
          helperText="e.g. RB40-"
        />
        <FormNumberField control={control} name="start" label="First number" />
        <FormNumberField control={control} name="digits" label="Digits" />
      </FieldGrid>
      {preview ? <Alert severity="info">Serials: {preview}</Alert> : null}
      <FormTextField control={control} name="notes" label="Notes" multiline minRows={2} />
    </FormDialog>
  );
}
