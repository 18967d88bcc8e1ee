import CloudOffOutlined from '@mui/icons-material/CloudOffOutlined';
import Button from '@mui/material/Button';
import { NoticePanel } from '../../../components/notice-panel';
import { describeError } from '../../../lib/errors';
import type { ApiError } from '../../../lib/api-client';

export function SessionUnavailable({ error, onRetry }: { error: ApiError; onRetry: () => void }) {
  return (
    <NoticePanel
      icon={<CloudOffOutlined />}
      title="Evenset can't check who you are"
      actions={
        <Button variant="contained" onClick={onRetry}>
          Try again
        </Button>
      }
    >
      {describeError(error)}
    </NoticePanel>
  );
}
