import type { Certificate } from '@evenset/contracts';
import type { GridColDef } from '@mui/x-data-grid';
import Link from '@mui/material/Link';
import { Link as RouterLink } from 'react-router-dom';
import { AppDataGrid } from '../../../components/app-data-grid';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { certificatePdfHref, useCertificates } from '../api/certificates';
import { CertificateStatus } from './certificate-status';

const columns: GridColDef<Certificate>[] = [
  {
    field: 'certificateNumber',
    headerName: 'Number',
    width: 150,
    renderCell: ({ row }) => (
      <Link href={certificatePdfHref(row.id)} download={`${row.certificateNumber}.pdf`} sx={{ fontWeight: 500 }}>
        {row.certificateNumber}
      </Link>
    ),
  },
  {
    field: 'status',
    headerName: 'Status',
    width: 180,
    sortable: false,
    renderCell: ({ row }) => <CertificateStatus status={row.status} />,
  },
  { field: 'customerName', headerName: 'Customer', flex: 1, minWidth: 180, sortable: false },
  { field: 'orderReference', headerName: 'Order', width: 140, sortable: false },
  {
    field: 'setNumber',
    headerName: 'Set',
    width: 140,
    sortable: false,
    valueGetter: (_v, row) => `${row.partNumber} ${row.setNumber}`,
  },
  {
    field: 'verificationCode',
    headerName: 'Verification code',
    width: 170,
    sortable: false,
    renderCell: ({ row }) => (
      <Link component={RouterLink} to={paths.verify.getHref(row.verificationCode)} target="_blank">
        {row.verificationCode}
      </Link>
    ),
  },
  { field: 'issuedBy', headerName: 'Issued by', width: 150, sortable: false },
  { field: 'createdAt', headerName: 'Issued', width: 130, valueGetter: (value: string) => formatDate(value) },
];

/** Every certificate, newest first; search by number, code, set, order or customer. */
export function CertificatesGrid() {
  const list = useGridListQuery([{ field: 'createdAt', sort: 'desc' }]);
  const request = useCertificates(list.query);
  return (
    <AppDataGrid
      label="Certificates"
      columns={columns}
      request={request}
      list={list}
      searchLabel="Search by number, code, set, order or customer"
      emptyState={{
        title: 'No certificates yet',
        hint: 'Sales issues a certificate from a set’s page once the set is allocated to an order.',
      }}
      csvFileName="evenset-certificates"
    />
  );
}
