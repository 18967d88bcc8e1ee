import TextField from '@mui/material/TextField';
import type { KeyboardEvent, Ref } from 'react';
import { monoFontFamily } from '../../../theme/tokens';

interface BigReadingInputProps {
  label: string;
  unit: string;
  value: string;
  error: string | null;
  onChange: (text: string) => void;
  onEnter: () => void;
  onEscape: () => void;
  inputRef?: Ref<HTMLInputElement>;
  /** While a doubtful value is asked about: keys still work, typing does not. */
  readOnly?: boolean;
}

/** The one reading being typed: large, monospaced, read from arm's length; Enter takes it, Escape clears it. */
export function BigReadingInput({
  label,
  unit,
  value,
  error,
  onChange,
  onEnter,
  onEscape,
  inputRef,
  readOnly,
}: BigReadingInputProps) {
  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    if (event.key === 'Enter') {
      event.preventDefault();
      onEnter();
    } else if (event.key === 'Escape') {
      event.preventDefault();
      onEscape();
    }
  };
  return (
    <TextField
      label={label}
      value={value}
      onChange={(event) => onChange(event.target.value)}
      onKeyDown={onKeyDown}
      error={error !== null}
      helperText={error ?? `Indicator reading in ${unit}. Enter takes it, Escape clears it.`}
      inputRef={inputRef}
      autoFocus
      autoComplete="off"
      fullWidth
      slotProps={{
        htmlInput: { inputMode: 'decimal', spellCheck: false, readOnly },
        input: { endAdornment: <span aria-hidden="true">{unit}</span> },
        formHelperText: { sx: { fontSize: '1rem' } },
      }}
      sx={{
        '& .MuiInputBase-root': {
          fontSize: { xs: '2.25rem', md: '3rem' },
          fontFamily: monoFontFamily,
          fontVariantNumeric: 'tabular-nums',
        },
        '& .MuiInputBase-input': { py: 1.5 },
        '& .MuiInputLabel-root': { fontSize: '1.1rem' },
      }}
    />
  );
}
