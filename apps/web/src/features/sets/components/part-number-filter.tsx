import Autocomplete from '@mui/material/Autocomplete';
import TextField from '@mui/material/TextField';
import { useEffect, useState } from 'react';

interface PartNumberFilterProps {
  value: string | undefined;
  /** Part numbers to offer; any other can still be typed. */
  options: readonly string[];
  onChange: (partNumber: string | undefined) => void;
}

/** Narrows a list to one part number: pick one offered or type it and press Enter. */
export function PartNumberFilter({ value, options, onChange }: PartNumberFilterProps) {
  const [text, setText] = useState(value ?? '');
  useEffect(() => setText(value ?? ''), [value]);
  const apply = (next: string | null) => {
    const trimmed = next?.trim() ?? '';
    onChange(trimmed === '' ? undefined : trimmed);
  };
  return (
    <Autocomplete
      freeSolo
      options={options}
      value={value ?? null}
      inputValue={text}
      onInputChange={(_event, next) => setText(next)}
      onChange={(_event, next) => apply(next)}
      onBlur={() => {
        if (text.trim() !== (value ?? '')) apply(text);
      }}
      sx={{ width: 240 }}
      renderInput={(params) => (
        <TextField {...params} label="Part number" size="small" helperText="All part numbers when empty" />
      )}
    />
  );
}
