import type { CorrectionImpact, DisplayUnit } from '@evenset/contracts';
import { formatLength } from '@evenset/metrology';
import Button from '@mui/material/Button';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { UNIT_SYMBOLS } from '../../../components/data-grid/length-column';
import { Figures } from '../../../components/display/figures';
import { VerdictLabel } from '../../../components/display/verdict-label';

interface CorrectionImpactDialogProps {
  masterCode: string;
  impact: CorrectionImpact;
  unit: DisplayUnit;
  onClose: () => void;
}

/** After a correction: how many heights were recomputed, which parts changed verdict, which certificates change. */
export function CorrectionImpactDialog({ masterCode, impact, unit, onClose }: CorrectionImpactDialogProps) {
  const height = (mm: number) => formatLength(mm, unit, { level: 'fine', withSymbol: false });
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="md">
      <DialogTitle>Correction of {masterCode} recorded</DialogTitle>
      <DialogContent>
        <Stack spacing={2}>
          <Typography>
            {impact.recomputed === 0
              ? 'No heights had been measured against the corrected calibration, so nothing was recomputed.'
              : `${impact.recomputed} inspection${impact.recomputed === 1 ? ' was' : 's were'} recomputed with the corrected calibration.`}{' '}
            {impact.changed.length === 0
              ? 'No part changed verdict.'
              : `${impact.changed.length} part${impact.changed.length === 1 ? '' : 's'} changed verdict; check their lots, sets and certificates.`}
          </Typography>
          {impact.changed.length > 0 ? (
            <Table size="small" aria-label="Parts whose verdict changed">
              <TableHead>
                <TableRow>
                  <TableCell>Serial</TableCell>
                  <TableCell>Lot</TableCell>
                  <TableCell align="right">Height before ({UNIT_SYMBOLS[unit]})</TableCell>
                  <TableCell align="right">Height after ({UNIT_SYMBOLS[unit]})</TableCell>
                  <TableCell>Verdict before</TableCell>
                  <TableCell>Verdict after</TableCell>
                </TableRow>
              </TableHead>
              <TableBody>
                {impact.changed.map((part) => (
                  <TableRow key={part.inspectionId}>
                    <TableCell>{part.serial}</TableCell>
                    <TableCell>{part.lotNumber}</TableCell>
                    <TableCell align="right">
                      <Figures>{height(part.heightBefore)}</Figures>
                    </TableCell>
                    <TableCell align="right">
                      <Figures>{height(part.heightAfter)}</Figures>
                    </TableCell>
                    <TableCell>
                      <VerdictLabel verdict={part.before} />
                    </TableCell>
                    <TableCell>
                      <VerdictLabel verdict={part.after} />
                    </TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          ) : null}
          {impact.certificates.length > 0 ? (
            <>
              <Typography>
                {impact.certificates.length === 1
                  ? 'One certificate cites heights measured against the corrected calibration; its facts no longer read the same.'
                  : `${impact.certificates.length} certificates cite heights measured against the corrected calibration; their facts no longer read the same.`}{' '}
                Decide with sales whether to revoke and reissue.
              </Typography>
              <Table size="small" aria-label="Certificates whose facts change">
                <TableHead>
                  <TableRow>
                    <TableCell>Certificate</TableCell>
                    <TableCell>Set</TableCell>
                    <TableCell>Customer</TableCell>
                    <TableCell>State</TableCell>
                  </TableRow>
                </TableHead>
                <TableBody>
                  {impact.certificates.map((c) => (
                    <TableRow key={c.id}>
                      <TableCell>{c.certificateNumber}</TableCell>
                      <TableCell>{c.setNumber}</TableCell>
                      <TableCell>{c.customerName}</TableCell>
                      <TableCell>{c.revoked ? 'Already revoked' : 'In force'}</TableCell>
                    </TableRow>
                  ))}
                </TableBody>
              </Table>
            </>
          ) : null}
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button variant="contained" onClick={onClose}>
          Done
        </Button>
      </DialogActions>
    </Dialog>
  );
}
