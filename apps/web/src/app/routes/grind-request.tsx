import type { DisplayUnit, GrindRequestDetail } from '@evenset/contracts';
import DoneOutlined from '@mui/icons-material/DoneOutlined';
import PrintOutlined from '@mui/icons-material/PrintOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import GlobalStyles from '@mui/material/GlobalStyles';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState, type ReactNode } from 'react';
import { Link as RouterLink, useParams } from 'react-router-dom';
import { BackLink } from '../../components/back-link';
import { DetailList } from '../../components/display/detail-list';
import { Figures } from '../../components/display/figures';
import { SectionCard } from '../../components/display/section-card';
import { LoadFailed } from '../../components/load-failed';
import { PageHeader } from '../../components/page-header';
import { PageLoading } from '../../components/page-loading';
import { paths } from '../../config/paths';
import { WRITE_ROLES } from '../../config/permissions';
import { useMay } from '../../features/auth/hooks/use-may';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { GrindPassTable } from '../../features/lots/components/grind-pass-table';
import { GrindingCautions } from '../../features/lots/components/grinding-cautions';
import { useGrindRequest, useRevalidateReplacements } from '../../features/replacements/api/replacements';
import { GrindRequestProgress } from '../../features/replacements/components/grind-request-progress';
import { MarkGroundDialog } from '../../features/replacements/components/mark-ground-dialog';
import { formatHeight } from '../../features/sets/set-format';

/** On paper: the request alone, without the frame, navigation or buttons. */
const printStyles = (
  <GlobalStyles
    styles={{
      '@media print': {
        '.MuiAppBar-root, .MuiDrawer-root, .MuiSnackbar-root, .no-print': { display: 'none !important' },
        body: { background: '#fff' },
        section: { breakInside: 'avoid' },
      },
    }}
  />
);

/** One grind-to-target request: what to grind, how, the cautions, and where it stands. */
export function GrindRequestRoute() {
  const { requestId = '' } = useParams();
  const { data: request, error, mutate } = useGrindRequest(requestId);
  const mayMarkGround = useMay(WRITE_ROLES.grindSteps);
  const mayOpenPart = useMay(paths.part.roles);
  const mayOpenSet = useMay(paths.set.roles);
  const revalidate = useRevalidateReplacements();
  const [marking, setMarking] = useState(false);
  const { displayUnit: unit } = useSignedInUser();

  if (error) return <LoadFailed what="grind request" error={error} onRetry={() => void mutate()} />;
  if (!request) return <PageLoading />;
  const show = (mm: number) => <Figures>{formatHeight(mm, unit)}</Figures>;

  return (
    <>
      {printStyles}
      <div className="no-print">
        <BackLink to={paths.grindRequests.getHref()} label="Grind requests" />
      </div>
      <PageHeader
        title={`Grind request ${request.requestNumber}`}
        description={`Grind ${request.partNumber} ${request.serial} to ${formatHeight(request.targetHeight, unit)} so that it matches set ${request.originalSet.setNumber} (${request.originalSet.customerName}).`}
        actions={
          <Stack direction="row" spacing={1.5} className="no-print">
            <Button variant="outlined" startIcon={<PrintOutlined />} onClick={() => window.print()}>
              Print
            </Button>
            {mayMarkGround && request.status === 'open' ? (
              <Button variant="contained" startIcon={<DoneOutlined />} onClick={() => setMarking(true)}>
                Mark as ground
              </Button>
            ) : null}
          </Stack>
        }
      />
      <Stack spacing={3}>
        <GrindingCautions items={request.cautions} prominent />
        <SectionCard title="What to grind">
          <DetailList items={details(request, show, unit, mayOpenPart, mayOpenSet)} />
        </SectionCard>
        <SectionCard
          title="Passes"
          description={
            request.grinding ? (
              <>
                From the spec's grinding parameters: roughing {formatHeight(request.grinding.roughDepth, unit)} per
                pass, {formatHeight(request.grinding.finishAllowance, unit)} left for finishing at{' '}
                {formatHeight(request.grinding.finishDepth, unit)} per pass, then {request.grinding.sparkOutPasses}{' '}
                spark-out passes.
              </>
            ) : undefined
          }
        >
          {request.passes.length ? (
            <GrindPassTable passes={request.passes} unit={unit} />
          ) : (
            <Typography>
              {request.partNumber} rev {request.revision} gives no grinding parameters, so there is no pass plan: plan
              the passes at the machine to remove {formatHeight(request.stock, unit)}.
            </Typography>
          )}
        </SectionCard>
        <SectionCard title="Progress">
          <GrindRequestProgress request={request} />
          {request.status === 'ground' ? (
            <Alert severity="info" sx={{ mt: 2 }} className="no-print">
              Re-inspect {request.serial} at the Bench (lot {request.lotNumber}); the result shows here.
            </Alert>
          ) : null}
        </SectionCard>
      </Stack>
      {marking ? (
        <MarkGroundDialog
          request={request}
          onClose={() => setMarking(false)}
          onDone={async () => {
            setMarking(false);
            await revalidate();
          }}
        />
      ) : null}
    </>
  );
}

function details(
  request: GrindRequestDetail,
  show: (mm: number) => ReactNode,
  unit: DisplayUnit,
  mayOpenPart: boolean,
  mayOpenSet: boolean,
) {
  return [
    {
      label: 'Part',
      value: mayOpenPart ? (
        <Link component={RouterLink} to={paths.part.getHref(request.partId)}>
          {request.serial}
        </Link>
      ) : (
        request.serial
      ),
    },
    { label: 'Part number', value: `${request.partNumber} rev ${request.revision}, lot ${request.lotNumber}` },
    { label: 'Current height', value: show(request.currentHeight) },
    { label: 'Target height (window centre)', value: show(request.targetHeight) },
    { label: 'Stock to remove', value: show(request.stock) },
    {
      label: 'Window',
      value: (
        <>
          {show(request.window.low)} to {show(request.window.high)}
        </>
      ),
    },
    {
      label: 'To match set',
      value: mayOpenSet ? (
        <Link component={RouterLink} to={paths.set.getHref(request.originalSet.id)}>
          {request.originalSet.setNumber}
        </Link>
      ) : (
        request.originalSet.setNumber
      ),
    },
    {
      label: 'Customer and order',
      value: `${request.originalSet.customerName}, ${request.originalSet.orderReference}`,
    },
    {
      label: "The set's heights",
      value: (
        <Stack component="span">
          {request.originalSet.heights.map((h) => (
            <span key={h.serial}>
              {h.serial} <Figures>{formatHeight(h.height, unit)}</Figures>
            </span>
          ))}
        </Stack>
      ),
    },
    { label: 'Raised by', value: request.requestedBy },
  ];
}
