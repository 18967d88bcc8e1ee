import { z } from 'zod';

/** The five roles of the brief. A person may hold several. */
export const ROLES = ['inspector', 'engineer', 'sales', 'service', 'admin'] as const;
export const roleSchema = z.enum(ROLES, { error: 'Choose one of: inspector, engineer, sales, service, admin.' });
export type Role = z.infer<typeof roleSchema>;

export const ROLE_LABELS: Record<Role, string> = {
  inspector: 'Inspector',
  engineer: 'Engineer',
  sales: 'Sales',
  service: 'Customer service',
  admin: 'Admin',
};
