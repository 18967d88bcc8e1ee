import Link from '@mui/material/Link';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { Figures } from '../../../components/display/figures';
import { LoadFailed } from '../../../components/load-failed';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { certificatePdfHref, useCertificates } from '../../certificates/api/certificates';
import { CertificateStatus } from '../../certificates/components/certificate-status';

/** Every certificate issued for this customer's sets, newest first: what service is asked about. */
export function CustomerCertificates({ customerId }: { customerId: string }) {
  const request = useCertificates({ page: 0, pageSize: 100, customerId, sort: 'createdAt:desc' });
  if (request.error)
    return <LoadFailed what="certificates" error={request.error} onRetry={() => void request.mutate()} />;
  if (!request.data) return <Typography sx={{ color: 'text.secondary' }}>Loading certificates…</Typography>;
  const certificates = request.data.items;
  if (certificates.length === 0)
    return <Typography sx={{ color: 'text.secondary' }}>No certificate issued for this customer yet.</Typography>;
  return (
    <Table size="small" aria-label="Certificates of this customer">
      <TableHead>
        <TableRow>
          <TableCell>Number</TableCell>
          <TableCell>Set</TableCell>
          <TableCell>Order</TableCell>
          <TableCell>Status</TableCell>
          <TableCell>Issued</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {certificates.map((c) => (
          <TableRow key={c.id}>
            <TableCell>
              <Link href={certificatePdfHref(c.id)} download={`${c.certificateNumber}.pdf`}>
                <Figures>{c.certificateNumber}</Figures>
              </Link>
            </TableCell>
            <TableCell>
              <Link component={RouterLink} to={paths.set.getHref(c.setId)}>
                {c.setNumber}
              </Link>
            </TableCell>
            <TableCell>{c.orderReference}</TableCell>
            <TableCell>
              <CertificateStatus status={c.status} />
            </TableCell>
            <TableCell>
              {formatDate(c.createdAt)} by {c.issuedBy}
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
