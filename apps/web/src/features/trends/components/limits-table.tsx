import type { DisplayUnit, Trend, TrendLimits } from '@evenset/contracts';
import { displayResolution, formatLength } from '@evenset/metrology';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { Figures } from '../../../components/display/figures';

/** The limit lines of every chart as figures, so they can be read and copied. */
export function LimitsTable({ trend, unit }: { trend: Trend; unit: DisplayUnit }) {
  const { symbol } = displayResolution(unit, 'fine');
  const rows: [string, TrendLimits | null][] = [
    ['X-bar', trend.subgroups.xbar],
    ['R', trend.subgroups.range],
    ['Individuals', trend.individuals?.individuals ?? null],
    ['Moving range', trend.individuals?.movingRange ?? null],
  ];
  const shown = (mm: number) => formatLength(mm, unit, { level: 'fine', withSymbol: false });
  return (
    <Table size="small" aria-label="Control limits" sx={{ maxWidth: 640 }}>
      <TableHead>
        <TableRow>
          <TableCell>Chart</TableCell>
          <TableCell align="right">LCL ({symbol})</TableCell>
          <TableCell align="right">CL ({symbol})</TableCell>
          <TableCell align="right">UCL ({symbol})</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {rows.map(([name, limits]) => (
          <TableRow key={name}>
            <TableCell component="th" scope="row">
              {name}
            </TableCell>
            {limits ? (
              [limits.lower, limits.centre, limits.upper].map((value, i) => (
                <TableCell key={i} align="right">
                  <Figures>{shown(value)}</Figures>
                </TableCell>
              ))
            ) : (
              <TableCell colSpan={3} align="right" sx={{ color: 'text.secondary' }}>
                No chart
              </TableCell>
            )}
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
