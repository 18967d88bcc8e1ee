import AttachFileOutlined from '@mui/icons-material/AttachFileOutlined';
import Alert from '@mui/material/Alert';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import CircularProgress from '@mui/material/CircularProgress';
import Dialog from '@mui/material/Dialog';
import DialogActions from '@mui/material/DialogActions';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { DetailList } from '../../../components/display/detail-list';
import { describeError } from '../../../lib/errors';
import { attachmentHref, useCapturedMailDetail } from '../api/outbox';
import { formatBytes, formatDateTime } from './format';

/** One received message: who, when, its text, and its attachments to download. */
export function CapturedMailDialog({ id, onClose }: { id: string; onClose: () => void }) {
  const { data: mail, error } = useCapturedMailDetail(id);
  return (
    <Dialog open onClose={onClose} maxWidth="md" fullWidth aria-labelledby="captured-mail-title">
      <DialogTitle id="captured-mail-title">{mail?.subject || 'Received message'}</DialogTitle>
      <DialogContent dividers>
        {error ? (
          <Alert severity="error">{describeError(error)}</Alert>
        ) : !mail ? (
          <Stack sx={{ alignItems: 'center', py: 4 }}>
            <CircularProgress aria-label="Loading the message" />
          </Stack>
        ) : (
          <Stack spacing={2.5}>
            <DetailList
              items={[
                { label: 'From', value: mail.from },
                { label: 'To', value: mail.to.join(', ') },
                { label: 'Sent', value: mail.date ? formatDateTime(mail.date) : 'Not stated' },
                { label: 'Received', value: formatDateTime(mail.receivedAt) },
              ]}
            />
            <Box
              component="pre"
              aria-label="Message text"
              sx={{
                m: 0,
                p: 2,
                bgcolor: 'action.hover',
                borderRadius: 1,
                whiteSpace: 'pre-wrap',
                overflowWrap: 'anywhere',
                fontFamily: 'inherit',
              }}
            >
              {mail.text || '(This message has no text.)'}
            </Box>
            {mail.attachments.length ? (
              <div>
                <Typography variant="h3" sx={{ mb: 1 }}>
                  Attachments
                </Typography>
                <Stack component="ul" spacing={0.5} sx={{ m: 0, pl: 0, listStyle: 'none' }}>
                  {mail.attachments.map((file, index) => (
                    <Stack component="li" key={`${index}-${file.filename}`} direction="row" spacing={1}>
                      <AttachFileOutlined fontSize="small" aria-hidden="true" />
                      <Link href={attachmentHref(mail.id, index)} download={file.filename}>
                        {file.filename}
                      </Link>
                      <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                        {file.contentType}, {formatBytes(file.size)}
                      </Typography>
                    </Stack>
                  ))}
                </Stack>
              </div>
            ) : null}
          </Stack>
        )}
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose}>Close</Button>
      </DialogActions>
    </Dialog>
  );
}
