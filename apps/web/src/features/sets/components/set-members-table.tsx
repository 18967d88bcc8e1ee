import type { DisplayUnit, SetDetail } from '@evenset/contracts';
import Link from '@mui/material/Link';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import { Link as RouterLink } from 'react-router-dom';
import { UNIT_SYMBOLS } from '../../../components/data-grid/length-column';
import { Figures } from '../../../components/display/figures';
import { paths } from '../../../config/paths';
import { useMay } from '../../auth/hooks/use-may';
import { formatHeight } from '../set-format';

/** The set's parts in position order, with the heights they were allocated with. */
export function SetMembersTable({ members, unit }: { members: SetDetail['members']; unit: DisplayUnit }) {
  // Part and lot pages are the shop floor's; others see the serial and lot as plain text.
  const mayOpenParts = useMay(paths.part.roles);
  const mayOpenLots = useMay(paths.lot.roles);
  return (
    <Table size="small" aria-label="Parts of this set">
      <TableHead>
        <TableRow>
          <TableCell align="right">Position</TableCell>
          <TableCell>Serial</TableCell>
          <TableCell>Lot</TableCell>
          <TableCell>Revision</TableCell>
          <TableCell align="right">Height ({UNIT_SYMBOLS[unit]})</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {members.map((m) => (
          <TableRow key={m.partId}>
            <TableCell align="right">
              <Figures>{m.position}</Figures>
            </TableCell>
            <TableCell>
              {mayOpenParts ? (
                <Link component={RouterLink} to={paths.part.getHref(m.partId)} sx={{ fontWeight: 500 }}>
                  {m.serial}
                </Link>
              ) : (
                m.serial
              )}
            </TableCell>
            <TableCell>
              {mayOpenLots ? (
                <Link component={RouterLink} to={paths.lot.getHref(m.lotId)}>
                  {m.lotNumber}
                </Link>
              ) : (
                m.lotNumber
              )}
            </TableCell>
            <TableCell>{m.revision}</TableCell>
            <TableCell align="right">
              <Figures>{formatHeight(m.height, unit, false)}</Figures>
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
