import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import { NavLink, useMatch } from 'react-router-dom';
import type { NavItem } from '../../config/navigation';

function NavEntry({ item, onNavigate }: { item: NavItem; onNavigate: () => void }) {
  const match = useMatch({ path: item.path, end: item.path === '/' });
  const Icon = item.icon;
  return (
    <ListItemButton
      component={NavLink}
      to={item.path}
      end={item.path === '/'}
      selected={match !== null}
      onClick={onNavigate}
    >
      <ListItemIcon>
        <Icon />
      </ListItemIcon>
      <ListItemText primary={item.label} slotProps={{ primary: { sx: { fontWeight: 'inherit' } } }} />
    </ListItemButton>
  );
}

/** The main navigation: only the places the signed-in person may use. */
export function SideNav({ items, onNavigate }: { items: readonly NavItem[]; onNavigate: () => void }) {
  return (
    <nav aria-label="Main">
      <List sx={{ py: 1.5 }}>
        {items.map((item) => (
          <NavEntry key={item.path} item={item} onNavigate={onNavigate} />
        ))}
      </List>
    </nav>
  );
}
