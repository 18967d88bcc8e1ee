import type { DisplayUnit } from '@evenset/contracts';
import { fitsBand } from '@evenset/metrology';
import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import { Figures } from '../../../components/display/figures';
import { StatusLabel } from '../../../components/display/status-label';
import { granite } from '../../../theme/tokens';
import { formatHeight } from '../set-format';

interface SpreadBarProps {
  /** Highest − lowest height of the set, mm. */
  spread: number;
  /** The matching band, mm. */
  band: number;
  unit: DisplayUnit;
  /** One line for a grid cell: the bar and the figures, no status words. */
  dense?: boolean;
}

const length = formatHeight;

/**
 * A set's spread drawn against its matching band: the track holds the band (marked at its end)
 * with some room beyond it, the fill is the spread. Within the band it is green, over it the
 * warning colour — and it always says so in words too.
 */
export function SpreadBar({ spread, band, unit, dense = false }: SpreadBarProps) {
  const within = fitsBand(0, spread, band);
  const scale = Math.max(band * 1.25, spread, Number.MIN_VALUE);
  const share = (mm: number) => `${Math.min(100, (mm / scale) * 100)}%`;
  const summary = `Spread ${length(spread, unit)} against a matching band of ${length(band, unit)}: ${
    within ? 'within the band' : `over the band by ${length(spread - band, unit)}`
  }`;
  const bar = (
    <Box
      role="img"
      aria-label={summary}
      sx={{
        position: 'relative',
        height: dense ? 8 : 12,
        width: dense ? 72 : '100%',
        minWidth: dense ? 72 : 160,
        flexShrink: 0,
        borderRadius: 1,
        bgcolor: granite[100],
        border: 1,
        borderColor: granite[300],
        overflow: 'hidden',
      }}
    >
      {/* The band: the part of the track a set's spread may fill. */}
      <Box sx={{ position: 'absolute', inset: 0, width: share(band), bgcolor: granite[200] }} />
      <Box
        sx={{
          position: 'absolute',
          top: 0,
          bottom: 0,
          left: 0,
          width: share(spread),
          bgcolor: within ? 'success.main' : 'warning.main',
          transition: 'width 150ms ease-out',
        }}
      />
      <Box
        sx={{ position: 'absolute', top: 0, bottom: 0, left: share(band), width: 2, ml: '-1px', bgcolor: granite[900] }}
      />
    </Box>
  );
  if (dense)
    return (
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center', height: '100%' }}>
        {bar}
        <Figures>
          {length(spread, unit, false)} / {length(band, unit, false)}
        </Figures>
      </Stack>
    );
  return (
    <Stack spacing={0.75}>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 0.5 }}>
        <StatusLabel
          icon={within ? CheckCircleOutlined : WarningAmberOutlined}
          tone={within ? 'success' : 'warning'}
          label={within ? 'Within the matching band' : `Over the band by ${length(spread - band, unit)}`}
        />
        <Box component="span" sx={{ color: 'text.secondary' }}>
          Spread <Figures>{length(spread, unit)}</Figures> of <Figures>{length(band, unit)}</Figures>
        </Box>
      </Stack>
      {bar}
    </Stack>
  );
}
