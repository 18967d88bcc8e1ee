import type { Trend, TrendPartNumber, TrendSubgroup } from '@evenset/contracts';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import ToggleButton from '@mui/material/ToggleButton';
import ToggleButtonGroup from '@mui/material/ToggleButtonGroup';
import { ChoiceFilter } from '../../../components/filters/choice-filter';
import { DateRangeFields } from '../../../components/filters/date-range-fields';
import { NO_FILTERS, type TrendFilters as Filters } from '../api/get-trends';

interface TrendFiltersProps {
  partNumbers: readonly TrendPartNumber[];
  partNumber: string;
  onPartNumber: (partNumber: string) => void;
  filters: Filters;
  onChange: (filters: Filters) => void;
  choices: Trend['choices'] | null;
  /** Messages of the server by field, when it refused the filters. */
  errors: Readonly<Record<string, string>>;
}

const fieldSx = { minWidth: 180 } as const;

/** Part number, date range, lots, inspector, master gauge and the subgroup basis. */
export function TrendFilters({
  partNumbers,
  partNumber,
  onPartNumber,
  filters,
  onChange,
  choices,
  errors,
}: TrendFiltersProps) {
  const set = <K extends keyof Filters>(key: K, value: Filters[K]) => onChange({ ...filters, [key]: value });
  const lotNumber = (id: string) => choices?.lots.find((l) => l.id === id)?.lotNumber ?? id;
  return (
    <Stack spacing={2}>
      <Stack direction="row" spacing={2} useFlexGap sx={{ flexWrap: 'wrap', alignItems: 'flex-start' }}>
        <TextField
          select
          label="Part number"
          value={partNumber}
          onChange={(e) => onPartNumber(e.target.value)}
          sx={fieldSx}
        >
          {partNumbers.map((p) => (
            <MenuItem key={p.partNumber} value={p.partNumber}>
              {p.partNumber} — rev {p.revision}
            </MenuItem>
          ))}
        </TextField>
        <DateRangeFields
          value={filters}
          onChange={(range) => onChange({ ...filters, ...range })}
          errors={errors}
          labels={{ from: 'Inspected from', to: 'Inspected to' }}
        />
        <TextField
          select
          label="Lots"
          value={filters.lotIds}
          onChange={(e) => {
            const value = e.target.value as unknown as string[] | string;
            set('lotIds', typeof value === 'string' ? value.split(',') : value);
          }}
          error={Boolean(errors.lotIds)}
          helperText={errors.lotIds}
          sx={{ minWidth: 220 }}
          slotProps={{
            select: {
              multiple: true,
              displayEmpty: true,
              renderValue: (selected) =>
                (selected as string[]).length ? (selected as string[]).map(lotNumber).join(', ') : 'All lots',
            },
            inputLabel: { shrink: true },
          }}
        >
          {(choices?.lots ?? []).map((lot) => (
            <MenuItem key={lot.id} value={lot.id}>
              {lot.lotNumber}
            </MenuItem>
          ))}
        </TextField>
        <ChoiceFilter
          label="Inspector"
          value={filters.inspector}
          onChange={(v) => set('inspector', v)}
          choices={(choices?.inspectors ?? []).map((who) => ({ value: who.id ?? who.name, label: who.name }))}
          anyLabel="Any inspector"
        />
        <ChoiceFilter
          label="Master gauge"
          value={filters.masterId}
          onChange={(v) => set('masterId', v)}
          choices={(choices?.masters ?? []).map((m) => ({ value: m.id, label: m.code }))}
          anyLabel="Any master"
        />
      </Stack>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center' }}>
        <ToggleButtonGroup
          exclusive
          size="small"
          aria-label="Subgroups of the X-bar/R chart"
          value={filters.subgroup}
          onChange={(_, value: TrendSubgroup | null) => {
            if (value) set('subgroup', value);
          }}
        >
          <ToggleButton value="lot">Subgroups by lot</ToggleButton>
          <ToggleButton value="set">Subgroups by sold set</ToggleButton>
        </ToggleButtonGroup>
        <Button onClick={() => onChange({ ...NO_FILTERS, subgroup: filters.subgroup })}>Clear filters</Button>
      </Stack>
    </Stack>
  );
}
