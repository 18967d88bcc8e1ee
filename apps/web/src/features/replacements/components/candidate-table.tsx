import type { DisplayUnit, ReplacementCandidate } from '@evenset/contracts';
import Button from '@mui/material/Button';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { Figures } from '../../../components/display/figures';
import { UNIT_SYMBOLS } from '../../../components/data-grid/length-column';
import { formatHeight } from '../../sets/set-format';

interface CandidateTableProps {
  label: string;
  candidates: readonly ReplacementCandidate[];
  unit: DisplayUnit;
  /** Fitting parts show their distance from the centre; parts to grind, the stock to take off. */
  measure: 'distance' | 'stock';
  actionLabel: string;
  /** Null hides the action (the person's role may not use it). */
  onAction: ((candidate: ReplacementCandidate) => void) | null;
}

/** Candidate parts, best first, each with the one thing that can be done with it. */
export function CandidateTable({ label, candidates, unit, measure, actionLabel, onAction }: CandidateTableProps) {
  const symbol = UNIT_SYMBOLS[unit];
  const length = (mm: number) => formatHeight(mm, unit, false);
  return (
    <Table size="small" aria-label={label}>
      <TableHead>
        <TableRow>
          <TableCell>#</TableCell>
          <TableCell>Serial</TableCell>
          <TableCell>Lot</TableCell>
          <TableCell align="right">Height ({symbol})</TableCell>
          <TableCell align="right">
            {measure === 'distance' ? `From the centre (${symbol})` : `To grind off (${symbol})`}
          </TableCell>
          {onAction ? <TableCell /> : null}
        </TableRow>
      </TableHead>
      <TableBody>
        {candidates.map((c, index) => (
          <TableRow key={c.id}>
            <TableCell>{index + 1}</TableCell>
            <TableCell sx={{ fontWeight: 500 }}>{c.serial}</TableCell>
            <TableCell>
              {c.lotNumber} (rev {c.revision})
            </TableCell>
            <TableCell align="right">
              <Figures>{length(c.height)}</Figures>
            </TableCell>
            <TableCell align="right">
              <Figures>{length(measure === 'distance' ? c.distance : (c.stockToCentre ?? c.distance))}</Figures>
            </TableCell>
            {onAction ? (
              <TableCell align="right">
                <Button size="small" variant={index === 0 ? 'contained' : 'outlined'} onClick={() => onAction(c)}>
                  {actionLabel}
                </Button>
              </TableCell>
            ) : null}
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
