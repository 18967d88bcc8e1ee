import BlockOutlined from '@mui/icons-material/BlockOutlined';
import CheckCircleOutlined from '@mui/icons-material/CheckCircleOutlined';
import { StatusLabel } from '../../../components/display/status-label';

/** Word and icon together, so the state never rests on colour alone. */
export function AccountStatus({ active }: { active: boolean }) {
  return active ? (
    <StatusLabel icon={CheckCircleOutlined} label="Active" tone="success" />
  ) : (
    <StatusLabel icon={BlockOutlined} label="Deactivated" tone="neutral" />
  );
}
