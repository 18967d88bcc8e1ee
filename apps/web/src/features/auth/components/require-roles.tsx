import type { Role } from '@evenset/contracts';
import LockOutlined from '@mui/icons-material/LockOutlined';
import Button from '@mui/material/Button';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { NoticePanel } from '../../../components/notice-panel';
import { paths } from '../../../config/paths';
import { roleList } from '../../../lib/roles';
import { useAuth } from '../hooks/use-auth';

/** Shows the page only to holders of one of `roles`; the server checks again on every request. */
export function RequireRoles({ roles, children }: { roles: readonly Role[]; children: ReactNode }) {
  const { state } = useAuth();
  const allowed = state.status === 'signed-in' && state.user.roles.some((role) => roles.includes(role));
  if (allowed) return children;
  return (
    <NoticePanel
      icon={<LockOutlined />}
      title="You don't have access to this page"
      actions={
        <Button variant="contained" component={RouterLink} to={paths.home.getHref()}>
          Go to Home
        </Button>
      }
    >
      This page is for: {roleList(roles)}. If your work needs it, ask an administrator to give you that role.
    </NoticePanel>
  );
}
