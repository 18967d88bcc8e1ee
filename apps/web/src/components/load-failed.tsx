import ErrorOutlineOutlined from '@mui/icons-material/ErrorOutlineOutlined';
import Button from '@mui/material/Button';
import { describeError } from '../lib/errors';
import { NoticePanel } from './notice-panel';

/** A page whose record could not be loaded: what happened and a way to try again. */
export function LoadFailed({ what, error, onRetry }: { what: string; error: unknown; onRetry: () => void }) {
  return (
    <NoticePanel
      icon={<ErrorOutlineOutlined />}
      title={`The ${what} could not be loaded`}
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
