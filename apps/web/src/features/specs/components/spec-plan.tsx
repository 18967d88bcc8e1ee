import type { Spec } from '@evenset/contracts';
import Box from '@mui/material/Box';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { Figures } from '../../../components/display/figures';
import { UNIT_SYMBOLS } from '../../../components/data-grid/length-column';
import { definitionInOwnUnit } from '../spec-values';
import { specLength } from '../spec-format';
import { PlanDrawing } from './plan-drawing/plan-drawing';

/** The plan of a saved revision: the drawing and, beside it, every station and circle in figures. */
export function SpecPlan({ spec }: { spec: Spec }) {
  const d = spec.definition;
  const plan = definitionInOwnUnit(d).plan;
  const unit = UNIT_SYMBOLS[d.displayUnit];
  const figure = (mm: number) => <Figures>{specLength(d, mm).replace(/ \S+$/, '')}</Figures>;
  const rows = [
    ...d.plan.stations.map((s) => ({ kind: 'Top face', name: s.name, a: figure(s.x), b: figure(s.y) })),
    ...d.plan.datumStations.map((s) => ({ kind: 'Datum face', name: s.name, a: figure(s.x), b: figure(s.y) })),
    ...d.plan.runoutCircles.map((c) => ({
      kind: 'Runout circle',
      name: c.name,
      a: <>r = {figure(c.radius)}</>,
      b: <Figures>{c.positions} positions</Figures>,
    })),
  ];
  return (
    <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', lg: 'minmax(0, 1.2fr) minmax(0, 1fr)' }, gap: 4 }}>
      <PlanDrawing plan={plan} unit={unit} />
      <Table size="small" aria-label="Stations and circles" sx={{ alignSelf: 'start' }}>
        <TableHead>
          <TableRow>
            <TableCell>Where</TableCell>
            <TableCell>Name</TableCell>
            <TableCell align="right">x ({unit})</TableCell>
            <TableCell align="right">y ({unit})</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {rows.map((row) => (
            <TableRow key={`${row.kind}-${row.name}`}>
              <TableCell>{row.kind}</TableCell>
              <TableCell sx={{ fontWeight: 500 }}>{row.name}</TableCell>
              <TableCell align="right">{row.a}</TableCell>
              <TableCell align="right">{row.b}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </Box>
  );
}
