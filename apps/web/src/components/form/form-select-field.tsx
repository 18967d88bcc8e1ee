import MenuItem from '@mui/material/MenuItem';
import TextField, { type TextFieldProps } from '@mui/material/TextField';
import type { ReactNode } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';

export interface SelectOption {
  value: string;
  label: ReactNode;
  /** Shown in the closed field when the list item itself is long (e.g. a material with its source). */
  selectedLabel?: string;
}

type FormSelectFieldProps<T extends FieldValues> = Omit<
  TextFieldProps,
  'name' | 'value' | 'error' | 'onChange' | 'onBlur' | 'select' | 'children'
> & {
  name: Path<T>;
  control: Control<T>;
  options: readonly SelectOption[];
};

/** A drop-down list bound to react-hook-form. */
export function FormSelectField<T extends FieldValues>({
  name,
  control,
  options,
  helperText,
  slotProps,
  ...props
}: FormSelectFieldProps<T>) {
  const {
    field: { ref, ...field },
    fieldState: { error },
  } = useController({ name, control });
  return (
    <TextField
      {...props}
      {...field}
      select
      value={field.value ?? ''}
      inputRef={ref}
      error={Boolean(error)}
      helperText={error?.message ?? helperText}
      fullWidth
      slotProps={{
        ...slotProps,
        select: {
          renderValue: (selected) => {
            const option = options.find((o) => o.value === selected);
            return option ? (option.selectedLabel ?? option.label) : '';
          },
        },
      }}
    >
      {options.map((option) => (
        <MenuItem key={option.value} value={option.value}>
          {option.label}
        </MenuItem>
      ))}
    </TextField>
  );
}
