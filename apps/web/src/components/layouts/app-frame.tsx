import type { SessionUser } from '@evenset/contracts';
import LogoutOutlined from '@mui/icons-material/LogoutOutlined';
import MenuOutlined from '@mui/icons-material/MenuOutlined';
import AppBar from '@mui/material/AppBar';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Drawer from '@mui/material/Drawer';
import IconButton from '@mui/material/IconButton';
import Link from '@mui/material/Link';
import Stack from '@mui/material/Stack';
import Toolbar from '@mui/material/Toolbar';
import Typography from '@mui/material/Typography';
import { useTheme } from '@mui/material/styles';
import useMediaQuery from '@mui/material/useMediaQuery';
import { useState, type ReactNode } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import type { NavItem } from '../../config/navigation';
import { paths } from '../../config/paths';
import { roleList } from '../../lib/roles';
import { granite, ochre, slate } from '../../theme/tokens';
import { DisplayUnitMenu } from './display-unit-menu';
import { EvensetMark } from './evenset-mark';
import { SideNav } from './side-nav';

const DRAWER_WIDTH = 248;
/** Room for the fixed top bar and its 3 px level line. */
const barSpacer = <Toolbar sx={{ mb: '3px' }} />;
const CONTENT_ID = 'content';

interface AppFrameProps {
  user: Pick<SessionUser, 'displayName' | 'roles'>;
  items: readonly NavItem[];
  onSignOut: () => void;
  signingOut: boolean;
  children: ReactNode;
}

/** Top bar, side navigation and content area around every signed-in page. */
export function AppFrame({ user, items, onSignOut, signingOut, children }: AppFrameProps) {
  const theme = useTheme();
  // Desk screens keep the navigation open; tablets and phones slide it in on demand.
  const wide = useMediaQuery(theme.breakpoints.up('lg'), { noSsr: true });
  const [navOpen, setNavOpen] = useState(false);

  return (
    <Box sx={{ display: 'flex', minHeight: '100dvh' }}>
      <Link
        href={`#${CONTENT_ID}`}
        sx={{
          position: 'absolute',
          left: 8,
          top: -64,
          zIndex: theme.zIndex.tooltip,
          bgcolor: 'background.paper',
          px: 2,
          py: 1,
          '&:focus': { top: 8 },
        }}
      >
        Skip to content
      </Link>

      {/* Above the permanent drawer (which sits under it); below the slide-in one (which covers it). */}
      <AppBar position="fixed" sx={{ zIndex: wide ? theme.zIndex.drawer + 1 : undefined }}>
        <Toolbar sx={{ gap: { xs: 1, sm: 2 }, minHeight: { xs: 64 } }}>
          {wide ? null : (
            <IconButton color="inherit" edge="start" aria-label="Open navigation" onClick={() => setNavOpen(true)}>
              <MenuOutlined />
            </IconButton>
          )}
          <Box
            component={RouterLink}
            to={paths.home.getHref()}
            aria-label="Evenset — Home"
            sx={{
              display: 'flex',
              alignItems: 'center',
              gap: 1.25,
              color: 'inherit',
              textDecoration: 'none',
              minHeight: 48,
            }}
          >
            <EvensetMark size={34} sx={{ outline: `1px solid ${slate[600]}`, borderRadius: '7px' }} />
            <Typography component="span" sx={{ fontSize: '1.25rem', fontWeight: 700, letterSpacing: '0.01em' }}>
              Evenset
            </Typography>
          </Box>
          <Box sx={{ flexGrow: 1 }} />
          <Box sx={{ textAlign: 'right', display: { xs: 'none', sm: 'block' }, minWidth: 0 }}>
            <Typography variant="body2" noWrap sx={{ fontWeight: 500 }}>
              {user.displayName}
            </Typography>
            <Typography variant="caption" noWrap component="p" sx={{ color: slate[100] }}>
              {roleList(user.roles)}
            </Typography>
          </Box>
          <DisplayUnitMenu />
          <Button
            variant="outlined"
            color="inherit"
            startIcon={<LogoutOutlined />}
            loading={signingOut}
            loadingPosition="start"
            onClick={onSignOut}
            sx={{ borderColor: slate[200], flexShrink: 0, '&:hover': { borderColor: ochre[300], bgcolor: slate[800] } }}
          >
            Sign out
          </Button>
        </Toolbar>
      </AppBar>

      <Drawer
        variant={wide ? 'permanent' : 'temporary'}
        open={wide || navOpen}
        onClose={() => setNavOpen(false)}
        sx={{ width: wide ? DRAWER_WIDTH : undefined, flexShrink: 0 }}
        slotProps={{ paper: { sx: { width: DRAWER_WIDTH } } }}
      >
        {wide ? (
          barSpacer
        ) : (
          <Stack
            spacing={0.25}
            sx={{ px: 2.5, py: 2.5, bgcolor: slate[50], borderBottom: `1px solid ${granite[200]}` }}
          >
            <Typography sx={{ fontWeight: 500 }}>{user.displayName}</Typography>
            <Typography variant="body2" sx={{ color: 'text.secondary' }}>
              {roleList(user.roles)}
            </Typography>
          </Stack>
        )}
        <SideNav items={items} onNavigate={() => setNavOpen(false)} />
      </Drawer>

      <Box
        component="main"
        id={CONTENT_ID}
        tabIndex={-1}
        sx={{ flexGrow: 1, minWidth: 0, display: 'flex', flexDirection: 'column', outline: 'none' }}
      >
        {barSpacer}
        <Box
          sx={{
            flexGrow: 1,
            display: 'flex',
            flexDirection: 'column',
            width: '100%',
            maxWidth: 1440,
            mx: 'auto',
            px: { xs: 2, sm: 3, lg: 4 },
            py: { xs: 3, lg: 4 },
          }}
        >
          {children}
        </Box>
      </Box>
    </Box>
  );
}
