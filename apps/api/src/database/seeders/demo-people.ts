import type { UserSeed } from '../factories/user.factory';

/** Shared by every demo account; documented in the README. Demo data only. */
export const DEMO_PASSWORD = 'evenset-demo-1';

/** The invented staff of "Kestrel Workholding", one or more per role. */
export const DEMO_PEOPLE: UserSeed[] = [
  {
    email: 'admin@kestrel.example',
    displayName: 'Morgan Pell',
    roles: ['admin'],
    password: DEMO_PASSWORD,
  },
  {
    email: 'engineer@kestrel.example',
    displayName: 'Dana Whitcombe',
    roles: ['engineer'],
    password: DEMO_PASSWORD,
  },
  {
    email: 'inspector@kestrel.example',
    displayName: 'Rui Okafor',
    roles: ['inspector'],
    password: DEMO_PASSWORD,
  },
  {
    email: 'inspector2@kestrel.example',
    displayName: 'Lena Marsh',
    roles: ['inspector'],
    password: DEMO_PASSWORD,
  },
  {
    // The third appraiser of the demo gauge study (demo-gauge-study.ts).
    email: 'inspector3@kestrel.example',
    displayName: 'Ivo Brannigan',
    roles: ['inspector'],
    password: DEMO_PASSWORD,
  },
  {
    email: 'sales@kestrel.example',
    displayName: 'Priya Castellan',
    roles: ['sales'],
    password: DEMO_PASSWORD,
  },
  {
    email: 'service@kestrel.example',
    displayName: 'Tomas Greave',
    roles: ['service'],
    password: DEMO_PASSWORD,
  },
];
