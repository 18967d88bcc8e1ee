import type { TrendSubgroupChart } from '@evenset/contracts';
import Typography from '@mui/material/Typography';
import Stack from '@mui/material/Stack';

/** Which subgroups the X-bar/R chart uses, which it leaves out or trims, and why. */
export function SubgroupNotes({ chart }: { chart: TrendSubgroupChart }) {
  const noun = chart.basis === 'lot' ? 'lot' : 'set';
  return (
    <Stack spacing={0.5} sx={{ color: 'text.secondary' }}>
      {chart.note ? <Typography sx={{ color: 'text.primary' }}>{chart.note}</Typography> : null}
      {chart.size ? (
        <Typography variant="body2">
          {chart.subgroups.length} {noun}s of {chart.size} values each. {chart.sizeRule}
        </Typography>
      ) : null}
      {chart.leftOut.length ? (
        <Typography variant="body2">
          Left out: {chart.leftOut.map((g) => `${g.label} (${g.count} values, ${g.reason})`).join('; ')}.
        </Typography>
      ) : null}
      {chart.trimmed.length ? (
        <Typography variant="body2">
          Charted with their first {chart.size} values only:{' '}
          {chart.trimmed.map((g) => `${g.label} (${g.count} values)`).join('; ')}.
        </Typography>
      ) : null}
    </Stack>
  );
}
