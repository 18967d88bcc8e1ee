import AddOutlined from '@mui/icons-material/AddOutlined';
import ViewModuleOutlined from '@mui/icons-material/ViewModuleOutlined';
import Button from '@mui/material/Button';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { BackLink } from '../../components/back-link';
import { DetailList } from '../../components/display/detail-list';
import { SectionCard } from '../../components/display/section-card';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { paths } from '../../config/paths';
import { useMay } from '../../features/auth/hooks/use-may';
import { CUSTOMER_WRITE_ROLES, useCustomer } from '../../features/customers/api/customers';
import { CustomerCertificates } from '../../features/customers/components/customer-certificates';
import { CustomerOrders } from '../../features/customers/components/customer-orders';
import { NewOrderDialog } from '../../features/customers/components/new-order-dialog';
import { BUILD_ROLES } from '../../features/sets/api/sets';
import { formatDate } from '../../lib/format';

export function CustomerDetailRoute() {
  const { customerId = '' } = useParams();
  const canAddOrder = useMay(CUSTOMER_WRITE_ROLES);
  const canBuild = useMay(BUILD_ROLES);
  const { data: customer, error, mutate } = useCustomer(customerId);
  const [addingOrder, setAddingOrder] = useState(false);

  if (error) return <LoadFailed what="customer" error={error} onRetry={() => void mutate()} />;
  if (!customer) return <PageLoading />;
  return (
    <>
      <BackLink to={paths.customers.getHref()} label="All customers" />
      <PageHeader
        title={customer.name}
        description={customer.notes ?? undefined}
        actions={
          <>
            {canAddOrder ? (
              <Button variant="outlined" startIcon={<AddOutlined />} onClick={() => setAddingOrder(true)}>
                New order
              </Button>
            ) : null}
            {canBuild ? (
              <Button
                variant="contained"
                startIcon={<ViewModuleOutlined />}
                component={RouterLink}
                to={paths.setNew.getHref(customer.id)}
              >
                Build sets
              </Button>
            ) : null}
          </>
        }
      />
      <Stack spacing={3}>
        <SectionCard title="Customer">
          <DetailList
            items={[
              {
                label: 'Contact e-mail',
                value: <Link href={`mailto:${customer.contactEmail}`}>{customer.contactEmail}</Link>,
              },
              { label: 'Orders', value: customer.orderCount },
              { label: 'Sets', value: customer.setCount },
              { label: 'Customer since', value: formatDate(customer.createdAt) },
            ]}
          />
        </SectionCard>
        <SectionCard
          title="Orders and sets"
          description="Newest order first. A set number opens its heights and certificates."
        >
          <CustomerOrders orders={customer.orders} canAdd={canAddOrder} />
        </SectionCard>
        <SectionCard
          title="Certificates"
          description="The number downloads the PDF; the set's page has the commands to send or revoke one."
        >
          <CustomerCertificates customerId={customer.id} />
        </SectionCard>
      </Stack>
      {addingOrder ? (
        <NewOrderDialog customerId={customer.id} customerName={customer.name} onClose={() => setAddingOrder(false)} />
      ) : null}
    </>
  );
}
