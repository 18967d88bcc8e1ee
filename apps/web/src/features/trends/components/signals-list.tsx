import type { TrendSignal } from '@evenset/contracts';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { formatCount } from '../../../lib/format';
import { SignalMark } from './control-chart';

const CHART_NAMES: Record<TrendSignal['chart'], string> = { xbar: 'X-bar', individuals: 'Individuals' };

// A long history can break the rules hundreds of times: the first few, then all on request.
const SHOWN_FIRST = 20;

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** Each run-rule signal: the chart, the rule in plain words and the points that make the pattern. */
export function SignalsList({ signals }: { signals: readonly TrendSignal[] }) {
  const [showAll, setShowAll] = useState(false);
  const shown = showAll ? signals : signals.slice(0, SHOWN_FIRST);
  return (
    <Stack spacing={1}>
      <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
        <svg width={18} height={18} aria-hidden="true">
          <SignalMark cx={9} cy={9} size={7} />
        </svg>
        <Typography variant="body2" sx={{ color: 'text.secondary' }}>
          marks the points of a signal on the charts.
        </Typography>
      </Stack>
      {signals.length === 0 ? (
        <Typography>No point breaks a run rule.</Typography>
      ) : (
        <Table size="small" aria-label="Run-rule signals">
          <TableHead>
            <TableRow>
              <TableCell>Chart</TableCell>
              <TableCell>Rule</TableCell>
              <TableCell>Points</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {shown.map((s) => (
              <TableRow key={`${s.chart}-${s.rule}-${s.side}-${s.index}`}>
                <TableCell>{CHART_NAMES[s.chart]}</TableCell>
                <TableCell>{capitalise(s.description)}</TableCell>
                <TableCell>{s.points.join(', ')}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
      {shown.length < signals.length ? (
        <Button onClick={() => setShowAll(true)} sx={{ alignSelf: 'flex-start' }}>
          Show all {formatCount(signals.length)} signals
        </Button>
      ) : null}
    </Stack>
  );
}
