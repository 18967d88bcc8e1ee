import type { CertificateStatus as Status } from '@evenset/contracts';
import BlockOutlined from '@mui/icons-material/BlockOutlined';
import GppBadOutlined from '@mui/icons-material/GppBadOutlined';
import VerifiedOutlined from '@mui/icons-material/VerifiedOutlined';
import { StatusLabel } from '../../../components/display/status-label';

const STATUS = {
  genuine: { icon: VerifiedOutlined, label: 'Genuine', tone: 'success' },
  revoked: { icon: BlockOutlined, label: 'Revoked', tone: 'warning' },
  altered: { icon: GppBadOutlined, label: 'Altered — do not rely on it', tone: 'error' },
} as const;

/** Where a certificate stands, as a word and an icon. */
export function CertificateStatus({ status }: { status: Status }) {
  const { icon, label, tone } = STATUS[status];
  return <StatusLabel icon={icon} label={label} tone={tone} />;
}
