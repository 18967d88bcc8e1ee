import AddOutlined from '@mui/icons-material/AddOutlined';
import Button from '@mui/material/Button';
import { useState } from 'react';
import { PageHeader } from '../../components/page-header';
import { WRITE_ROLES } from '../../config/permissions';
import { useMay } from '../../features/auth/hooks/use-may';
import { CreateLotDialog } from '../../features/lots/components/create-lot-dialog';
import { LotsGrid } from '../../features/lots/components/lots-grid';
import { useSpecs } from '../../features/specs/api/get-specs';

const RELEASED_SPECS = { page: 0, pageSize: 100, status: 'released' } as const;

export function LotsRoute() {
  const canCreate = useMay(WRITE_ROLES.lots);
  const [creating, setCreating] = useState(false);
  const specs = useSpecs(RELEASED_SPECS);
  return (
    <>
      <PageHeader
        title="Lots"
        description="Ground parts by lot. Open a lot to review every part's height, form and verdict."
        actions={
          canCreate ? (
            <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setCreating(true)}>
              New lot
            </Button>
          ) : null
        }
      />
      <LotsGrid canCreate={canCreate} />
      {creating ? <CreateLotDialog specs={specs.data?.items ?? []} onClose={() => setCreating(false)} /> : null}
    </>
  );
}
