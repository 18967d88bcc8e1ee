import AddOutlined from '@mui/icons-material/AddOutlined';
import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';
import { PageHeader } from '../../components/page-header';
import { paths } from '../../config/paths';
import { useMay } from '../../features/auth/hooks/use-may';
import { SpecsGrid } from '../../features/specs/components/specs-grid';

export function SpecsRoute() {
  const canEdit = useMay(paths.specNew.roles);
  return (
    <>
      <PageHeader
        title="Specs"
        description="Part specs and their revisions: nominal height, bands, limits, the measurement plan and the decision rule. A released revision never changes; a change makes a new revision."
        actions={
          canEdit ? (
            <Button variant="contained" startIcon={<AddOutlined />} component={RouterLink} to={paths.specNew.getHref()}>
              New spec
            </Button>
          ) : null
        }
      />
      <SpecsGrid canEdit={canEdit} />
    </>
  );
}
