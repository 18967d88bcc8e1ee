import type { DisplayUnit } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Figures } from '../../../components/display/figures';
import { VerdictLabel } from '../../../components/display/verdict-label';
import { formatSmallLength } from '../../../lib/small-length';
import type { LiveResult, LiveValue } from '../live-result';

function Row({ label, value, unit }: { label: string; value: LiveValue | null; unit: DisplayUnit }) {
  return (
    <Box
      sx={{ display: 'grid', gridTemplateColumns: '7.5rem 1fr', alignItems: 'center', columnGap: 1.5, minHeight: 40 }}
    >
      <Typography sx={{ color: 'text.secondary' }}>{label}</Typography>
      {value ? (
        <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
          <Typography sx={{ fontSize: '1.25rem' }}>
            <Figures>{formatLength(value.value, unit, { level: 'fine' })}</Figures>
          </Typography>
          {value.decision ? <VerdictLabel verdict={value.decision.verdict} side={value.decision.side} /> : null}
        </Stack>
      ) : (
        <Typography sx={{ color: 'text.secondary' }}>—</Typography>
      )}
    </Box>
  );
}

/** Results so far, as readings arrive; a characteristic shows once its stations are read. */
export function LiveResults({ result, unit, title }: { result: LiveResult; unit: DisplayUnit; title: string }) {
  return (
    <Stack spacing={0.5} aria-label={title} component="section">
      <Typography variant="h3" sx={{ mb: 1 }}>
        {title}
      </Typography>
      <Row label="Height" value={result.height} unit={unit} />
      <Box
        sx={{ display: 'grid', gridTemplateColumns: '7.5rem 1fr', alignItems: 'center', columnGap: 1.5, minHeight: 40 }}
      >
        <Typography sx={{ color: 'text.secondary' }}>U (k = 2)</Typography>
        <Typography sx={{ fontSize: '1.25rem' }}>
          <Figures>
            {result.expandedUncertainty === null ? '—' : formatSmallLength(result.expandedUncertainty, unit, true)}
          </Figures>
        </Typography>
      </Box>
      <Row label="Flatness" value={result.flatness} unit={unit} />
      <Row label="Parallelism" value={result.parallelism} unit={unit} />
      <Row label="Runout" value={result.runout} unit={unit} />
      <Box sx={{ pt: 1.5, fontSize: '1.25rem' }}>
        {result.verdict ? <VerdictLabel verdict={result.verdict} side={result.height?.decision?.side} /> : null}
      </Box>
    </Stack>
  );
}
