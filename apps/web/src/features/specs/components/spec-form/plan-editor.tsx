import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import { useWatch, type Control } from 'react-hook-form';
import { PlanDrawing } from '../plan-drawing/plan-drawing';
import type { SpecFormValues } from '../../spec-values';
import { CircleTable } from './circle-table';
import { StationTable } from './station-table';

/** Station letters A…Z, then AA, AB, … */
function letterName(count: number): string {
  const letter = (n: number) => String.fromCharCode(65 + n);
  return count < 26 ? letter(count) : `${letter(Math.floor(count / 26) - 1)}${letter(count % 26)}`;
}

/** The measurement plan's tables beside a drawing of the face that follows every keystroke. */
export function PlanEditor({ control, unit }: { control: Control<SpecFormValues>; unit: string }) {
  const plan = useWatch({ control, name: 'definition.plan' });
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', lg: 'minmax(0, 1fr) minmax(0, 1fr)' }, gap: 4 }}>
      <Stack spacing={4}>
        <StationTable
          control={control}
          list="stations"
          title="Top-face stations"
          hint="Where the indicator reads the top face: height and flatness come from these, in the order listed."
          unit={unit}
          nextName={letterName}
        />
        <StationTable
          control={control}
          list="datumStations"
          title="Datum-face stations"
          hint="Optional. Leave empty when the part rests on the plate and the plate is the datum; otherwise at least 3."
          unit={unit}
          nextName={(count) => `D${count + 1}`}
        />
        <CircleTable control={control} unit={unit} />
      </Stack>
      <Box sx={{ position: { lg: 'sticky' }, top: { lg: 88 }, alignSelf: 'start' }}>
        <PlanDrawing plan={plan} unit={unit} />
      </Box>
    </Box>
  );
}
