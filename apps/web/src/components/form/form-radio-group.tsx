import FormControl from '@mui/material/FormControl';
import FormControlLabel from '@mui/material/FormControlLabel';
import FormHelperText from '@mui/material/FormHelperText';
import FormLabel from '@mui/material/FormLabel';
import Radio from '@mui/material/Radio';
import RadioGroup from '@mui/material/RadioGroup';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useId } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';

export interface RadioChoice {
  value: string;
  label: string;
  /** One plain sentence on what choosing it means. */
  description: string;
}

interface FormRadioGroupProps<T extends FieldValues> {
  name: Path<T>;
  control: Control<T>;
  label: string;
  choices: readonly RadioChoice[];
}

/** A choice among a few options, each explained in a sentence under its name. */
export function FormRadioGroup<T extends FieldValues>({ name, control, label, choices }: FormRadioGroupProps<T>) {
  const labelId = useId();
  const {
    field: { ref, value, onChange, onBlur },
    fieldState: { error },
  } = useController({ name, control });
  return (
    <FormControl error={Boolean(error)}>
      <FormLabel id={labelId} sx={{ mb: 0.5 }}>
        {label}
      </FormLabel>
      <RadioGroup aria-labelledby={labelId} value={value ?? ''} onChange={(_, next) => onChange(next)} onBlur={onBlur}>
        {choices.map((choice, index) => (
          <FormControlLabel
            key={choice.value}
            value={choice.value}
            control={<Radio slotProps={{ input: { ref: index === 0 ? ref : undefined } }} />}
            sx={{ alignItems: 'flex-start', mb: 0.5, '& .MuiRadio-root': { mt: -0.75 } }}
            label={
              <Stack>
                <span>{choice.label}</span>
                <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                  {choice.description}
                </Typography>
              </Stack>
            }
          />
        ))}
      </RadioGroup>
      {error?.message ? <FormHelperText>{error.message}</FormHelperText> : null}
    </FormControl>
  );
}
