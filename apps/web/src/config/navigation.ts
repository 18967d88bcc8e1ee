import type { Role } from '@evenset/contracts';
import HomeOutlined from '@mui/icons-material/HomeOutlined';
import PeopleAltOutlined from '@mui/icons-material/PeopleAltOutlined';
import type { SvgIconComponent } from '@mui/icons-material';
import { paths } from './paths';

export interface NavItem {
  readonly label: string;
  readonly path: string;
  readonly icon: SvgIconComponent;
  readonly roles: readonly Role[];
}

/** The side navigation, in order. Only pages that exist are listed. */
export const navigation: readonly NavItem[] = [
  { label: 'Home', path: paths.home.path, icon: HomeOutlined, roles: paths.home.roles },
  { label: 'People', path: paths.people.path, icon: PeopleAltOutlined, roles: paths.people.roles },
];

/** The items a person holding `roles` may use: one shared role is enough. */
export function navigationFor(roles: readonly Role[], items: readonly NavItem[] = navigation): NavItem[] {
  return items.filter((item) => item.roles.some((role) => roles.includes(role)));
}
