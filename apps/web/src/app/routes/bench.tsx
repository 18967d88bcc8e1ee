import { PageHeader } from '../../components/page-header';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { BenchFlow } from '../../features/bench/components/bench-flow';

export function BenchRoute() {
  const { displayUnit } = useSignedInUser();
  return (
    <>
      <PageHeader
        title="Bench"
        description="Measure a lot at the surface plate: zero on the master, then part by part."
      />
      <BenchFlow unit={displayUnit} />
    </>
  );
}
