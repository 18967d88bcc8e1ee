import PersonAddOutlined from '@mui/icons-material/PersonAddOutlined';
import Button from '@mui/material/Button';
import { useState } from 'react';
import { PageHeader } from '../../components/page-header';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { AddPersonDialog } from '../../features/users/components/add-person-dialog';
import { PeopleGrid } from '../../features/users/components/people-grid';

export function PeopleRoute() {
  const user = useSignedInUser();
  const [adding, setAdding] = useState(false);
  return (
    <>
      <PageHeader
        title="People"
        description="Who can sign in to Evenset and what each person may do. Deactivated people keep their records but cannot sign in."
        actions={
          <Button variant="contained" startIcon={<PersonAddOutlined />} onClick={() => setAdding(true)}>
            Add person
          </Button>
        }
      />
      <PeopleGrid currentUserId={user.id} />
      {adding ? <AddPersonDialog onClose={() => setAdding(false)} /> : null}
    </>
  );
}
