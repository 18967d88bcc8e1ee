import type { PartStatus } from '@evenset/contracts';
import GavelOutlined from '@mui/icons-material/GavelOutlined';
import VerifiedOutlined from '@mui/icons-material/VerifiedOutlined';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { BackLink } from '../../components/back-link';
import { SectionCard } from '../../components/display/section-card';
import { PartStatusLabel } from '../../components/display/verdict-label';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { paths } from '../../config/paths';
import { WRITE_ROLES } from '../../config/permissions';
import { useMay } from '../../features/auth/hooks/use-may';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { useRevalidateLots } from '../../features/lots/api/get-lots';
import { usePart } from '../../features/lots/api/get-part';
import { DispositionDialog } from '../../features/lots/components/disposition-dialog';
import { DispositionHistory } from '../../features/lots/components/disposition-history';
import { FaceMap } from '../../features/lots/components/face-map';
import { InspectionHistory } from '../../features/lots/components/inspection-history';
import { PartMatching } from '../../features/lots/components/part-matching';
import { ReleaseDialog } from '../../features/lots/components/release-dialog';

const NEEDS_DISPOSITION: ReadonlySet<PartStatus> = new Set(['does-not-conform', 'guard-band', 'held']);
const RELEASABLE: ReadonlySet<PartStatus> = new Set(['conforms', 'use-as-is']);

export function PartDetailRoute() {
  const { partId = '' } = useParams();
  const { displayUnit } = useSignedInUser();
  const canDecide = useMay(WRITE_ROLES.lots);
  const { data: part, error, mutate } = usePart(partId);
  const revalidate = useRevalidateLots();
  const [dialog, setDialog] = useState<'dispose' | 'release' | null>(null);

  if (error) return <LoadFailed what="part" error={error} onRetry={() => void mutate()} />;
  if (!part) return <PageLoading />;
  const current = part.inspections.find((i) => i.supersededById === null);
  const close = () => setDialog(null);

  return (
    <>
      <BackLink to={paths.lot.getHref(part.lot.id)} label={`Lot ${part.lot.lotNumber}`} />
      <PageHeader
        title={`Part ${part.serial}`}
        description={
          <>
            {part.partNumber}, lot {part.lot.lotNumber}
          </>
        }
        actions={
          canDecide ? (
            <>
              {NEEDS_DISPOSITION.has(part.status) ? (
                <Button variant="contained" startIcon={<GavelOutlined />} onClick={() => setDialog('dispose')}>
                  Disposition
                </Button>
              ) : null}
              {RELEASABLE.has(part.status) ? (
                <Button variant="contained" startIcon={<VerifiedOutlined />} onClick={() => setDialog('release')}>
                  Release
                </Button>
              ) : null}
            </>
          ) : null
        }
      />
      <Stack spacing={3}>
        <SectionCard title="Status">
          <Typography component="div" sx={{ fontSize: '1.1rem' }}>
            <PartStatusLabel status={part.status} />
          </Typography>
          <PartMatching part={part} unit={displayUnit} />
        </SectionCard>
        {current?.result.flatness ? (
          <SectionCard
            title="Face map"
            description="The current inspection's top-face stations, coloured by height above the minimum zone's lower plane."
          >
            <FaceMap flatness={current.result.flatness} unit={displayUnit} />
          </SectionCard>
        ) : null}
        <SectionCard
          title="Inspections"
          description="Newest first. A corrected inspection stays here, marked as superseded, with the reason."
        >
          <InspectionHistory inspections={part.inspections} unit={displayUnit} />
        </SectionCard>
        <SectionCard title="Dispositions and releases">
          <DispositionHistory dispositions={part.dispositions} unit={displayUnit} />
        </SectionCard>
      </Stack>
      {dialog === 'dispose' ? (
        <DispositionDialog
          partId={part.id}
          serial={part.serial}
          unit={displayUnit}
          onDone={revalidate}
          onClose={close}
        />
      ) : null}
      {dialog === 'release' ? (
        <ReleaseDialog partId={part.id} serial={part.serial} onDone={revalidate} onClose={close} />
      ) : null}
    </>
  );
}
