import type { SpecStatus } from '@evenset/contracts';
import EditNoteOutlined from '@mui/icons-material/EditNoteOutlined';
import HistoryOutlined from '@mui/icons-material/HistoryOutlined';
import VerifiedOutlined from '@mui/icons-material/VerifiedOutlined';
import { StatusLabel } from '../../../components/display/status-label';

export const SPEC_STATUS_LABELS: Record<SpecStatus, string> = {
  draft: 'Draft',
  released: 'Released',
  superseded: 'Superseded',
};

/** A revision's state: drafts may change, released ones are in use, superseded ones are history. */
export function SpecStatusLabel({ status }: { status: SpecStatus }) {
  if (status === 'draft') return <StatusLabel icon={EditNoteOutlined} label={SPEC_STATUS_LABELS.draft} tone="info" />;
  if (status === 'released')
    return <StatusLabel icon={VerifiedOutlined} label={SPEC_STATUS_LABELS.released} tone="success" />;
  return <StatusLabel icon={HistoryOutlined} label={SPEC_STATUS_LABELS.superseded} tone="neutral" />;
}
