import type { Role, User } from '@evenset/contracts';
import BlockOutlined from '@mui/icons-material/BlockOutlined';
import KeyOutlined from '@mui/icons-material/KeyOutlined';
import ManageAccountsOutlined from '@mui/icons-material/ManageAccountsOutlined';
import RestartAltOutlined from '@mui/icons-material/RestartAltOutlined';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import { GridActionsCellItem, type GridColDef } from '@mui/x-data-grid';
import { useMemo, useState } from 'react';
import { AppDataGrid } from '../../../components/app-data-grid';
import { useGridListQuery } from '../../../components/data-grid/use-grid-list-query';
import { RoleChips } from './role-chips';
import { formatDate } from '../../../lib/format';
import { roleList } from '../../../lib/roles';
import { useUsers } from '../api/get-users';
import { AccountStatus } from './account-status';
import { ChangeRolesDialog } from './change-roles-dialog';
import { ConfirmAccountDialog } from './confirm-account-dialog';
import { SetPasswordDialog } from './set-password-dialog';

type PersonAction = { kind: 'roles' | 'password' | 'account'; person: User };

function peopleColumns(currentUserId: string, act: (action: PersonAction) => void): GridColDef<User>[] {
  return [
    {
      field: 'displayName',
      headerName: 'Name',
      flex: 1,
      minWidth: 200,
      renderCell: ({ row }) => (
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center', height: '100%' }}>
          <span>{row.displayName}</span>
          {row.id === currentUserId ? <Chip label="You" size="small" variant="outlined" /> : null}
        </Stack>
      ),
    },
    { field: 'email', headerName: 'E-mail', flex: 1.2, minWidth: 240 },
    {
      field: 'roles',
      headerName: 'Roles',
      flex: 1.2,
      minWidth: 240,
      sortable: false,
      // The text form is what the CSV download gets.
      valueGetter: (roles: Role[]) => roleList(roles),
      renderCell: ({ row }) => (
        <Stack sx={{ height: '100%', justifyContent: 'center' }}>
          <RoleChips roles={row.roles} />
        </Stack>
      ),
    },
    {
      field: 'active',
      headerName: 'Status',
      width: 150,
      sortable: false,
      valueGetter: (active: boolean) => (active ? 'Active' : 'Deactivated'),
      renderCell: ({ row }) => <AccountStatus active={row.active} />,
    },
    {
      field: 'createdAt',
      headerName: 'Added',
      width: 140,
      valueFormatter: (createdAt: string) => formatDate(createdAt),
    },
    {
      field: 'actions',
      type: 'actions',
      headerName: 'Actions',
      width: 90,
      getActions: ({ row }) => [
        <GridActionsCellItem
          key="roles"
          showInMenu
          icon={<ManageAccountsOutlined />}
          label="Change roles"
          onClick={() => act({ kind: 'roles', person: row })}
        />,
        <GridActionsCellItem
          key="password"
          showInMenu
          icon={<KeyOutlined />}
          label="Set new password"
          onClick={() => act({ kind: 'password', person: row })}
        />,
        <GridActionsCellItem
          key="account"
          showInMenu
          icon={row.active ? <BlockOutlined /> : <RestartAltOutlined />}
          label={row.active ? 'Deactivate' : 'Reactivate'}
          onClick={() => act({ kind: 'account', person: row })}
        />,
      ],
    },
  ];
}

/** Everyone who can (or could) sign in, with what an admin can change about them. */
export function PeopleGrid({ currentUserId }: { currentUserId: string }) {
  const list = useGridListQuery([{ field: 'displayName', sort: 'asc' }]);
  const request = useUsers(list.query);
  const [action, setAction] = useState<PersonAction | null>(null);
  const columns = useMemo(() => peopleColumns(currentUserId, setAction), [currentUserId]);
  const close = () => setAction(null);

  return (
    <>
      <AppDataGrid
        label="People"
        columns={columns}
        request={request}
        list={list}
        searchLabel="Search people"
        emptyState={{ title: 'No people yet', hint: 'Add the first person with “Add person” above.' }}
        csvFileName="evenset-people"
      />
      {action?.kind === 'roles' ? <ChangeRolesDialog person={action.person} onClose={close} /> : null}
      {action?.kind === 'password' ? <SetPasswordDialog person={action.person} onClose={close} /> : null}
      {action?.kind === 'account' ? <ConfirmAccountDialog person={action.person} onClose={close} /> : null}
    </>
  );
}
