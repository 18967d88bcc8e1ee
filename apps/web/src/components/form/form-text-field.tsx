import TextField, { type TextFieldProps } from '@mui/material/TextField';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';

type FormTextFieldProps<T extends FieldValues> = Omit<
  TextFieldProps,
  'name' | 'value' | 'error' | 'onChange' | 'onBlur'
> & {
  name: Path<T>;
  control: Control<T>;
};

/** A text field bound to react-hook-form: the field's message replaces the helper text. */
export function FormTextField<T extends FieldValues>({ name, control, helperText, ...props }: FormTextFieldProps<T>) {
  const {
    field: { ref, ...field },
    fieldState: { error },
  } = useController({ name, control });
  return (
    <TextField
      {...props}
      {...field}
      value={field.value ?? ''}
      inputRef={ref}
      error={Boolean(error)}
      helperText={error?.message ?? helperText}
      fullWidth
    />
  );
}
