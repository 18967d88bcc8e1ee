import type { AuditEntry } from '@evenset/contracts';
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
import { alpha } from '@mui/material/styles';
import { DetailList } from '../../../components/display/detail-list';
import { ochre } from '../../../theme/tokens';
import { diffRecords, type FieldChange } from '../diff';
import { formatWhen } from './format';

const KIND_TEXT: Record<FieldChange['kind'], string> = {
  added: 'Set',
  removed: 'Removed',
  changed: 'Changed',
  unchanged: '',
};

/** One entry: who, when, why, and the record before and after, field by field. */
export function AuditEntryDialog({ entry, onClose }: { entry: AuditEntry; onClose: () => void }) {
  const rows = diffRecords(entry.before, entry.after);
  return (
    <Dialog open onClose={onClose} maxWidth="md" fullWidth aria-labelledby="audit-entry-title">
      <DialogTitle id="audit-entry-title">{entry.action}</DialogTitle>
      <DialogContent dividers>
        <Stack spacing={2.5}>
          <DetailList
            items={[
              { label: 'When', value: formatWhen(entry.createdAt) },
              { label: 'Who', value: entry.actorName },
              { label: 'Record', value: `${entry.subjectType} ${entry.subjectId}` },
              { label: 'Reason', value: entry.reason ?? 'None given' },
            ]}
          />
          {rows.length ? (
            <Table size="small" aria-label="Before and after">
              <TableHead>
                <TableRow>
                  <TableCell component="th">Field</TableCell>
                  <TableCell component="th">Before</TableCell>
                  <TableCell component="th">After</TableCell>
                  <TableCell component="th">Change</TableCell>
                </TableRow>
              </TableHead>
              <TableBody>
                {rows.map((row) => (
                  <TableRow
                    key={row.field}
                    sx={row.kind === 'unchanged' ? undefined : { bgcolor: alpha(ochre[300], 0.2) }}
                    data-change={row.kind}
                  >
                    <TableCell sx={{ fontWeight: 500 }}>{row.label}</TableCell>
                    <TableCell sx={{ overflowWrap: 'anywhere' }}>{row.before ?? ''}</TableCell>
                    <TableCell sx={{ overflowWrap: 'anywhere' }}>{row.after ?? ''}</TableCell>
                    <TableCell>{KIND_TEXT[row.kind]}</TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          ) : (
            <Typography sx={{ color: 'text.secondary' }}>
              This entry records the action only, with no values.
            </Typography>
          )}
          <Typography variant="body2" sx={{ color: 'text.secondary' }}>
            Lengths in audit entries are as stored, in millimetres.
          </Typography>
        </Stack>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Close</Button>
      </DialogActions>
    </Dialog>
  );
}
