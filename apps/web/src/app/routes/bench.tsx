import { PageHeader } from '../../components/page-header';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { BenchFlow } from '../../features/bench/components/bench-flow';
import { WaitingStudies } from '../../features/gauge-studies/components/waiting-studies';

export function BenchRoute() {
  const { displayUnit } = useSignedInUser();
  return (
    <>
      <PageHeader
        title="Bench"
        description="Measure a lot at the surface plate: zero on the master, then part by part."
      />
      <WaitingStudies />
      <BenchFlow unit={displayUnit} />
    </>
  );
}
