import Box from '@mui/material/Box';
import { PageHeader } from '../../components/page-header';
import { navigationFor } from '../../config/navigation';
import { paths } from '../../config/paths';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { RoleCard } from '../../features/home/components/role-card';
import { inRoleOrder } from '../../lib/roles';

export function HomeRoute() {
  const user = useSignedInUser();
  const roles = inRoleOrder(user.roles);
  return (
    <>
      <PageHeader
        title={`Welcome, ${user.displayName}`}
        documentTitle="Home"
        description={
          roles.length > 1
            ? 'You hold several roles. Here is what each one covers in Evenset.'
            : 'Here is what your role covers in Evenset.'
        }
      />
      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'repeat(auto-fill, minmax(min(100%, 340px), 1fr))' }}>
        {roles.map((role) => (
          <RoleCard
            key={role}
            role={role}
            pages={navigationFor([role]).filter((item) => item.path !== paths.home.path)}
          />
        ))}
      </Box>
    </>
  );
}
