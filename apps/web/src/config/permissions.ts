import type { Role } from '@evenset/contracts';

/**
 * Who may change what, as the API's write routes declare it; pages show a command only to
 * those who may use it (the server checks again on every request).
 */
export const WRITE_ROLES = {
  specs: ['engineer'],
  materials: ['engineer'],
  masters: ['engineer'],
  instruments: ['engineer'],
  lots: ['engineer'],
  bench: ['inspector'],
  replacements: ['service', 'sales'],
  grindRequests: ['service', 'engineer'],
  grindSteps: ['engineer', 'inspector', 'service'],
} as const satisfies Record<string, readonly Role[]>;
