import { useFieldArray, type Control } from 'react-hook-form';
import { FormListError } from '../../../../components/form/form-list-error';
import { FormNumberField } from '../../../../components/form/form-number-field';
import { FormTextField } from '../../../../components/form/form-text-field';
import type { SpecFormValues } from '../../spec-values';
import { EditableRows } from './editable-rows';

interface StationTableProps {
  control: Control<SpecFormValues>;
  list: 'stations' | 'datumStations';
  title: string;
  hint: string;
  unit: string;
  /** Name proposed for a new row, e.g. "A", "B", … or "D1", "D2", … */
  nextName: (count: number) => string;
}

/** An editable list of named stations with x/y positions on a face. */
export function StationTable({ control, list, title, hint, unit, nextName }: StationTableProps) {
  const name = `definition.plan.${list}` as const;
  const { fields, append, remove } = useFieldArray({ control, name });
  const noun = list === 'stations' ? 'station' : 'datum station';
  const label = (index: number, what: string) => ({ htmlInput: { 'aria-label': `${noun} ${index + 1} ${what}` } });
  return (
    <EditableRows
      title={title}
      hint={hint}
      noun={noun}
      headers={['Name', `x (${unit})`, `y (${unit})`]}
      rowKeys={fields.map((field) => field.id)}
      listError={<FormListError control={control} name={name} />}
      onAdd={() => append({ name: nextName(fields.length), x: Number.NaN, y: Number.NaN })}
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
          key="x"
          control={control}
          name={`${name}.${index}.x`}
          size="small"
          slotProps={label(index, 'x')}
        />,
        <FormNumberField
          key="y"
          control={control}
          name={`${name}.${index}.y`}
          size="small"
          slotProps={label(index, 'y')}
        />,
      ]}
    />
  );
}
