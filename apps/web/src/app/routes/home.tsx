import type { Home, Role } from '@evenset/contracts';
import { ROLE_LABELS } from '@evenset/contracts';
import Box from '@mui/material/Box';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { ReactNode } from 'react';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { useHome } from '../../features/home/api/get-home';
import { ROLE_TILES } from '../../features/home/components/role-sections';
import { ROLE_WORK } from '../../features/home/role-work';
import { inRoleOrder } from '../../lib/roles';
import { slate } from '../../theme/tokens';

function tilesOf(role: Role, home: Home): ReactNode {
  switch (role) {
    case 'inspector':
      return home.inspector ? ROLE_TILES.inspector(home.inspector) : null;
    case 'engineer':
      return home.engineer ? ROLE_TILES.engineer(home.engineer) : null;
    case 'sales':
      return home.sales ? ROLE_TILES.sales(home.sales) : null;
    case 'service':
      return home.service ? ROLE_TILES.service(home.service) : null;
    case 'admin':
      return home.admin ? ROLE_TILES.admin(home.admin) : null;
  }
}

/** One role's work: what the role is for, then a tile per kind of waiting work. */
function RoleSection({ role, children }: { role: Role; children: ReactNode }) {
  const { icon: Icon, work } = ROLE_WORK[role];
  return (
    <Box component="section" aria-labelledby={`role-${role}`}>
      <Stack direction="row" spacing={1.5} sx={{ alignItems: 'center', mb: 0.5 }}>
        <Box
          sx={{
            display: 'grid',
            placeItems: 'center',
            width: 36,
            height: 36,
            borderRadius: 1,
            bgcolor: slate[100],
            color: slate[800],
          }}
        >
          <Icon />
        </Box>
        <Typography variant="h2" id={`role-${role}`}>
          {ROLE_LABELS[role]}
        </Typography>
      </Stack>
      <Typography sx={{ color: 'text.secondary', mb: 2, maxWidth: '80ch' }}>{work}</Typography>
      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'repeat(auto-fill, minmax(min(100%, 320px), 1fr))' }}>
        {children}
      </Box>
    </Box>
  );
}

export function HomeRoute() {
  const user = useSignedInUser();
  const roles = inRoleOrder(user.roles);
  const { data: home, error, mutate } = useHome();
  return (
    <>
      <PageHeader
        title={`Welcome, ${user.displayName}`}
        documentTitle="Home"
        description={
          roles.length > 1
            ? 'Your work waiting in each of your roles. Each tile opens the page where it is done.'
            : 'Your work waiting. Each tile opens the page where it is done.'
        }
      />
      {error ? (
        <LoadFailed what="work waiting for you" error={error} onRetry={() => void mutate()} />
      ) : !home ? (
        <PageLoading />
      ) : (
        <Stack spacing={4}>
          {roles.map((role) => (
            <RoleSection key={role} role={role}>
              {tilesOf(role, home)}
            </RoleSection>
          ))}
        </Stack>
      )}
    </>
  );
}
