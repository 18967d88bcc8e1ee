import type { Disposition, DisplayUnit } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Figures } from '../../../components/display/figures';
import { GrindPassTable } from './grind-pass-table';
import { GrindingCautions } from './grinding-cautions';

const KIND_LABELS: Record<Disposition['kind'], string> = {
  rework: 'Rework',
  scrap: 'Scrap',
  'use-as-is': 'Use as is',
  release: 'Released',
};
const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** Dispositions and releases of a part, newest first; a rework shows its plan and the cautions. */
export function DispositionHistory({
  dispositions,
  unit,
}: {
  dispositions: readonly Disposition[];
  unit: DisplayUnit;
}) {
  const length = (mm: number) => formatLength(mm, unit, { level: 'fine' });
  if (dispositions.length === 0) return <Typography sx={{ color: 'text.secondary' }}>No disposition yet.</Typography>;
  return (
    <Stack spacing={2}>
      {dispositions.map((d) => (
        <Paper key={d.id} variant="outlined" sx={{ p: 2 }}>
          <Typography sx={{ fontWeight: 600 }}>
            {KIND_LABELS[d.kind]} — {when.format(new Date(d.createdAt))} by {d.decidedBy}
          </Typography>
          {d.reason ? <Typography>Reason: {d.reason}</Typography> : null}
          {d.rework ? (
            <Stack spacing={1.5} sx={{ mt: 1 }}>
              <Typography>
                From <Figures>{length(d.rework.currentHeight)}</Figures> to{' '}
                <Figures>{length(d.rework.targetHeight)}</Figures>: remove{' '}
                <Figures>{length(d.rework.stockToRemove)}</Figures>.
              </Typography>
              <GrindingCautions text={d.rework.cautions} />
              {d.rework.passes ? (
                <GrindPassTable passes={d.rework.passes} unit={unit} />
              ) : (
                <Typography sx={{ color: 'text.secondary' }}>
                  The spec gives no grinding parameters, so no pass plan.
                </Typography>
              )}
            </Stack>
          ) : null}
        </Paper>
      ))}
    </Stack>
  );
}
