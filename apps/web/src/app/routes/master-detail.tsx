import type { Calibration, CorrectionImpact } from '@evenset/contracts';
import AddOutlined from '@mui/icons-material/AddOutlined';
import DoNotDisturbOnOutlined from '@mui/icons-material/DoNotDisturbOnOutlined';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { BackLink } from '../../components/back-link';
import { SectionCard } from '../../components/display/section-card';
import { ReasonDialog } from '../../components/form/reason-dialog';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { paths } from '../../config/paths';
import { WRITE_ROLES } from '../../config/permissions';
import { useMay } from '../../features/auth/hooks/use-may';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { useMaster } from '../../features/masters/api/get-master';
import { useRevalidateMasters } from '../../features/masters/api/get-masters';
import { retireMaster } from '../../features/masters/api/retire-master';
import { CalibrationDialog } from '../../features/masters/components/calibration-dialog';
import { CorrectionImpactDialog } from '../../features/masters/components/correction-impact-dialog';
import { CalibrationHistory } from '../../features/masters/components/calibration-history';
import { MasterSummary } from '../../features/masters/components/master-summary';

type Dialog =
  | { kind: 'calibrate'; corrects?: Calibration }
  | { kind: 'retire' }
  | { kind: 'impact'; impact: CorrectionImpact }
  | null;

export function MasterDetailRoute() {
  const { masterId = '' } = useParams();
  const { displayUnit } = useSignedInUser();
  const canEdit = useMay(WRITE_ROLES.masters);
  const { data: master, error, mutate } = useMaster(masterId);
  const revalidate = useRevalidateMasters();
  const [dialog, setDialog] = useState<Dialog>(null);

  if (error) return <LoadFailed what="master gauge" error={error} onRetry={() => void mutate()} />;
  if (!master) return <PageLoading />;
  const editable = canEdit && master.status !== 'retired';
  const close = () => setDialog(null);

  return (
    <>
      <BackLink to={paths.masters.getHref()} label="All masters" />
      <PageHeader
        title={`Master ${master.code}`}
        description={master.description}
        actions={
          editable ? (
            <>
              <Button
                variant="outlined"
                color="error"
                startIcon={<DoNotDisturbOnOutlined />}
                onClick={() => setDialog({ kind: 'retire' })}
              >
                Retire
              </Button>
              <Button variant="contained" startIcon={<AddOutlined />} onClick={() => setDialog({ kind: 'calibrate' })}>
                Record calibration
              </Button>
            </>
          ) : null
        }
      />
      <Stack spacing={3}>
        <SectionCard title="Calibration in force">
          <MasterSummary master={master} unit={displayUnit} />
        </SectionCard>
        <SectionCard
          title="Calibration history"
          description="Every calibration recorded, newest first. A corrected record stays here, marked as superseded, with the reason."
        >
          <CalibrationHistory
            master={master}
            unit={displayUnit}
            onCorrect={editable ? (corrects) => setDialog({ kind: 'calibrate', corrects }) : undefined}
          />
        </SectionCard>
      </Stack>
      {dialog?.kind === 'calibrate' ? (
        <CalibrationDialog
          masterId={master.id}
          masterCode={master.code}
          unit={displayUnit}
          corrects={dialog.corrects}
          onClose={close}
          onRecorded={(result) => setDialog(result.impact ? { kind: 'impact', impact: result.impact } : null)}
        />
      ) : null}
      {dialog?.kind === 'impact' ? (
        <CorrectionImpactDialog masterCode={master.code} impact={dialog.impact} unit={displayUnit} onClose={close} />
      ) : null}
      {dialog?.kind === 'retire' ? (
        <ReasonDialog
          title={`Retire ${master.code}?`}
          text="A retired master can no longer be used at the Bench. Its calibrations and the heights measured against it stay on record."
          submitLabel="Retire"
          done={`${master.code} was retired.`}
          onConfirm={async (input) => {
            await retireMaster(master.id, input);
            await revalidate();
          }}
          onClose={close}
        />
      ) : null}
    </>
  );
}
