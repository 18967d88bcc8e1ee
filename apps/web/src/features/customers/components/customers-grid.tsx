import type { Customer } from '@evenset/contracts';
import type { GridColDef } from '@mui/x-data-grid';
import { useNavigate } from 'react-router-dom';
import { AppDataGrid } from '../../../components/app-data-grid';
import { figuresColumn } from '../../../components/data-grid/length-column';
import { linkColumn } from '../../../components/data-grid/link-column';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { paths } from '../../../config/paths';
import { useCustomers } from '../api/customers';

const columns: GridColDef<Customer>[] = [
  linkColumn<Customer>({ field: 'name', headerName: 'Customer', flex: 1, minWidth: 220 }, (row) =>
    paths.customer.getHref(row.id),
  ),
  { field: 'contactEmail', headerName: 'Contact e-mail', flex: 1, minWidth: 220 },
  figuresColumn<Customer>({ field: 'orderCount', headerName: 'Orders', width: 110, sortable: false }),
  figuresColumn<Customer>({ field: 'setCount', headerName: 'Sets', width: 110, sortable: false }),
];

/** Customers by name; a row opens the customer's orders and sets. */
export function CustomersGrid({ canCreate }: { canCreate: boolean }) {
  const navigate = useNavigate();
  const list = useGridListQuery([{ field: 'name', sort: 'asc' }]);
  const request = useCustomers(list.query);
  return (
    <AppDataGrid
      label="Customers"
      columns={columns}
      request={request}
      list={list}
      searchLabel="Search customers"
      emptyState={{
        title: 'No customers yet',
        hint: canCreate
          ? 'Add one with “New customer” above, or while building sets.'
          : 'Sales adds customers when they build sets for them.',
      }}
      csvFileName="evenset-customers"
      onRowClick={(row) => void navigate(paths.customer.getHref(row.id))}
    />
  );
}
