import StraightenOutlined from '@mui/icons-material/StraightenOutlined';
import { navigationFor, type NavItem } from './navigation';

const labels = (items: readonly NavItem[]): string[] => items.map((item) => item.label);

describe('navigationFor', () => {
  it('shows an admin Home, the customer pages, People, the Outbox and the audit log', () => {
    expect(labels(navigationFor(['admin']))).toEqual([
      'Home',
      'Customers',
      'Sets',
      'Certificates',
      'Replacements',
      'Trends',
      'Grind requests',
      'People',
      'Outbox',
      'Audit log',
    ]);
  });

  it('hides People from everyone who is not an admin', () => {
    for (const role of ['inspector', 'engineer', 'sales', 'service'] as const) {
      expect(labels(navigationFor([role]))).not.toContain('People');
    }
  });

  it('shows engineers and inspectors the specs, gauges and materials they may read', () => {
    expect(labels(navigationFor(['inspector']))).toEqual([
      'Home',
      'Bench',
      'Lots',
      'Specs',
      'Masters',
      'Instruments',
      'Materials',
      'Trends',
      'Grind requests',
    ]);
    expect(labels(navigationFor(['engineer']))).toEqual([
      'Home',
      'Lots',
      'Specs',
      'Masters',
      'Instruments',
      'Materials',
      'Customers',
      'Sets',
      'Certificates',
      'Replacements',
      'Trends',
      'Gauge studies',
      'Grind requests',
      'Audit log',
    ]);
    const customerPages = ['Home', 'Customers', 'Sets', 'Certificates', 'Replacements', 'Grind requests'];
    expect(labels(navigationFor(['sales']))).toEqual(customerPages);
    expect(labels(navigationFor(['service']))).toEqual(customerPages);
  });

  it('joins the pages of every role a person holds, each once and in menu order', () => {
    expect(labels(navigationFor(['inspector', 'admin']))).toEqual([
      'Home',
      'Bench',
      'Lots',
      'Specs',
      'Masters',
      'Instruments',
      'Materials',
      'Customers',
      'Sets',
      'Certificates',
      'Replacements',
      'Trends',
      'Grind requests',
      'People',
      'Outbox',
      'Audit log',
    ]);
  });

  it('shows nothing to a person without roles (deny by default)', () => {
    expect(navigationFor([])).toEqual([]);
  });

  it('keeps an item open to several roles for any one of them', () => {
    const items: NavItem[] = [{ label: 'Sets', path: '/sets', icon: StraightenOutlined, roles: ['sales', 'service'] }];
    expect(labels(navigationFor(['service'], items))).toEqual(['Sets']);
    expect(labels(navigationFor(['inspector'], items))).toEqual([]);
  });
});
