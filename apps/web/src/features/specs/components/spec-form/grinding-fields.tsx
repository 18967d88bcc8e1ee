import FormControlLabel from '@mui/material/FormControlLabel';
import Stack from '@mui/material/Stack';
import Switch from '@mui/material/Switch';
import { useWatch, type Control, type UseFormSetValue } from 'react-hook-form';
import { FieldGrid } from '../../../../components/form/field-grid';
import { FormNumberField } from '../../../../components/form/form-number-field';
import type { SpecFormValues } from '../../spec-values';

interface GrindingFieldsProps {
  control: Control<SpecFormValues>;
  setValue: UseFormSetValue<SpecFormValues>;
  unit: string;
}

/** Optional stock-removal settings used when a part is sent back for rework. */
export function GrindingFields({ control, setValue, unit }: GrindingFieldsProps) {
  const grinding = useWatch({ control, name: 'definition.grinding' });
  return (
    <Stack spacing={2}>
      <FormControlLabel
        control={
          <Switch
            checked={grinding != null}
            onChange={(_, on) =>
              setValue(
                'definition.grinding',
                on
                  ? { roughDepth: Number.NaN, finishAllowance: Number.NaN, finishDepth: Number.NaN, sparkOutPasses: 2 }
                  : null,
                { shouldDirty: true },
              )
            }
          />
        }
        label="This part has grinding parameters for rework"
      />
      {grinding != null ? (
        <FieldGrid>
          <FormNumberField
            control={control}
            name="definition.grinding.roughDepth"
            label="Rough depth per pass"
            unit={unit}
          />
          <FormNumberField
            control={control}
            name="definition.grinding.finishAllowance"
            label="Finish allowance"
            unit={unit}
          />
          <FormNumberField
            control={control}
            name="definition.grinding.finishDepth"
            label="Finish depth per pass"
            unit={unit}
          />
          <FormNumberField control={control} name="definition.grinding.sparkOutPasses" label="Spark-out passes" />
        </FieldGrid>
      ) : null}
    </Stack>
  );
}
