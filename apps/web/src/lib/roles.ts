import { ROLE_LABELS, ROLES, type Role } from '@evenset/contracts';

/** Roles in the contract's fixed order, whatever order the server sent them in. */
export function inRoleOrder(roles: readonly Role[]): Role[] {
  return ROLES.filter((role) => roles.includes(role));
}

export function roleList(roles: readonly Role[]): string {
  return inRoleOrder(roles)
    .map((role) => ROLE_LABELS[role])
    .join(' · ');
}

/** True when a person holding `held` may use something open to `allowed` (one shared role is enough). */
export function holdsAny(held: readonly Role[], allowed: readonly Role[]): boolean {
  return held.some((role) => allowed.includes(role));
}
