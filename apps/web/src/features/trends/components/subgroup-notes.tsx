import type { TrendSubgroupChart } from '@evenset/contracts';
import Typography from '@mui/material/Typography';
import Stack from '@mui/material/Stack';
import { countOf, nameFirst } from '../../../lib/format';

// Hundreds of lots can be trimmed or left out: name a few; the CSV export has every point with its lot.
const NAMED_SUBGROUPS = 10;

/** Which subgroups the X-bar/R chart uses, which it leaves out or trims, and why. */
export function SubgroupNotes({ chart }: { chart: TrendSubgroupChart }) {
  const noun = chart.basis === 'lot' ? 'lot' : 'set';
  return (
    <Stack spacing={0.5} sx={{ color: 'text.secondary' }}>
      {chart.note ? <Typography sx={{ color: 'text.primary' }}>{chart.note}</Typography> : null}
      {chart.size ? (
        <Typography variant="body2">
          {countOf(chart.subgroups.length, noun)} of {chart.size} values each. {chart.sizeRule}
        </Typography>
      ) : null}
      {chart.leftOut.length ? (
        <Typography variant="body2">
          Left out:{' '}
          {nameFirst(
            chart.leftOut.map((g) => `${g.label} (${countOf(g.count, 'value')}, ${g.reason})`),
            NAMED_SUBGROUPS,
            '; ',
          )}
          .
        </Typography>
      ) : null}
      {chart.trimmed.length ? (
        <Typography variant="body2">
          Charted with their first {chart.size} values only:{' '}
          {nameFirst(
            chart.trimmed.map((g) => `${g.label} (${countOf(g.count, 'value')})`),
            NAMED_SUBGROUPS,
            '; ',
          )}
          .
        </Typography>
      ) : null}
    </Stack>
  );
}
