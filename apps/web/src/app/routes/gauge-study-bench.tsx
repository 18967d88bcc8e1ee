import { useParams } from 'react-router-dom';
import { BackLink } from '../../components/back-link';
import { PageHeader } from '../../components/page-header';
import { paths } from '../../config/paths';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { MeasureStudy } from '../../features/gauge-studies/components/measure-study';

export function GaugeStudyBenchRoute() {
  const { studyId = '' } = useParams();
  const { displayUnit } = useSignedInUser();
  return (
    <>
      <BackLink to={paths.bench.getHref()} label="Bench" />
      <PageHeader title="Gauge study" description="Measure each part as it comes; Enter saves and brings the next." />
      <MeasureStudy studyId={studyId} unit={displayUnit} />
    </>
  );
}
