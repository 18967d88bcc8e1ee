import type { GrindRequestDetail } from '@evenset/contracts';
import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import HighlightOffOutlined from '@mui/icons-material/HighlightOffOutlined';
import Step from '@mui/material/Step';
import StepContent from '@mui/material/StepContent';
import StepLabel from '@mui/material/StepLabel';
import Stepper from '@mui/material/Stepper';
import Typography from '@mui/material/Typography';
import { Figures } from '../../../components/display/figures';
import { StatusLabel } from '../../../components/display/status-label';
import { VerdictLabel } from '../../../components/display/verdict-label';
import { useSignedInUser } from '../../auth/hooks/use-signed-in-user';
import { formatDateTime, formatHeight } from '../../sets/set-format';

/** Open → ground → re-inspected, each step with who and when; the last with the Bench's result. */
export function GrindRequestProgress({ request }: { request: GrindRequestDetail }) {
  const { displayUnit: unit } = useSignedInUser();
  const opened = request.steps.find((s) => s.status === 'open');
  const ground = request.steps.findLast((s) => s.status === 'ground');
  const again = request.reInspection;
  const active = again ? 3 : ground ? 2 : 1;
  return (
    <Stepper orientation="vertical" activeStep={active} aria-label="Progress of the request">
      <Step completed>
        <StepLabel>
          Open — raised {opened ? `${formatDateTime(opened.createdAt)} by ${opened.recordedBy}` : ''}
        </StepLabel>
      </Step>
      <Step completed={Boolean(ground)} expanded={Boolean(ground?.note)}>
        <StepLabel>
          {ground
            ? `Ground — ${formatDateTime(ground.createdAt)}, marked by ${ground.recordedBy}`
            : 'Ground at the machine'}
        </StepLabel>
        {ground?.note ? (
          <StepContent>
            <Typography>{ground.note}</Typography>
          </StepContent>
        ) : null}
      </Step>
      <Step completed={Boolean(again)} expanded={Boolean(again)}>
        <StepLabel>
          {again
            ? `Re-inspected — ${formatDateTime(again.inspectedAt)} by ${again.inspector}`
            : 'Re-inspected at the Bench'}
        </StepLabel>
        {again ? (
          <StepContent>
            <Typography component="div" sx={{ display: 'flex', gap: 2, flexWrap: 'wrap', alignItems: 'center' }}>
              <span>
                Height <Figures>{formatHeight(again.height, unit)}</Figures>
              </span>
              <VerdictLabel verdict={again.verdict} />
              {again.insideWindow ? (
                <StatusLabel icon={CheckCircleOutlined} tone="success" label="Inside the window: matches the set" />
              ) : (
                <StatusLabel
                  icon={HighlightOffOutlined}
                  tone="error"
                  label="Outside the window: does not match the set"
                />
              )}
            </Typography>
          </StepContent>
        ) : null}
      </Step>
    </Stepper>
  );
}
