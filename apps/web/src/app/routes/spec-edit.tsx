import EditOffOutlined from '@mui/icons-material/EditOffOutlined';
import Button from '@mui/material/Button';
import { Link as RouterLink, useNavigate, useParams } from 'react-router-dom';
import { useNotify } from '../../components/feedback/notifications';
import { LoadFailed } from '../../components/load-failed';
import { NoticePanel } from '../../components/notice-panel';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { paths } from '../../config/paths';
import { ALL_MATERIALS, useMaterials } from '../../features/materials/api/get-materials';
import { useSpec } from '../../features/specs/api/get-spec';
import { useRevalidateSpecs } from '../../features/specs/api/get-specs';
import { SpecForm } from '../../features/specs/components/spec-form/spec-form';
import { specFormValues } from '../../features/specs/spec-values';

export function SpecEditRoute() {
  const { specId = '' } = useParams();
  const navigate = useNavigate();
  const notify = useNotify();
  const revalidate = useRevalidateSpecs();
  const { data: spec, error, mutate } = useSpec(specId);
  const materials = useMaterials(ALL_MATERIALS);

  if (error) return <LoadFailed what="spec" error={error} onRetry={() => void mutate()} />;
  if (!spec || !materials.data) return <PageLoading />;
  const name = `${spec.partNumber} rev. ${spec.revision}`;
  if (spec.status !== 'draft')
    return (
      <NoticePanel
        icon={<EditOffOutlined />}
        title={`${name} is ${spec.status}`}
        actions={
          <Button variant="contained" component={RouterLink} to={paths.spec.getHref(spec.id)}>
            Open {name}
          </Button>
        }
      >
        Only a draft can be changed. To change this spec, start a new revision from its page.
      </NoticePanel>
    );

  return (
    <>
      <PageHeader
        title={`Edit ${name}`}
        description="A draft: changes are saved as they are; nothing is used for lots until it is released."
      />
      <SpecForm
        spec={spec}
        defaultValues={specFormValues(spec)}
        materials={materials.data.items}
        onCancel={() => void navigate(paths.spec.getHref(spec.id))}
        onSaved={(saved) => {
          void revalidate();
          notify(`${name} was saved.`);
          void navigate(paths.spec.getHref(saved.id));
        }}
      />
    </>
  );
}
