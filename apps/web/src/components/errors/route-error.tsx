import ReportProblemOutlined from '@mui/icons-material/ReportProblemOutlined';
import Button from '@mui/material/Button';
import { Link as RouterLink, useRouteError } from 'react-router-dom';
import { paths } from '../../config/paths';
import { describeError } from '../../lib/errors';
import { ApiError } from '../../lib/api-client';
import { NoticePanel } from '../notice-panel';

/** A page failed to load its code after an update; a reload fetches the new version. */
const isStaleChunk = (error: unknown): boolean =>
  error instanceof TypeError && /dynamically imported module|Importing a module script failed/i.test(error.message);

function explain(error: unknown): { title: string; text: string } {
  if (isStaleChunk(error)) {
    return {
      title: 'This page could not be loaded',
      text: 'Evenset may have been updated since you opened it, or the network dropped. Reload the page.',
    };
  }
  if (error instanceof ApiError) return { title: 'This page could not be shown', text: describeError(error) };
  return {
    title: 'This part of Evenset ran into a problem',
    text: 'Nothing you saved is lost. Reload the page to try again; if it keeps happening, tell your administrator.',
  };
}

/** Error boundary of one route area: the frame and navigation stay, only the page is replaced. */
export function RouteError() {
  const error = useRouteError();
  const { title, text } = explain(error);
  return (
    <NoticePanel
      icon={<ReportProblemOutlined />}
      title={title}
      actions={
        <>
          <Button variant="contained" onClick={() => window.location.reload()}>
            Reload the page
          </Button>
          <Button variant="outlined" component={RouterLink} to={paths.home.getHref()}>
            Go to Home
          </Button>
        </>
      }
    >
      {text}
    </NoticePanel>
  );
}
