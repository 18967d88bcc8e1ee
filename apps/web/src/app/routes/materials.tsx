import AddOutlined from '@mui/icons-material/AddOutlined';
import Button from '@mui/material/Button';
import { useState } from 'react';
import { PageHeader } from '../../components/page-header';
import { WRITE_ROLES } from '../../config/permissions';
import { useMay } from '../../features/auth/hooks/use-may';
import { MaterialDialog } from '../../features/materials/components/material-dialog';
import { MaterialsGrid } from '../../features/materials/components/materials-grid';

export function MaterialsRoute() {
  const canEdit = useMay(WRITE_ROLES.materials);
  const [adding, setAdding] = useState(false);
  return (
    <>
      <PageHeader
        title="Materials"
        description="Thermal expansion coefficients used to correct heights to 20 °C, each with where the value comes from. Specs and master gauges name one of these."
        actions={
          canEdit ? (
            <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setAdding(true)}>
              Add material
            </Button>
          ) : null
        }
      />
      <MaterialsGrid canEdit={canEdit} />
      {adding ? <MaterialDialog material={null} onClose={() => setAdding(false)} /> : null}
    </>
  );
}
