import { useEffect } from 'react';
import { useWatch, type Control, type UseFormSetValue } from 'react-hook-form';
import { FieldGrid } from '../../../../components/form/field-grid';
import { FormRadioGroup, type RadioChoice } from '../../../../components/form/form-radio-group';
import { FormSelectField } from '../../../../components/form/form-select-field';
import type { SpecFormValues } from '../../spec-values';

const HEIGHT_CHOICES: readonly RadioChoice[] = [
  { value: 'mean', label: 'Mean', description: 'The part height is the average of all top-face station heights.' },
  {
    value: 'highest',
    label: 'Highest',
    description: 'The part height is the highest station: the point a mating part sits on.',
  },
  {
    value: 'station',
    label: 'One named station',
    description: 'The part height is the height at one station you choose.',
  },
];

const DECISION_CHOICES: readonly RadioChoice[] = [
  {
    value: 'simple',
    label: 'Simple acceptance',
    description: 'A part conforms when its measured value is inside the band, whatever the uncertainty.',
  },
  {
    value: 'guarded',
    label: 'Guarded acceptance',
    description:
      'A part conforms only when its value is inside the band shrunk by the expanded uncertainty; parts in between are shown as in the guard band.',
  },
];

interface RuleFieldsProps {
  control: Control<SpecFormValues>;
  setValue: UseFormSetValue<SpecFormValues>;
}

/** Which statistic is the part's height, and how conformance is decided. */
export function RuleFields({ control, setValue }: RuleFieldsProps) {
  const statistic = useWatch({ control, name: 'definition.heightStatistic' });
  const stations = useWatch({ control, name: 'definition.plan.stations' });
  useEffect(() => {
    // A height station belongs only to the "one named station" choice.
    if (statistic !== 'station') setValue('definition.heightStation', null);
  }, [statistic, setValue]);
  const names = [...new Set(stations.map((s) => s.name.trim()).filter((n) => n !== ''))];
  return (
    <FieldGrid min={320}>
      <div>
        <FormRadioGroup
          control={control}
          name="definition.heightStatistic"
          label="Part height"
          choices={HEIGHT_CHOICES}
        />
        {statistic === 'station' ? (
          <FormSelectField
            control={control}
            name="definition.heightStation"
            label="Height station"
            options={names.map((n) => ({ value: n, label: n }))}
            helperText={names.length === 0 ? 'Add top-face stations first.' : undefined}
            sx={{ mt: 1, maxWidth: 240 }}
          />
        ) : null}
      </div>
      <FormRadioGroup
        control={control}
        name="definition.decisionRule"
        label="Decision rule"
        choices={DECISION_CHOICES}
      />
    </FieldGrid>
  );
}
