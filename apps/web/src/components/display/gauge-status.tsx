import type { GaugeStatus } from '@evenset/contracts';
import type { SvgIconComponent } from '@mui/icons-material';
import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import DoNotDisturbOnOutlined from '@mui/icons-material/DoNotDisturbOnOutlined';
import ErrorOutlined from '@mui/icons-material/ErrorOutlined';
import HelpOutlineOutlined from '@mui/icons-material/HelpOutlineOutlined';
import ScheduleOutlined from '@mui/icons-material/ScheduleOutlined';
import { StatusLabel, type StatusTone } from './status-label';

export const GAUGE_STATUS_LABELS: Record<GaugeStatus, string> = {
  'in-service': 'In service',
  'due-soon': 'Due soon',
  overdue: 'Overdue',
  retired: 'Retired',
  'not-calibrated': 'Not calibrated',
};

const LOOK: Record<GaugeStatus, { icon: SvgIconComponent; tone: StatusTone }> = {
  'in-service': { icon: CheckCircleOutlined, tone: 'success' },
  'due-soon': { icon: ScheduleOutlined, tone: 'warning' },
  overdue: { icon: ErrorOutlined, tone: 'error' },
  retired: { icon: DoNotDisturbOnOutlined, tone: 'neutral' },
  'not-calibrated': { icon: HelpOutlineOutlined, tone: 'error' },
};

/** Where a master gauge or instrument stands in its calibration cycle. */
export function GaugeStatusLabel({ status }: { status: GaugeStatus }) {
  const { icon, tone } = LOOK[status];
  return <StatusLabel icon={icon} label={GAUGE_STATUS_LABELS[status]} tone={tone} />;
}
