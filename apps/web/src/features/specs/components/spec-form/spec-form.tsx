import { createSpecSchema, type CreateSpecInput, type Material, type Spec } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import { zodResolver } from '@hookform/resolvers/zod';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import { useForm, useWatch } from 'react-hook-form';
import { SectionCard } from '../../../../components/display/section-card';
import { materialOptions } from '../../../../components/display/material-options';
import { UNIT_SYMBOLS } from '../../../../components/data-grid/length-column';
import { FieldGrid } from '../../../../components/form/field-grid';
import { FormNumberField } from '../../../../components/form/form-number-field';
import { FormSelectField } from '../../../../components/form/form-select-field';
import { FormTextField } from '../../../../components/form/form-text-field';
import { applyServerErrors } from '../../../../lib/form-errors';
import { createSpec, updateSpec } from '../../api/save-spec';
import type { SpecFormValues } from '../../spec-values';
import { GrindingFields } from './grinding-fields';
import { PlanEditor } from './plan-editor';
import { RuleFields } from './rule-fields';

const UNIT_OPTIONS = [
  { value: 'in', label: 'Inch' },
  { value: 'mm', label: 'Millimetre' },
];

interface SpecFormProps {
  /** The draft being edited; absent for a new part number. */
  spec?: Spec | undefined;
  defaultValues: SpecFormValues;
  materials: readonly Material[];
  onSaved: (spec: Spec) => void;
  onCancel: () => void;
}

/** Every decision of one spec revision, with the measurement plan drawn as it is typed. */
export function SpecForm({ spec, defaultValues, materials, onSaved, onCancel }: SpecFormProps) {
  const { control, handleSubmit, setError, setValue, formState } = useForm<SpecFormValues, unknown, CreateSpecInput>({
    resolver: zodResolver(createSpecSchema),
    defaultValues,
  });
  const unit = UNIT_SYMBOLS[useWatch({ control, name: 'definition.displayUnit' })];

  const onSubmit = handleSubmit(async ({ partNumber, definition }) => {
    // Every length of the form is in the unit the engineer chose for the part.
    const sent = { ...definition, unit: definition.displayUnit };
    try {
      onSaved(spec ? await updateSpec(spec.id, sent) : await createSpec({ partNumber, definition: sent }));
    } catch (error) {
      applyServerErrors(error, setError, {
        fields: ['partNumber', 'definition'],
        exactPaths: true,
        codes: { SPEC_PART_NUMBER_TAKEN: 'partNumber' },
      });
    }
  });

  const hasProblems = formState.submitCount > 0 && Object.keys(formState.errors).length > 0;
  const driftDefault = spec ? formatLength(spec.effectiveMasterDriftLimit, spec.definition.displayUnit) : null;

  return (
    <Stack component="form" noValidate spacing={3} onSubmit={(event) => void onSubmit(event)}>
      {formState.errors.root?.server ? <Alert severity="error">{formState.errors.root.server.message}</Alert> : null}
      {hasProblems && !formState.errors.root?.server ? (
        <Alert severity="error">Some entries need attention; each problem is marked where it is.</Alert>
      ) : null}
      <SectionCard title="Identification">
        <FieldGrid min={240}>
          <FormTextField
            control={control}
            name="partNumber"
            label="Part number"
            disabled={spec !== undefined}
            autoComplete="off"
            helperText={spec ? `Revision ${spec.revision}` : 'e.g. RB-40; the first revision is A.'}
          />
          <FormTextField control={control} name="definition.title" label="Title" autoComplete="off" />
          <FormSelectField
            control={control}
            name="definition.displayUnit"
            label="Unit"
            options={UNIT_OPTIONS}
            helperText="Every length on this page is in this unit."
          />
          <FormSelectField
            control={control}
            name="definition.materialId"
            label="Material"
            options={materialOptions(materials)}
            helperText="Its expansion coefficient corrects heights to 20 °C."
          />
        </FieldGrid>
      </SectionCard>
      <SectionCard
        title="Height and matching"
        description="Deviations are signed: lower −0.0004 and upper +0.0000 for a band below nominal."
      >
        <FieldGrid>
          <FormNumberField control={control} name="definition.nominal" label="Nominal height" unit={unit} />
          <FormNumberField control={control} name="definition.band.lower" label="Lower deviation" unit={unit} />
          <FormNumberField control={control} name="definition.band.upper" label="Upper deviation" unit={unit} />
          <FormNumberField
            control={control}
            name="definition.matchingBand"
            label="Matching band"
            unit={unit}
            helperText="Largest height spread within a set."
          />
          <FormNumberField
            control={control}
            name="definition.setSize"
            label="Set size"
            helperText="Parts per matched set."
          />
        </FieldGrid>
      </SectionCard>
      <SectionCard title="Form limits" description="Optional. Leave a limit empty when it is not checked.">
        <FieldGrid>
          <FormNumberField control={control} name="definition.flatness" label="Flatness" unit={unit} empty={null} />
          <FormNumberField
            control={control}
            name="definition.parallelism"
            label="Parallelism"
            unit={unit}
            empty={null}
          />
          <FormNumberField control={control} name="definition.runout" label="Runout" unit={unit} empty={null} />
        </FieldGrid>
      </SectionCard>
      <SectionCard title="Height and decision">
        <RuleFields control={control} setValue={setValue} />
      </SectionCard>
      <SectionCard
        title="Measurement plan"
        description="Positions on the face seen from above, from the part's axis; the drawing follows as you type."
      >
        <PlanEditor control={control} unit={unit} />
      </SectionCard>
      <SectionCard title="Master check">
        <FieldGrid>
          <FormNumberField
            control={control}
            name="definition.masterDriftLimit"
            label="Drift limit"
            unit={unit}
            empty={null}
            helperText={
              driftDefault
                ? `Largest drift between the master checks before and after a run. Empty: ${driftDefault}.`
                : 'Largest drift between the master checks before and after a run. Empty: the shop default.'
            }
          />
        </FieldGrid>
      </SectionCard>
      <SectionCard
        title="Grinding parameters"
        description="Optional. Used to suggest passes when a part goes back for rework."
      >
        <GrindingFields control={control} setValue={setValue} unit={unit} />
      </SectionCard>
      <Paper
        variant="outlined"
        sx={{ position: 'sticky', bottom: 0, zIndex: 2, p: 1.5, display: 'flex', justifyContent: 'flex-end', gap: 1.5 }}
      >
        <Button onClick={onCancel} disabled={formState.isSubmitting}>
          Cancel
        </Button>
        <Button type="submit" variant="contained" loading={formState.isSubmitting}>
          {spec ? 'Save draft' : 'Create draft'}
        </Button>
      </Paper>
    </Stack>
  );
}
