import { useNavigate } from 'react-router-dom';
import { useNotify } from '../../components/feedback/notifications';
import { PageHeader } from '../../components/page-header';
import { paths } from '../../config/paths';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { ALL_MATERIALS, useMaterials } from '../../features/materials/api/get-materials';
import { useRevalidateSpecs } from '../../features/specs/api/get-specs';
import { SpecForm } from '../../features/specs/components/spec-form/spec-form';
import { newSpecValues } from '../../features/specs/spec-values';

export function SpecNewRoute() {
  const { displayUnit } = useSignedInUser();
  const navigate = useNavigate();
  const notify = useNotify();
  const revalidate = useRevalidateSpecs();
  const materials = useMaterials(ALL_MATERIALS);
  return (
    <>
      <PageHeader
        title="New spec"
        description="A new part number starts as draft revision A. Save it as often as you like; release it when it is ready for lots."
      />
      <SpecForm
        defaultValues={newSpecValues(displayUnit)}
        materials={materials.data?.items ?? []}
        onCancel={() => void navigate(paths.specs.getHref())}
        onSaved={(spec) => {
          void revalidate();
          notify(`${spec.partNumber} rev. ${spec.revision} was saved as a draft.`);
          void navigate(paths.spec.getHref(spec.id));
        }}
      />
    </>
  );
}
