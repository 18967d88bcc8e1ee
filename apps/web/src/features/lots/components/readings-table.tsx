import type { DisplayUnit, Inspection } from '@evenset/contracts';
import { formatLength, displayResolution } from '@evenset/metrology';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { monoFontFamily } from '../../../theme/tokens';

const KIND_LABELS: Record<Inspection['readings'][number]['kind'], string> = {
  top: 'Top face',
  datum: 'Datum face',
  runout: 'Runout',
};

/** The indicator readings of one inspection, in the order they were taken. */
export function ReadingsTable({ inspection, unit }: { inspection: Inspection; unit: DisplayUnit }) {
  return (
    <Table size="small" aria-label="Readings">
      <TableHead>
        <TableRow>
          <TableCell>Station</TableCell>
          <TableCell>Face</TableCell>
          <TableCell align="right">Reading ({displayResolution(unit, 'fine').symbol})</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {inspection.readings.map((r) => (
          <TableRow key={r.station}>
            <TableCell>{r.station}</TableCell>
            <TableCell>{KIND_LABELS[r.kind]}</TableCell>
            <TableCell align="right" sx={{ fontFamily: monoFontFamily, fontVariantNumeric: 'tabular-nums' }}>
              {formatLength(r.reading, unit, { level: 'fine', signed: true, withSymbol: false })}
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
