import InputAdornment from '@mui/material/InputAdornment';
import TextField, { type TextFieldProps } from '@mui/material/TextField';
import { useEffect, useState } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { monoFontFamily } from '../../theme/tokens';

type FormNumberFieldProps<T extends FieldValues> = Omit<
  TextFieldProps,
  'name' | 'value' | 'error' | 'onChange' | 'onBlur' | 'type'
> & {
  name: Path<T>;
  control: Control<T>;
  /** Unit shown at the end of the field, e.g. "in". */
  unit?: string | undefined;
  /** What an empty field means: `null` for an optional limit, `undefined` when a number is required. */
  empty?: null | undefined;
};

/** Text the person typed, as a number: empty → `empty`, unreadable ("1.2.3") → NaN for the schema to refuse. */
function parseNumber(text: string, empty: null | undefined): number | null | undefined {
  const trimmed = text.trim().replace(/[−–]/g, '-');
  if (trimmed === '') return empty;
  return /^[-+]?(\d+\.?\d*|\.\d+)$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

function showNumber(value: unknown): string {
  return typeof value === 'number' && Number.isFinite(value) ? String(value) : '';
}

/**
 * A number field bound to react-hook-form. It keeps the typed text (so "1." and "-" survive while
 * typing) and hands the form a number; a value set from outside (reset) replaces the text.
 */
export function FormNumberField<T extends FieldValues>({
  name,
  control,
  unit,
  empty,
  helperText,
  slotProps,
  ...props
}: FormNumberFieldProps<T>) {
  const {
    field: { ref, value, onChange, onBlur },
    fieldState: { error },
  } = useController({ name, control });
  const [text, setText] = useState(() => showNumber(value));
  const htmlInput = typeof slotProps?.htmlInput === 'object' ? slotProps.htmlInput : {};

  useEffect(() => {
    setText((current) => {
      const typed = parseNumber(current, empty);
      return typed === value || (Number.isNaN(typed) && Number.isNaN(value)) ? current : showNumber(value);
    });
  }, [value, empty]);

  return (
    <TextField
      {...props}
      value={text}
      inputRef={ref}
      onBlur={onBlur}
      onChange={(event) => {
        setText(event.target.value);
        onChange(parseNumber(event.target.value, empty));
      }}
      error={Boolean(error)}
      helperText={error?.message ?? helperText}
      fullWidth
      slotProps={{
        ...slotProps,
        htmlInput: { ...htmlInput, inputMode: 'decimal', autoComplete: 'off', style: { fontFamily: monoFontFamily } },
        input: unit ? { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> } : undefined,
      }}
    />
  );
}
