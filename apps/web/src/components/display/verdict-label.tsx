import type { PartStatus, Verdict } from '@evenset/contracts';
import type { SvgIconComponent } from '@mui/icons-material';
import BlockOutlined from '@mui/icons-material/BlockOutlined';
import BuildOutlined from '@mui/icons-material/BuildOutlined';
import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import HighlightOffOutlined from '@mui/icons-material/HighlightOffOutlined';
import PauseCircleOutlined from '@mui/icons-material/PauseCircleOutlined';
import RadioButtonUncheckedOutlined from '@mui/icons-material/RadioButtonUncheckedOutlined';
import VerifiedOutlined from '@mui/icons-material/VerifiedOutlined';
import WarningAmberOutlined from '@mui/icons-material/WarningAmberOutlined';
import { StatusLabel, type StatusTone } from './status-label';

type Side = 'low' | 'high' | null | undefined;

/** A verdict in words; a guard-band result says on which side of the band it lies. */
export function verdictText(verdict: Verdict, side?: Side): string {
  if (verdict === 'conforms') return 'Conforms';
  if (verdict === 'does-not-conform') return 'Does not conform';
  return side ? `In guard band — ${side}` : 'In guard band';
}

const VERDICT_LOOK: Record<Verdict, { icon: SvgIconComponent; tone: StatusTone }> = {
  conforms: { icon: CheckCircleOutlined, tone: 'success' },
  'does-not-conform': { icon: HighlightOffOutlined, tone: 'error' },
  'guard-band': { icon: WarningAmberOutlined, tone: 'warning' },
};

/** A verdict as word, icon and colour together (never colour alone). */
export function VerdictLabel({ verdict, side }: { verdict: Verdict; side?: Side }) {
  const { icon, tone } = VERDICT_LOOK[verdict];
  return <StatusLabel icon={icon} label={verdictText(verdict, side)} tone={tone} />;
}

export const PART_STATUS_LABELS: Record<PartStatus, string> = {
  'not-inspected': 'Not inspected',
  conforms: 'Conforms',
  'does-not-conform': 'Does not conform',
  'guard-band': 'In guard band',
  held: 'Held (run drift)',
  rework: 'Rework',
  scrap: 'Scrap',
  'use-as-is': 'Use as is',
  released: 'Released',
};

const STATUS_LOOK: Record<PartStatus, { icon: SvgIconComponent; tone: StatusTone }> = {
  'not-inspected': { icon: RadioButtonUncheckedOutlined, tone: 'neutral' },
  conforms: VERDICT_LOOK.conforms,
  'does-not-conform': VERDICT_LOOK['does-not-conform'],
  'guard-band': VERDICT_LOOK['guard-band'],
  held: { icon: PauseCircleOutlined, tone: 'warning' },
  rework: { icon: BuildOutlined, tone: 'info' },
  scrap: { icon: BlockOutlined, tone: 'error' },
  'use-as-is': { icon: CheckCircleOutlined, tone: 'info' },
  released: { icon: VerifiedOutlined, tone: 'success' },
};

/** Where a part stands: its verdict, or the disposition or release that came after it. */
export function PartStatusLabel({ status }: { status: PartStatus }) {
  const { icon, tone } = STATUS_LOOK[status];
  return <StatusLabel icon={icon} label={PART_STATUS_LABELS[status]} tone={tone} />;
}
