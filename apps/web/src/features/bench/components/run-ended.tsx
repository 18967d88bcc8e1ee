import type { DisplayUnit, Run } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { Figures } from '../../../components/display/figures';
import { paths } from '../../../config/paths';

/** The run's drift between the two master checks; beyond the limit, every part of the run is held. */
export function RunEnded({ run, unit, onNewRun }: { run: Run; unit: DisplayUnit; onNewRun: () => void }) {
  const length = (mm: number) => formatLength(mm, unit, { level: 'fine', signed: true });
  return (
    <Stack spacing={3} sx={{ maxWidth: 760 }}>
      <Typography variant="h2" component="p" sx={{ fontSize: '2rem' }}>
        Run ended — {run.inspections} part{run.inspections === 1 ? '' : 's'} saved
      </Typography>
      <Alert
        severity={run.flagged ? 'error' : 'success'}
        variant={run.flagged ? 'filled' : 'standard'}
        sx={{ fontSize: '1.15rem' }}
      >
        <AlertTitle>
          {run.flagged ? 'Drift beyond the limit — the run is flagged' : 'Drift within the limit'}
        </AlertTitle>
        Drift <Figures>{run.drift === null ? '—' : length(run.drift)}</Figures>, limit{' '}
        <Figures>{formatLength(run.driftLimit, unit, { level: 'fine' })}</Figures>.
        {run.flagged
          ? ' Every part of this run is held until an engineer decides; re-zero and measure them again.'
          : ''}
      </Alert>
      <Stack direction="row" spacing={2}>
        <Button variant="contained" size="large" autoFocus onClick={onNewRun} sx={{ minHeight: 56, px: 4 }}>
          Start another run
        </Button>
        <Button
          component={RouterLink}
          to={paths.lot.getHref(run.lot.id)}
          variant="outlined"
          size="large"
          sx={{ minHeight: 56 }}
        >
          Review lot {run.lot.lotNumber}
        </Button>
      </Stack>
    </Stack>
  );
}
