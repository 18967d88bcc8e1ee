import type { AuditFacets } from '@evenset/contracts';
import Button from '@mui/material/Button';
import MenuItem from '@mui/material/MenuItem';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';

/** The filters besides the grid's own search text; empty strings mean "any". */
export interface AuditFilterValues {
  action: string;
  actorId: string;
  subjectType: string;
  subjectId: string;
  from: string;
  to: string;
}

export const NO_AUDIT_FILTERS: AuditFilterValues = {
  action: '',
  actorId: '',
  subjectType: '',
  subjectId: '',
  from: '',
  to: '',
};

interface AuditFiltersProps {
  facets: AuditFacets | undefined;
  value: AuditFilterValues;
  onChange: (value: AuditFilterValues) => void;
  /** The server's messages by field, when it refused the filters. */
  errors: Readonly<Record<string, string>>;
}

const selectSx = { minWidth: 200 } as const;

export function AuditFilters({ facets, value, onChange, errors }: AuditFiltersProps) {
  const set = (key: keyof AuditFilterValues, v: string) => onChange({ ...value, [key]: v });
  const any = (
    <MenuItem value="">
      <em>Any</em>
    </MenuItem>
  );
  return (
    <Stack direction="row" spacing={2} useFlexGap sx={{ flexWrap: 'wrap', alignItems: 'flex-start' }}>
      <TextField
        select
        label="Action"
        value={value.action}
        onChange={(e) => set('action', e.target.value)}
        sx={selectSx}
      >
        {any}
        {(facets?.actions ?? []).map((action) => (
          <MenuItem key={action} value={action}>
            {action}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        select
        label="Who"
        value={value.actorId}
        onChange={(e) => set('actorId', e.target.value)}
        sx={selectSx}
      >
        {any}
        {(facets?.actors ?? []).map((actor) => (
          <MenuItem key={actor.id} value={actor.id}>
            {actor.name}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        select
        label="Record type"
        value={value.subjectType}
        onChange={(e) => set('subjectType', e.target.value)}
        sx={selectSx}
      >
        {any}
        {(facets?.subjectTypes ?? []).map((type) => (
          <MenuItem key={type} value={type}>
            {type}
          </MenuItem>
        ))}
      </TextField>
      <TextField
        type="date"
        label="From"
        value={value.from}
        onChange={(e) => set('from', e.target.value)}
        error={Boolean(errors.from)}
        helperText={errors.from}
        slotProps={{ inputLabel: { shrink: true } }}
      />
      <TextField
        type="date"
        label="To"
        value={value.to}
        onChange={(e) => set('to', e.target.value)}
        error={Boolean(errors.to)}
        helperText={errors.to}
        slotProps={{ inputLabel: { shrink: true } }}
      />
      {value.subjectId ? (
        <TextField
          label="Record id"
          value={value.subjectId}
          onChange={(e) => set('subjectId', e.target.value)}
          sx={{ minWidth: 320 }}
        />
      ) : null}
      <Button
        onClick={() => onChange(NO_AUDIT_FILTERS)}
        disabled={Object.values(value).every((v) => v === '')}
        sx={{ mt: 1 }}
      >
        Clear filters
      </Button>
    </Stack>
  );
}
