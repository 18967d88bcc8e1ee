import type { AuditFacets } from '@evenset/contracts';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import { ChoiceFilter } from '../../../components/filters/choice-filter';
import { DateRangeFields } from '../../../components/filters/date-range-fields';

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

export function AuditFilters({ facets, value, onChange, errors }: AuditFiltersProps) {
  const set = (key: keyof AuditFilterValues, v: string) => onChange({ ...value, [key]: v });
  const plain = (values: readonly string[] = []) => values.map((v) => ({ value: v, label: v }));
  return (
    <Stack direction="row" spacing={2} useFlexGap sx={{ flexWrap: 'wrap', alignItems: 'flex-start' }}>
      <ChoiceFilter
        label="Action"
        value={value.action}
        onChange={(v) => set('action', v)}
        choices={plain(facets?.actions)}
        anyLabel="Any action"
        minWidth={200}
      />
      <ChoiceFilter
        label="Who"
        value={value.actorId}
        onChange={(v) => set('actorId', v)}
        choices={(facets?.actors ?? []).map((a) => ({ value: a.id, label: a.name }))}
        anyLabel="Anyone"
        minWidth={200}
      />
      <ChoiceFilter
        label="Record type"
        value={value.subjectType}
        onChange={(v) => set('subjectType', v)}
        choices={plain(facets?.subjectTypes)}
        anyLabel="Any record"
        minWidth={200}
      />
      <DateRangeFields value={value} onChange={(range) => onChange({ ...value, ...range })} errors={errors} />
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
