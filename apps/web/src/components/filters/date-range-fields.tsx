import TextField from '@mui/material/TextField';

export interface DateRange {
  from: string;
  to: string;
}

interface DateRangeFieldsProps {
  value: DateRange;
  onChange: (range: DateRange) => void;
  /** The server's messages for `from` and `to`, when it refused them. */
  errors: Readonly<Record<string, string>>;
  labels?: { from: string; to: string };
}

/** Two date fields (YYYY-MM-DD, either may be empty) bounding a list. */
export function DateRangeFields({
  value,
  onChange,
  errors,
  labels = { from: 'From', to: 'To' },
}: DateRangeFieldsProps) {
  return (['from', 'to'] as const).map((end) => (
    <TextField
      key={end}
      type="date"
      label={labels[end]}
      value={value[end]}
      onChange={(e) => onChange({ ...value, [end]: e.target.value })}
      error={Boolean(errors[end])}
      helperText={errors[end]}
      slotProps={{ inputLabel: { shrink: true } }}
    />
  ));
}
