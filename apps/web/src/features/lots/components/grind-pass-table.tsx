import type { DisplayUnit } from '@evenset/contracts';
import type { GrindPass } from '@evenset/metrology';
import { formatLength } from '@evenset/metrology';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { Figures } from '../../../components/display/figures';
import { UNIT_SYMBOLS } from '../../../components/data-grid/length-column';

const PASS_LABELS = { rough: 'Rough', finish: 'Finish', 'spark-out': 'Spark-out' } as const;

/** A grinding pass plan: each pass's kind, down-feed and the stock still left after it. */
export function GrindPassTable({ passes, unit }: { passes: readonly GrindPass[]; unit: DisplayUnit }) {
  const length = (mm: number) => formatLength(mm, unit, { level: 'fine', withSymbol: false });
  const symbol = UNIT_SYMBOLS[unit];
  return (
    <Table size="small" aria-label="Grinding passes">
      <TableHead>
        <TableRow>
          <TableCell>Pass</TableCell>
          <TableCell>Kind</TableCell>
          <TableCell align="right">Depth ({symbol})</TableCell>
          <TableCell align="right">Stock left ({symbol})</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {passes.map((p) => (
          <TableRow key={p.pass}>
            <TableCell>{p.pass}</TableCell>
            <TableCell>{PASS_LABELS[p.kind]}</TableCell>
            <TableCell align="right">
              <Figures>{length(p.depth)}</Figures>
            </TableCell>
            <TableCell align="right">
              <Figures>{length(p.remaining)}</Figures>
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
