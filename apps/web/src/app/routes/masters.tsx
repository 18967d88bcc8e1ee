import AddOutlined from '@mui/icons-material/AddOutlined';
import Button from '@mui/material/Button';
import { useState } from 'react';
import { PageHeader } from '../../components/page-header';
import { WRITE_ROLES } from '../../config/permissions';
import { useMay } from '../../features/auth/hooks/use-may';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { ALL_MATERIALS, useMaterials } from '../../features/materials/api/get-materials';
import { AddMasterDialog } from '../../features/masters/components/add-master-dialog';
import { MastersGrid } from '../../features/masters/components/masters-grid';

export function MastersRoute() {
  const { displayUnit } = useSignedInUser();
  const canEdit = useMay(WRITE_ROLES.masters);
  const [adding, setAdding] = useState(false);
  const materials = useMaterials(ALL_MATERIALS);
  return (
    <>
      <PageHeader
        title="Masters"
        description="Master gauges the indicators are zeroed on, with the calibration in force. A master past its due date cannot be used at the Bench."
        actions={
          canEdit ? (
            <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setAdding(true)}>
              Add master
            </Button>
          ) : null
        }
      />
      <MastersGrid unit={displayUnit} canEdit={canEdit} />
      {adding ? (
        <AddMasterDialog unit={displayUnit} materials={materials.data?.items ?? []} onClose={() => setAdding(false)} />
      ) : null}
    </>
  );
}
