import { useFieldArray, type Control } from 'react-hook-form';
import { FormListError } from '../../../../components/form/form-list-error';
import { FormNumberField } from '../../../../components/form/form-number-field';
import { FormTextField } from '../../../../components/form/form-text-field';
import type { SpecFormValues } from '../../spec-values';
import { EditableRows } from './editable-rows';

const name = 'definition.plan.runoutCircles';

/** Runout circles around the part's axis: a name, a radius and the number of equally spaced positions. */
export function CircleTable({ control, unit }: { control: Control<SpecFormValues>; unit: string }) {
  const { fields, append, remove } = useFieldArray({ control, name });
  const label = (index: number, what: string) => ({
    htmlInput: { 'aria-label': `runout circle ${index + 1} ${what}` },
  });
  return (
    <EditableRows
      title="Runout circles"
      hint="Optional. Circles centred on the part's axis (0, 0); the indicator reads at equally spaced positions, the first on the +x axis."
      noun="runout circle"
      headers={['Name', `Radius (${unit})`, 'Positions']}
      rowKeys={fields.map((field) => field.id)}
      listError={<FormListError control={control} name={name} />}
      onAdd={() => append({ name: `R${fields.length + 1}`, radius: Number.NaN, positions: 8 })}
      onRemove={remove}
      renderCells={(index) => [
        <FormTextField
          key="name"
          control={control}
          name={`${name}.${index}.name`}
          size="small"
          autoComplete="off"
          slotProps={label(index, 'name')}
        />,
        <FormNumberField
          key="radius"
          control={control}
          name={`${name}.${index}.radius`}
          size="small"
          slotProps={label(index, 'radius')}
        />,
        <FormNumberField
          key="positions"
          control={control}
          name={`${name}.${index}.positions`}
          size="small"
          slotProps={label(index, 'positions')}
        />,
      ]}
    />
  );
}
