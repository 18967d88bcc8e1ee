import type { Role } from '@evenset/contracts';
import type { SvgIconComponent } from '@mui/icons-material';
import AdminPanelSettingsOutlined from '@mui/icons-material/AdminPanelSettingsOutlined';
import ArchitectureOutlined from '@mui/icons-material/ArchitectureOutlined';
import Inventory2Outlined from '@mui/icons-material/Inventory2Outlined';
import StraightenOutlined from '@mui/icons-material/StraightenOutlined';
import SupportAgentOutlined from '@mui/icons-material/SupportAgentOutlined';

/** What each role does in Evenset, in one plain sentence. */
export const ROLE_WORK: Record<Role, { icon: SvgIconComponent; work: string }> = {
  inspector: {
    icon: StraightenOutlined,
    work: 'You measure ground parts at the surface plate against a master gauge, key in the readings and see at once whether each part conforms.',
  },
  engineer: {
    icon: ArchitectureOutlined,
    work: 'You set each part number’s spec — nominal, tolerance band, matching band and measurement plan — look after the master gauges and their calibrations, and decide what happens to held parts.',
  },
  sales: {
    icon: Inventory2Outlined,
    work: 'You build matched sets from released parts, attach them to customer orders and issue each set’s certificate of conformance.',
  },
  service: {
    icon: SupportAgentOutlined,
    work: 'You find a customer’s original set from a certificate number or serial and check whether a replacement part will match it.',
  },
  admin: {
    icon: AdminPanelSettingsOutlined,
    work: 'You decide who can sign in to Evenset and what each person may do.',
  },
};
