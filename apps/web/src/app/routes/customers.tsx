import AddOutlined from '@mui/icons-material/AddOutlined';
import Button from '@mui/material/Button';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '../../components/page-header';
import { paths } from '../../config/paths';
import { useMay } from '../../features/auth/hooks/use-may';
import { CUSTOMER_WRITE_ROLES } from '../../features/customers/api/customers';
import { CustomersGrid } from '../../features/customers/components/customers-grid';
import { NewCustomerDialog } from '../../features/customers/components/new-customer-dialog';

export function CustomersRoute() {
  const canCreate = useMay(CUSTOMER_WRITE_ROLES);
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  return (
    <>
      <PageHeader
        title="Customers"
        description="Who the sets went to. Open a customer for their orders, the sets sent under each and their certificates."
        actions={
          canCreate ? (
            <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setCreating(true)}>
              New customer
            </Button>
          ) : null
        }
      />
      <CustomersGrid canCreate={canCreate} />
      {creating ? (
        <NewCustomerDialog
          onCreated={(customer) => void navigate(paths.customer.getHref(customer.id))}
          onClose={() => setCreating(false)}
        />
      ) : null}
    </>
  );
}
