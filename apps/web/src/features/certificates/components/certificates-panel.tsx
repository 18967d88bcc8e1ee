import type { Certificate } from '@evenset/contracts';
import DownloadOutlined from '@mui/icons-material/DownloadOutlined';
import MailOutlined from '@mui/icons-material/MailOutlined';
import OpenInNewOutlined from '@mui/icons-material/OpenInNewOutlined';
import WorkspacePremiumOutlined from '@mui/icons-material/WorkspacePremiumOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { Figures } from '../../../components/display/figures';
import { SectionCard } from '../../../components/display/section-card';
import { useNotify } from '../../../components/feedback/notifications';
import { ReasonDialog } from '../../../components/form/reason-dialog';
import { LoadFailed } from '../../../components/load-failed';
import { paths } from '../../../config/paths';
import { useMay } from '../../auth/hooks/use-may';
import { describeError } from '../../../lib/errors';
import { formatDate } from '../../../lib/format';
import {
  certificatePdfHref,
  issueCertificate,
  revokeCertificate,
  useCertificates,
  useRevalidateCertificates,
} from '../api/certificates';
import { CertificateStatus } from './certificate-status';
import { EmailCertificateDialog } from './email-certificate-dialog';

export const ISSUE_ROLES = ['sales', 'admin'] as const;
export const REVOKE_ROLES = ['engineer', 'admin'] as const;

/** A set's certificates, with the commands to issue, download, send and revoke them. */
export function CertificatesPanel({ setId }: { setId: string }) {
  const notify = useNotify();
  const mayIssue = useMay(ISSUE_ROLES);
  const mayRevoke = useMay(REVOKE_ROLES);
  const request = useCertificates({ page: 0, pageSize: 100, setId, sort: 'createdAt:desc' });
  const revalidate = useRevalidateCertificates();
  const [issuing, setIssuing] = useState(false);
  const [issueError, setIssueError] = useState<string | null>(null);
  const [sending, setSending] = useState<Certificate | null>(null);
  const [revoking, setRevoking] = useState<Certificate | null>(null);

  const issue = async () => {
    setIssuing(true);
    setIssueError(null);
    try {
      const certificate = await issueCertificate(setId);
      notify(`Certificate ${certificate.certificateNumber} issued.`);
      await revalidate();
    } catch (error) {
      setIssueError(describeError(error));
    } finally {
      setIssuing(false);
    }
  };

  const certificates = request.data?.items ?? [];
  return (
    <SectionCard
      title="Certificates"
      description="Each certificate freezes the set's measured facts and is signed; the customer can check it on its verification page."
      actions={
        mayIssue ? (
          <Button
            variant="contained"
            startIcon={<WorkspacePremiumOutlined />}
            loading={issuing}
            onClick={() => void issue()}
          >
            Issue certificate
          </Button>
        ) : null
      }
    >
      {issueError ? (
        <Alert severity="error" sx={{ mb: 2 }} onClose={() => setIssueError(null)}>
          {issueError}
        </Alert>
      ) : null}
      {request.error ? (
        <LoadFailed what="certificates" error={request.error} onRetry={() => void request.mutate()} />
      ) : request.isLoading ? (
        <Typography sx={{ color: 'text.secondary' }}>Loading certificates…</Typography>
      ) : certificates.length === 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>
          No certificate yet.{' '}
          {mayIssue ? 'Issue one when the set is ready to ship.' : 'Sales issues one when the set ships.'}
        </Typography>
      ) : (
        <Table size="small" aria-label="Certificates of this set">
          <TableHead>
            <TableRow>
              <TableCell>Number</TableCell>
              <TableCell>Status</TableCell>
              <TableCell>Issued</TableCell>
              <TableCell>Verification code</TableCell>
              <TableCell align="right">Commands</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {certificates.map((c) => (
              <TableRow key={c.id}>
                <TableCell sx={{ whiteSpace: 'nowrap' }}>
                  <Figures>{c.certificateNumber}</Figures>
                </TableCell>
                <TableCell>
                  <CertificateStatus status={c.status} />
                  {c.revocation ? (
                    <Typography variant="body2" sx={{ color: 'text.secondary' }}>
                      {formatDate(c.revocation.at)} by {c.revocation.by}: {c.revocation.reason}
                    </Typography>
                  ) : null}
                </TableCell>
                <TableCell>
                  {formatDate(c.createdAt)} by {c.issuedBy}
                </TableCell>
                <TableCell sx={{ whiteSpace: 'nowrap' }}>
                  <Link component={RouterLink} to={paths.verify.getHref(c.verificationCode)} target="_blank">
                    <Figures>{c.verificationCode}</Figures>
                    <OpenInNewOutlined fontSize="inherit" sx={{ ml: 0.5, verticalAlign: 'middle' }} aria-hidden />
                  </Link>
                </TableCell>
                <TableCell align="right">
                  <Stack direction="row" spacing={1} sx={{ justifyContent: 'flex-end' }}>
                    <Button
                      size="small"
                      startIcon={<DownloadOutlined />}
                      href={certificatePdfHref(c.id)}
                      download={`${c.certificateNumber}.pdf`}
                      aria-label={`Download PDF of ${c.certificateNumber}`}
                    >
                      PDF
                    </Button>
                    {mayIssue && c.status === 'genuine' ? (
                      <Button
                        size="small"
                        startIcon={<MailOutlined />}
                        onClick={() => setSending(c)}
                        aria-label={`Send ${c.certificateNumber} by e-mail`}
                      >
                        Send
                      </Button>
                    ) : null}
                    {mayRevoke && !c.revocation ? (
                      <Button
                        size="small"
                        color="error"
                        onClick={() => setRevoking(c)}
                        aria-label={`Revoke ${c.certificateNumber}`}
                      >
                        Revoke
                      </Button>
                    ) : null}
                  </Stack>
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
      {sending ? <EmailCertificateDialog certificate={sending} onClose={() => setSending(null)} /> : null}
      {revoking ? (
        <ReasonDialog
          title={`Revoke ${revoking.certificateNumber}`}
          text="A revoked certificate stays on record; its verification page then says it was withdrawn, and why."
          submitLabel="Revoke certificate"
          done={`Certificate ${revoking.certificateNumber} revoked.`}
          onConfirm={async ({ reason }) => {
            await revokeCertificate(revoking.id, reason);
            await revalidate();
          }}
          onClose={() => setRevoking(null)}
        />
      ) : null}
    </SectionCard>
  );
}
