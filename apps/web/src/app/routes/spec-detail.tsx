import type { Spec } from '@evenset/contracts';
import EditOutlined from '@mui/icons-material/EditOutlined';
import ForkRightOutlined from '@mui/icons-material/ForkRightOutlined';
import VerifiedOutlined from '@mui/icons-material/VerifiedOutlined';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { useState } from 'react';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { BackLink } from '../../components/back-link';
import { SectionCard } from '../../components/display/section-card';
import { useNotify } from '../../components/feedback/notifications';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { paths } from '../../config/paths';
import { useMay } from '../../features/auth/hooks/use-may';
import { useSpec } from '../../features/specs/api/get-spec';
import { useRevalidateSpecs } from '../../features/specs/api/get-specs';
import { newSpecRevision } from '../../features/specs/api/new-spec-revision';
import { ReleaseSpecDialog } from '../../features/specs/components/release-spec-dialog';
import { SpecPlan } from '../../features/specs/components/spec-plan';
import { SpecRevisions } from '../../features/specs/components/spec-revisions';
import { SpecSummary } from '../../features/specs/components/spec-summary';
import { describeError } from '../../lib/errors';

function SpecActions({ spec }: { spec: Spec }) {
  const navigate = useNavigate();
  const notify = useNotify();
  const revalidate = useRevalidateSpecs();
  const [releasing, setReleasing] = useState(false);
  const [starting, setStarting] = useState(false);

  const startRevision = async () => {
    setStarting(true);
    try {
      const draft = await newSpecRevision(spec.id);
      void revalidate();
      notify(`Draft rev. ${draft.revision} of ${draft.partNumber} was started from rev. ${spec.revision}.`);
      void navigate(paths.specEdit.getHref(draft.id));
    } catch (error) {
      notify(describeError(error), 'error');
      setStarting(false);
    }
  };

  if (spec.status === 'draft')
    return (
      <>
        <Button
          variant="outlined"
          startIcon={<EditOutlined />}
          component={RouterLink}
          to={paths.specEdit.getHref(spec.id)}
        >
          Edit draft
        </Button>
        <Button variant="contained" startIcon={<VerifiedOutlined />} onClick={() => setReleasing(true)}>
          Release
        </Button>
        {releasing ? <ReleaseSpecDialog spec={spec} onClose={() => setReleasing(false)} /> : null}
      </>
    );
  return (
    <Button
      variant="contained"
      startIcon={<ForkRightOutlined />}
      loading={starting}
      onClick={() => void startRevision()}
    >
      New revision
    </Button>
  );
}

export function SpecDetailRoute() {
  const { specId = '' } = useParams();
  const canEdit = useMay(paths.specEdit.roles);
  const { data: spec, error, mutate } = useSpec(specId);

  if (error) return <LoadFailed what="spec" error={error} onRetry={() => void mutate()} />;
  if (!spec) return <PageLoading />;

  return (
    <>
      <BackLink to={paths.specs.getHref()} label="All specs" />
      <PageHeader
        title={`${spec.partNumber} rev. ${spec.revision}`}
        description={spec.definition.title}
        actions={canEdit ? <SpecActions spec={spec} /> : null}
      />
      <Stack spacing={3}>
        <SectionCard title="Specification">
          <SpecSummary spec={spec} />
        </SectionCard>
        <SectionCard title="Measurement plan" description="The face seen from above; positions from the part's axis.">
          <SpecPlan spec={spec} />
        </SectionCard>
        <SectionCard
          title="Revisions"
          description="Every revision of this part number, and what changed between two of them."
        >
          <SpecRevisions spec={spec} />
        </SectionCard>
      </Stack>
    </>
  );
}
