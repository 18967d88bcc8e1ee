import type { Calibration, DisplayUnit, MasterDetail } from '@evenset/contracts';
import { formatFixed, formatLength } from '@evenset/metrology';
import EventRepeatOutlined from '@mui/icons-material/EventRepeatOutlined';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import HistoryOutlined from '@mui/icons-material/HistoryOutlined';
import TaskAltOutlined from '@mui/icons-material/TaskAltOutlined';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableContainer from '@mui/material/TableContainer';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { Figures } from '../../../components/display/figures';
import { StatusLabel } from '../../../components/display/status-label';
import { UNIT_SYMBOLS } from '../../../components/data-grid/length-column';
import { formatDate } from '../../../lib/format';
import { formatSmallLength } from '../../../lib/small-length';
import { certificateHref } from '../api/get-master';

interface CalibrationHistoryProps {
  master: MasterDetail;
  unit: DisplayUnit;
  /** Starts a correction of a record; absent for people who may not correct. */
  onCorrect?: ((calibration: Calibration) => void) | undefined;
}

/** Where a record stands: the one in force, an earlier one, or one superseded by a correction. */
function RecordState({ calibration, master }: { calibration: Calibration; master: MasterDetail }) {
  const correction = master.calibrations.find((c) => c.id === calibration.supersededById);
  const [icon, label, tone] = correction
    ? ([HistoryOutlined, 'Superseded', 'neutral'] as const)
    : calibration.id === master.current?.id
      ? ([TaskAltOutlined, 'In force', 'success'] as const)
      : ([EventRepeatOutlined, 'Earlier calibration', 'neutral'] as const);
  const note = correction
    ? `Corrected by ${correction.certificateNumber}: ${correction.reason ?? ''}`
    : calibration.reason
      ? `Correction: ${calibration.reason}`
      : null;
  return (
    <Stack spacing={0.25}>
      <StatusLabel icon={icon} label={label} tone={tone} />
      {note ? (
        <Typography variant="caption" sx={{ color: 'text.secondary' }}>
          {note}
        </Typography>
      ) : null}
    </Stack>
  );
}

/** Every calibration of a master, newest first; superseded records stay, marked with the reason. */
export function CalibrationHistory({ master, unit, onCorrect }: CalibrationHistoryProps) {
  const symbol = UNIT_SYMBOLS[unit];
  if (master.calibrations.length === 0)
    return (
      <Typography sx={{ color: 'text.secondary' }}>No calibration recorded yet — record the first one.</Typography>
    );
  return (
    <TableContainer>
      <Table size="small" aria-label={`Calibrations of ${master.code}`}>
        <TableHead>
          <TableRow>
            <TableCell>Calibrated on</TableCell>
            <TableCell>Due on</TableCell>
            <TableCell align="right">Calibrated size ({symbol})</TableCell>
            <TableCell align="right">U ({symbol})</TableCell>
            <TableCell align="right">k</TableCell>
            <TableCell>Certificate</TableCell>
            <TableCell>Record</TableCell>
            {onCorrect ? <TableCell>Actions</TableCell> : null}
          </TableRow>
        </TableHead>
        <TableBody>
          {master.calibrations.map((calibration) => {
            const superseded = calibration.supersededById !== null;
            return (
              <TableRow key={calibration.id} sx={superseded ? { bgcolor: 'background.default' } : undefined}>
                <TableCell sx={{ whiteSpace: 'nowrap' }}>{formatDate(calibration.calibratedOn)}</TableCell>
                <TableCell sx={{ whiteSpace: 'nowrap' }}>{formatDate(calibration.dueOn)}</TableCell>
                <TableCell align="right" sx={superseded ? { textDecoration: 'line-through' } : undefined}>
                  <Figures>
                    {formatLength(calibration.calibratedSize, unit, { level: 'fine', withSymbol: false })}
                  </Figures>
                </TableCell>
                <TableCell align="right">
                  <Figures>{formatSmallLength(calibration.expandedUncertainty, unit)}</Figures>
                </TableCell>
                <TableCell align="right">
                  <Figures>{formatFixed(calibration.coverageFactor, 1)}</Figures>
                </TableCell>
                <TableCell>
                  <Link
                    href={certificateHref(master.id, calibration.id)}
                    download={calibration.certificate.filename}
                    sx={{ display: 'inline-flex', alignItems: 'center', gap: 0.5, whiteSpace: 'nowrap' }}
                  >
                    <FileDownloadOutlined fontSize="small" aria-hidden="true" />
                    {calibration.certificateNumber}
                  </Link>
                </TableCell>
                <TableCell>
                  <RecordState calibration={calibration} master={master} />
                </TableCell>
                {onCorrect ? (
                  <TableCell>
                    {superseded || master.status === 'retired' ? null : (
                      <Button size="small" onClick={() => onCorrect(calibration)}>
                        Correct
                      </Button>
                    )}
                  </TableCell>
                ) : null}
              </TableRow>
            );
          })}
        </TableBody>
      </Table>
    </TableContainer>
  );
}
