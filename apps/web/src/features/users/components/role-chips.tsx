import { ROLE_LABELS, type Role } from '@evenset/contracts';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import { inRoleOrder } from '../../../lib/roles';

export function RoleChips({ roles }: { roles: readonly Role[] }) {
  return (
    <Stack direction="row" spacing={0.75} useFlexGap sx={{ flexWrap: 'wrap' }}>
      {inRoleOrder(roles).map((role) => (
        <Chip key={role} label={ROLE_LABELS[role]} size="small" />
      ))}
    </Stack>
  );
}
