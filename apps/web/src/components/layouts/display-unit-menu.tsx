import { sessionUserSchema, type DisplayUnit, type Session } from '@evenset/contracts';
import CheckOutlined from '@mui/icons-material/CheckOutlined';
import StraightenOutlined from '@mui/icons-material/StraightenOutlined';
import Button from '@mui/material/Button';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Menu from '@mui/material/Menu';
import MenuItem from '@mui/material/MenuItem';
import { useId, useState } from 'react';
import { useSWRConfig } from 'swr';
import { SESSION_KEY } from '../../features/auth/api/get-session';
import { useSignedInUser } from '../../features/auth/hooks/use-signed-in-user';
import { apiWrite } from '../../lib/api-client';
import { describeError } from '../../lib/errors';
import { ochre, slate } from '../../theme/tokens';
import { useNotify } from '../feedback/notifications';

const UNITS: { unit: DisplayUnit; label: string }[] = [
  { unit: 'in', label: 'Inches (in)' },
  { unit: 'mm', label: 'Millimetres (mm)' },
];

/**
 * The unit the signed-in person reads lengths in. Saved on their account; the session is updated
 * in place, so every page that reads `displayUnit` redraws at once.
 */
export function DisplayUnitMenu() {
  const user = useSignedInUser();
  const { mutate } = useSWRConfig();
  const notify = useNotify();
  const menuId = useId();
  const [anchor, setAnchor] = useState<HTMLElement | null>(null);
  const [saving, setSaving] = useState(false);

  const choose = async (unit: DisplayUnit) => {
    setAnchor(null);
    if (unit === user.displayUnit) return;
    setSaving(true);
    try {
      const updated = await apiWrite('PATCH', '/me/preferences', { displayUnit: unit }, sessionUserSchema);
      await mutate<Session | null>(SESSION_KEY, (session) => (session ? { ...session, user: updated } : session), {
        revalidate: false,
      });
      notify(unit === 'mm' ? 'Lengths are now shown in millimetres.' : 'Lengths are now shown in inches.');
    } catch (error) {
      notify(`The unit was not changed. ${describeError(error)}`, 'error');
    } finally {
      setSaving(false);
    }
  };

  return (
    <>
      <Button
        color="inherit"
        variant="outlined"
        startIcon={<StraightenOutlined />}
        loading={saving}
        loadingPosition="start"
        aria-haspopup="menu"
        aria-controls={anchor ? menuId : undefined}
        aria-expanded={anchor ? 'true' : undefined}
        aria-label={`Units: ${user.displayUnit}. Change the unit lengths are shown in`}
        onClick={(e) => setAnchor(e.currentTarget)}
        sx={{ borderColor: slate[200], flexShrink: 0, '&:hover': { borderColor: ochre[300], bgcolor: slate[800] } }}
      >
        Units: {user.displayUnit}
      </Button>
      <Menu id={menuId} anchorEl={anchor} open={Boolean(anchor)} onClose={() => setAnchor(null)}>
        {UNITS.map(({ unit, label }) => {
          const chosen = unit === user.displayUnit;
          return (
            <MenuItem key={unit} role="menuitemradio" aria-checked={chosen} onClick={() => void choose(unit)}>
              <ListItemIcon>{chosen ? <CheckOutlined fontSize="small" /> : null}</ListItemIcon>
              <ListItemText>{label}</ListItemText>
            </MenuItem>
          );
        })}
      </Menu>
    </>
  );
}
