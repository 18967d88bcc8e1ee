import { createRunSchema, type DisplayUnit } from '@evenset/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import ArrowForwardOutlined from '@mui/icons-material/ArrowForwardOutlined';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { FieldGrid } from '../../../components/form/field-grid';
import { FormNumberField } from '../../../components/form/form-number-field';
import { FormSelectField } from '../../../components/form/form-select-field';
import { useRenderMark } from '../../../components/use-render-mark';
import { useLots } from '../../lots/api/get-lots';
import { useUsableInstruments, useUsableMasters } from '../api/bench-choices';
import { LotSpecLine } from './lot-spec-line';

const setupSchema = createRunSchema.omit({ unit: true, masterStartReading: true });
export type BenchSetupInput = z.infer<typeof setupSchema>;

const RECENT_LOTS = { page: 0, pageSize: 100, sort: 'createdAt:desc' } as const;
const big = { '& .MuiInputBase-root': { minHeight: 56, fontSize: '1.15rem' } };

/** First screen of a run: the lot, the master and instrument (only usable ones are offered), temperatures. */
export function BenchSetup({ unit, onReady }: { unit: DisplayUnit; onReady: (setup: BenchSetupInput) => void }) {
  const lots = useLots(RECENT_LOTS);
  const masters = useUsableMasters();
  const instruments = useUsableInstruments();
  useRenderMark('bench', Boolean(lots.data && masters.data && instruments.data));
  const { control, handleSubmit } = useForm<BenchSetupInput>({
    resolver: zodResolver(setupSchema),
    defaultValues: { lotId: '', masterId: '', instrumentId: '', masterTemperature: 20, partTemperature: 20 },
  });
  const lotId = useWatch({ control, name: 'lotId' });
  return (
    <Stack
      component="form"
      noValidate
      spacing={3}
      onSubmit={(event) => void handleSubmit(onReady)(event)}
      sx={{ maxWidth: 760 }}
    >
      <FormSelectField
        control={control}
        name="lotId"
        label="Lot"
        sx={big}
        autoFocus
        options={(lots.data?.items ?? []).map((lot) => ({
          value: lot.id,
          label: `${lot.lotNumber} — ${lot.spec.partNumber} rev ${lot.spec.revision}, ${lot.partCount} parts`,
        }))}
      />
      {lotId ? <LotSpecLine lotId={lotId} unit={unit} /> : null}
      <FormSelectField
        control={control}
        name="masterId"
        label="Master gauge"
        sx={big}
        helperText="Only masters in calibration are offered."
        options={(masters.data?.items ?? []).map((m) => ({ value: m.id, label: `${m.code} — ${m.description}` }))}
      />
      <FormSelectField
        control={control}
        name="instrumentId"
        label="Instrument"
        sx={big}
        helperText="Only instruments in calibration are offered."
        options={(instruments.data?.items ?? []).map((i) => ({ value: i.id, label: `${i.code} — ${i.description}` }))}
      />
      <FieldGrid min={240}>
        <FormNumberField control={control} name="masterTemperature" label="Master temperature" unit="°C" sx={big} />
        <FormNumberField control={control} name="partTemperature" label="Part temperature" unit="°C" sx={big} />
      </FieldGrid>
      <div>
        <Button
          type="submit"
          variant="contained"
          size="large"
          endIcon={<ArrowForwardOutlined />}
          sx={{ minHeight: 56, px: 4 }}
        >
          Next: zero on the master ({unit})
        </Button>
      </div>
    </Stack>
  );
}
