import AddOutlined from '@mui/icons-material/AddOutlined';
import Button from '@mui/material/Button';
import { useState } from 'react';
import { PageHeader } from '../../components/page-header';
import { WRITE_ROLES } from '../../config/permissions';
import { useMay } from '../../features/auth/hooks/use-may';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { InstrumentDialog } from '../../features/instruments/components/instrument-dialog';
import { InstrumentsGrid } from '../../features/instruments/components/instruments-grid';

export function InstrumentsRoute() {
  const { displayUnit } = useSignedInUser();
  const canEdit = useMay(WRITE_ROLES.instruments);
  const [adding, setAdding] = useState(false);
  return (
    <>
      <PageHeader
        title="Instruments"
        description="Indicators, height gauges and probes used at the surface plate. An instrument past its calibration due date cannot be chosen at the Bench."
        actions={
          canEdit ? (
            <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setAdding(true)}>
              Add instrument
            </Button>
          ) : null
        }
      />
      <InstrumentsGrid unit={displayUnit} canEdit={canEdit} />
      {adding ? <InstrumentDialog instrument={null} unit={displayUnit} onClose={() => setAdding(false)} /> : null}
    </>
  );
}
