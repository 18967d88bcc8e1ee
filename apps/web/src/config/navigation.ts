import type { Role } from '@evenset/contracts';
import HomeOutlined from '@mui/icons-material/HomeOutlined';
import Inventory2Outlined from '@mui/icons-material/Inventory2Outlined';
import TableRestaurantOutlined from '@mui/icons-material/TableRestaurantOutlined';
import PeopleAltOutlined from '@mui/icons-material/PeopleAltOutlined';
import HandshakeOutlined from '@mui/icons-material/HandshakeOutlined';
import ViewModuleOutlined from '@mui/icons-material/ViewModuleOutlined';
import WorkspacePremiumOutlined from '@mui/icons-material/WorkspacePremiumOutlined';
import OutboxOutlined from '@mui/icons-material/OutboxOutlined';
import HistoryOutlined from '@mui/icons-material/HistoryOutlined';
import ChangeCircleOutlined from '@mui/icons-material/ChangeCircleOutlined';
import InsightsOutlined from '@mui/icons-material/InsightsOutlined';
import PrecisionManufacturingOutlined from '@mui/icons-material/PrecisionManufacturingOutlined';
import ArchitectureOutlined from '@mui/icons-material/ArchitectureOutlined';
import ScienceOutlined from '@mui/icons-material/ScienceOutlined';
import SpeedOutlined from '@mui/icons-material/SpeedOutlined';
import RuleOutlined from '@mui/icons-material/RuleOutlined';
import StraightenOutlined from '@mui/icons-material/StraightenOutlined';
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
  { label: 'Bench', path: paths.bench.path, icon: TableRestaurantOutlined, roles: paths.bench.roles },
  { label: 'Lots', path: paths.lots.path, icon: Inventory2Outlined, roles: paths.lots.roles },
  { label: 'Specs', path: paths.specs.path, icon: ArchitectureOutlined, roles: paths.specs.roles },
  { label: 'Masters', path: paths.masters.path, icon: StraightenOutlined, roles: paths.masters.roles },
  { label: 'Instruments', path: paths.instruments.path, icon: SpeedOutlined, roles: paths.instruments.roles },
  { label: 'Materials', path: paths.materials.path, icon: ScienceOutlined, roles: paths.materials.roles },
  { label: 'Customers', path: paths.customers.path, icon: HandshakeOutlined, roles: paths.customers.roles },
  { label: 'Sets', path: paths.sets.path, icon: ViewModuleOutlined, roles: paths.sets.roles },
  {
    label: 'Certificates',
    path: paths.certificates.path,
    icon: WorkspacePremiumOutlined,
    roles: paths.certificates.roles,
  },
  { label: 'Replacements', path: paths.replacements.path, icon: ChangeCircleOutlined, roles: paths.replacements.roles },
  { label: 'Trends', path: paths.trends.path, icon: InsightsOutlined, roles: paths.trends.roles },
  { label: 'Gauge studies', path: paths.gaugeStudies.path, icon: RuleOutlined, roles: paths.gaugeStudies.roles },
  {
    label: 'Grind requests',
    path: paths.grindRequests.path,
    icon: PrecisionManufacturingOutlined,
    roles: paths.grindRequests.roles,
  },
  { label: 'People', path: paths.people.path, icon: PeopleAltOutlined, roles: paths.people.roles },
  { label: 'Outbox', path: paths.outbox.path, icon: OutboxOutlined, roles: paths.outbox.roles },
  { label: 'Audit log', path: paths.auditLog.path, icon: HistoryOutlined, roles: paths.auditLog.roles },
];

/** The items a person holding `roles` may use: one shared role is enough. */
export function navigationFor(roles: readonly Role[], items: readonly NavItem[] = navigation): NavItem[] {
  return items.filter((item) => item.roles.some((role) => roles.includes(role)));
}
