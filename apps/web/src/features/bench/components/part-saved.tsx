import type { DisplayUnit, Inspection } from '@evenset/contracts';
import ArrowForwardOutlined from '@mui/icons-material/ArrowForwardOutlined';
import FlagOutlined from '@mui/icons-material/FlagOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { ResultSummary } from '../../lots/components/result-summary';
import type { LiveResult } from '../live-result';

interface PartSavedProps {
  inspection: Inspection;
  live: LiveResult;
  unit: DisplayUnit;
  resolution: number;
  onNext: () => void;
  onEnd: () => void;
}

/** After Save: the server's stored result is the record; say whether the live one agreed. */
export function PartSaved({ inspection, live, unit, resolution, onNext, onEnd }: PartSavedProps) {
  const stored = inspection.result;
  const agrees =
    live.verdict === stored.verdict &&
    live.height !== null &&
    Math.abs(live.height.value - stored.height) <= resolution / 2;
  return (
    <Stack spacing={3} sx={{ maxWidth: 900 }}>
      <Typography variant="h2" component="p" sx={{ fontSize: '2rem' }}>
        {inspection.serial} saved
      </Typography>
      <Alert severity={agrees ? 'success' : 'info'}>
        {agrees
          ? 'The stored result agrees with the live one.'
          : 'The stored result differs from the live one. The stored result below is the record.'}
      </Alert>
      <Paper variant="outlined" sx={{ p: 2 }}>
        <ResultSummary result={stored} unit={unit} />
      </Paper>
      <Stack direction="row" spacing={2}>
        <Button
          variant="contained"
          size="large"
          autoFocus
          endIcon={<ArrowForwardOutlined />}
          onClick={onNext}
          sx={{ minHeight: 56, px: 4 }}
        >
          Next part
        </Button>
        <Button variant="outlined" size="large" startIcon={<FlagOutlined />} onClick={onEnd} sx={{ minHeight: 56 }}>
          End the run: master check
        </Button>
      </Stack>
    </Stack>
  );
}
