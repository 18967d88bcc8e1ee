import ReportProblemOutlined from '@mui/icons-material/ReportProblemOutlined';
import Button from '@mui/material/Button';
import { Component, type ErrorInfo, type ReactNode } from 'react';
import { NoticePanel } from '../notice-panel';

interface RootErrorBoundaryState {
  failed: boolean;
}

/** Last line of defence: anything no inner boundary caught ends here, in plain words. */
export class RootErrorBoundary extends Component<{ children: ReactNode }, RootErrorBoundaryState> {
  override state: RootErrorBoundaryState = { failed: false };

  static getDerivedStateFromError(): RootErrorBoundaryState {
    return { failed: true };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo): void {
    // Kept for whoever opens the browser console; people only see the message below.
    console.error('Evenset stopped on an unexpected error', error, info.componentStack);
  }

  override render(): ReactNode {
    if (!this.state.failed) return this.props.children;
    return (
      <NoticePanel
        icon={<ReportProblemOutlined />}
        title="Evenset ran into a problem"
        actions={
          <Button variant="contained" onClick={() => window.location.reload()}>
            Reload the page
          </Button>
        }
      >
        Nothing you saved is lost. Reload the page to carry on; if this keeps happening, tell your administrator what
        you were doing when it appeared.
      </NoticePanel>
    );
  }
}
