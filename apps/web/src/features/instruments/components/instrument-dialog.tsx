import {
  INSTRUMENT_KINDS,
  instrumentInputSchema,
  type DisplayUnit,
  type Instrument,
  type InstrumentInput,
} from '@evenset/contracts';
import { fromMillimetres } from '@evenset/metrology';
import { zodResolver } from '@hookform/resolvers/zod';
import Stack from '@mui/material/Stack';
import { useForm, useWatch } from 'react-hook-form';
import { useNotify } from '../../../components/feedback/notifications';
import { FormDialog } from '../../../components/form/form-dialog';
import { FormNumberField } from '../../../components/form/form-number-field';
import { FormSelectField } from '../../../components/form/form-select-field';
import { FormTextField } from '../../../components/form/form-text-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRevalidateInstruments } from '../api/get-instruments';
import { saveInstrument } from '../api/save-instrument';
import { INSTRUMENT_KIND_LABELS } from '../instrument-kinds';

const KIND_OPTIONS = INSTRUMENT_KINDS.map((value) => ({ value, label: INSTRUMENT_KIND_LABELS[value] }));

const UNIT_OPTIONS = [
  { value: 'in', label: 'Inch' },
  { value: 'mm', label: 'Millimetre' },
];

/** The resolution in `unit`, when it is a round figure there (0.0001 in, 0.001 mm), else null. */
function roundIn(mm: number, unit: DisplayUnit): number | null {
  const value = Number(fromMillimetres(mm, unit).toPrecision(10));
  return Number(value.toFixed(5)) === value ? value : null;
}

/** An instrument's values to edit, its resolution in the unit where it is a round figure. */
function valuesOf(instrument: Instrument | null, unit: DisplayUnit): Partial<InstrumentInput> {
  if (!instrument) return { code: '', kind: 'indicator', description: '', unit, calibrationDueOn: '' };
  const other: DisplayUnit = unit === 'in' ? 'mm' : 'in';
  const own = roundIn(instrument.resolution, unit);
  const shown = own === null && roundIn(instrument.resolution, other) !== null ? other : unit;
  return {
    code: instrument.code,
    kind: instrument.kind,
    description: instrument.description,
    unit: shown,
    resolution: Number(fromMillimetres(instrument.resolution, shown).toPrecision(10)),
    calibrationDueOn: instrument.calibrationDueOn,
  };
}

/** Adds an instrument (`instrument` null) or edits one; lengths in the person's unit. */
export function InstrumentDialog({
  instrument,
  unit,
  onClose,
}: {
  instrument: Instrument | null;
  unit: DisplayUnit;
  onClose: () => void;
}) {
  const notify = useNotify();
  const revalidate = useRevalidateInstruments();
  const { control, handleSubmit, setError, formState } = useForm<InstrumentInput>({
    resolver: zodResolver(instrumentInputSchema),
    defaultValues: valuesOf(instrument, unit),
  });
  const resolutionUnit = useWatch({ control, name: 'unit' });

  const onSubmit = handleSubmit(async (input) => {
    try {
      const saved = await saveInstrument(instrument?.id ?? null, input);
      void revalidate();
      notify(instrument ? `${saved.code} was saved.` : `${saved.code} was added.`);
      onClose();
    } catch (error) {
      applyServerErrors(error, setError, {
        fields: ['code', 'kind', 'description', 'resolution', 'calibrationDueOn'],
      });
    }
  });

  return (
    <FormDialog
      open
      title={instrument ? `Edit ${instrument.code}` : 'Add instrument'}
      submitLabel={instrument ? 'Save' : 'Add'}
      submitting={formState.isSubmitting}
      error={formState.errors.root?.server?.message}
      onClose={onClose}
      onSubmit={(event) => void onSubmit(event)}
    >
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <FormTextField control={control} name="code" label="Id code" autoFocus autoComplete="off" />
        <FormSelectField control={control} name="kind" label="Kind" options={KIND_OPTIONS} />
      </Stack>
      <FormTextField control={control} name="description" label="Description" autoComplete="off" />
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <FormNumberField
          control={control}
          name="resolution"
          label="Resolution"
          unit={resolutionUnit}
          helperText="The smallest step the instrument shows."
        />
        <FormSelectField control={control} name="unit" label="Resolution unit" options={UNIT_OPTIONS} />
      </Stack>
      <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
        <FormTextField
          control={control}
          name="calibrationDueOn"
          label="Calibration due"
          type="date"
          slotProps={{ inputLabel: { shrink: true } }}
          sx={{ maxWidth: { sm: '50%' } }}
        />
      </Stack>
    </FormDialog>
  );
}
