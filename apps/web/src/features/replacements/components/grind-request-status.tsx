import type { GrindRequestStatus } from '@evenset/contracts';
import type { SvgIconComponent } from '@mui/icons-material';
import BuildOutlined from '@mui/icons-material/BuildOutlined';
import FactCheckOutlined from '@mui/icons-material/FactCheckOutlined';
import PendingActionsOutlined from '@mui/icons-material/PendingActionsOutlined';
import { StatusLabel, type StatusTone } from '../../../components/display/status-label';

export const GRIND_STATUS_LABELS: Record<GrindRequestStatus, string> = {
  open: 'Open',
  ground: 'Ground',
  're-inspected': 'Re-inspected',
};

const LOOK: Record<GrindRequestStatus, { icon: SvgIconComponent; tone: StatusTone }> = {
  open: { icon: PendingActionsOutlined, tone: 'warning' },
  ground: { icon: BuildOutlined, tone: 'info' },
  're-inspected': { icon: FactCheckOutlined, tone: 'success' },
};

/** Where a grind request stands, in words with an icon. */
export function GrindRequestStatusLabel({ status }: { status: GrindRequestStatus }) {
  return <StatusLabel {...LOOK[status]} label={GRIND_STATUS_LABELS[status]} />;
}
