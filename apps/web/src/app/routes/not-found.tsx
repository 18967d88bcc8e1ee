import SearchOffOutlined from '@mui/icons-material/SearchOffOutlined';
import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';
import { NoticePanel } from '../../components/notice-panel';
import { paths } from '../../config/paths';

export function NotFoundRoute() {
  return (
    <NoticePanel
      icon={<SearchOffOutlined />}
      title="This page does not exist"
      actions={
        <Button variant="contained" component={RouterLink} to={paths.home.getHref()}>
          Go to Home
        </Button>
      }
    >
      The address may be mistyped, or the page may have moved. The navigation lists every page you can use.
    </NoticePanel>
  );
}
