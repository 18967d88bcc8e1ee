import MenuItem from '@mui/material/MenuItem';
import TextField from '@mui/material/TextField';

export interface Choice {
  value: string;
  label: string;
}

interface ChoiceFilterProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  choices: readonly Choice[];
  /** What the empty choice reads, e.g. "Any inspector". */
  anyLabel: string;
  minWidth?: number;
}

/** A select narrowing a list to one value, or to any (the empty string). */
export function ChoiceFilter({ label, value, onChange, choices, anyLabel, minWidth = 180 }: ChoiceFilterProps) {
  return (
    <TextField
      select
      label={label}
      value={value}
      onChange={(e) => onChange(e.target.value)}
      sx={{ minWidth }}
      slotProps={{ select: { displayEmpty: true }, inputLabel: { shrink: true } }}
    >
      <MenuItem value="">{anyLabel}</MenuItem>
      {choices.map((c) => (
        <MenuItem key={c.value} value={c.value}>
          {c.label}
        </MenuItem>
      ))}
    </TextField>
  );
}
