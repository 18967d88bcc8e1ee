import { useSearchParams } from 'react-router-dom';
import { BackLink } from '../../components/back-link';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { paths } from '../../config/paths';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { useStock } from '../../features/sets/api/sets';
import { SetBuilder } from '../../features/sets/builder/set-builder';

export function SetBuilderRoute() {
  const { displayUnit } = useSignedInUser();
  const { data: stock, error, mutate } = useStock();
  const [search] = useSearchParams();
  return (
    <>
      <BackLink to={paths.sets.getHref()} label="All sets" />
      <PageHeader
        title="Build sets"
        description="Choose a part number and how many sets; check the proposal, swap parts if you like, then allocate the sets to the customer's order."
      />
      {error ? (
        <LoadFailed what="stock of free parts" error={error} onRetry={() => void mutate()} />
      ) : stock ? (
        <SetBuilder stock={stock} unit={displayUnit} customerId={search.get('customerId')} />
      ) : (
        <PageLoading label="Counting free parts…" />
      )}
    </>
  );
}
