import type { CustomerDetail } from '@evenset/contracts';
import Link from '@mui/material/Link';
import Paper from '@mui/material/Paper';
import Stack from '@mui/material/Stack';
import Table from '@mui/material/Table';
import TableBody from '@mui/material/TableBody';
import TableCell from '@mui/material/TableCell';
import TableHead from '@mui/material/TableHead';
import TableRow from '@mui/material/TableRow';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { Figures } from '../../../components/display/figures';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { SET_KIND_LABELS } from '../../sets/set-format';

type CustomerOrder = CustomerDetail['orders'][number];

/** One order: its reference and the sets and replacement parts sent under it. */
function OrderBlock({ order }: { order: CustomerOrder }) {
  return (
    <Paper component="article" variant="outlined" aria-label={`Order ${order.reference}`} sx={{ p: 2 }}>
      <Stack direction="row" spacing={2} sx={{ alignItems: 'baseline', flexWrap: 'wrap', mb: 1 }}>
        <Typography variant="h3" component="h3">
          Order {order.reference}
        </Typography>
        <Typography variant="body2" sx={{ color: 'text.secondary' }}>
          {formatDate(order.createdAt)}
          {order.notes ? ` — ${order.notes}` : ''}
        </Typography>
      </Stack>
      {order.sets.length === 0 ? (
        <Typography sx={{ color: 'text.secondary' }}>No sets allocated to this order yet.</Typography>
      ) : (
        <Table size="small" aria-label={`Sets of order ${order.reference}`}>
          <TableHead>
            <TableRow>
              <TableCell>Set</TableCell>
              <TableCell>Kind</TableCell>
              <TableCell>Part number</TableCell>
              <TableCell>Serials</TableCell>
              <TableCell>Allocated</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {order.sets.map((set) => (
              <TableRow key={set.id}>
                <TableCell>
                  <Link component={RouterLink} to={paths.set.getHref(set.id)} sx={{ fontWeight: 500 }}>
                    {set.setNumber}
                  </Link>
                </TableCell>
                <TableCell>{SET_KIND_LABELS[set.kind]}</TableCell>
                <TableCell>{set.partNumber}</TableCell>
                <TableCell>
                  <Figures>{set.serials.join(', ')}</Figures>
                </TableCell>
                <TableCell>{formatDate(set.createdAt)}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </Paper>
  );
}

/** A customer's orders, newest first, each with its sets. */
export function CustomerOrders({ orders, canAdd }: { orders: CustomerDetail['orders']; canAdd: boolean }) {
  if (orders.length === 0)
    return (
      <Typography sx={{ color: 'text.secondary' }}>
        No orders yet.{' '}
        {canAdd ? 'Add one with “New order”, or give a new reference when you build sets.' : 'Sales adds them.'}
      </Typography>
    );
  return (
    <Stack spacing={2}>
      {orders.map((order) => (
        <OrderBlock key={order.id} order={order} />
      ))}
    </Stack>
  );
}
