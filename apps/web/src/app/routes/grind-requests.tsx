import { PageHeader } from '../../components/page-header';
import { GrindRequestsGrid } from '../../features/replacements/components/grind-requests-grid';

export function GrindRequestsRoute() {
  return (
    <>
      <PageHeader
        title="Grind requests"
        description="Parts to grind down to a target height so that they match a set sold earlier. Open one for its passes and cautions."
      />
      <GrindRequestsGrid />
    </>
  );
}
