import AddOutlined from '@mui/icons-material/AddOutlined';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import { Link as RouterLink, useSearchParams } from 'react-router-dom';
import { PageHeader } from '../../components/page-header';
import { paths } from '../../config/paths';
import { useMay } from '../../features/auth/hooks/use-may';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { BUILD_ROLES, useStock } from '../../features/sets/api/sets';
import { PartNumberFilter } from '../../features/sets/components/part-number-filter';
import { SetsGrid } from '../../features/sets/components/sets-grid';

export function SetsRoute() {
  const { displayUnit } = useSignedInUser();
  const canBuild = useMay(BUILD_ROLES);
  const stock = useStock(canBuild);
  const [search, setSearch] = useSearchParams();
  const partNumber = search.get('partNumber') ?? undefined;
  return (
    <>
      <PageHeader
        title="Sets"
        description="Matched sets and replacement parts allocated to customers' orders. Open a set for its heights and certificates."
        actions={
          canBuild ? (
            <Button variant="contained" startIcon={<AddOutlined />} component={RouterLink} to={paths.setNew.getHref()}>
              Build sets
            </Button>
          ) : null
        }
      />
      <Stack spacing={2} sx={{ flexGrow: 1 }}>
        <PartNumberFilter
          value={partNumber}
          options={(stock.data ?? []).map((s) => s.partNumber)}
          onChange={(next) => setSearch(next ? { partNumber: next } : {}, { replace: true })}
        />
        <SetsGrid unit={displayUnit} partNumber={partNumber} canBuild={canBuild} />
      </Stack>
    </>
  );
}
