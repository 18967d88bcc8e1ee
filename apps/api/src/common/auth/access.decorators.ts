import { SetMetadata } from '@nestjs/common';
import type { Role } from '@evenset/contracts';

export const ROLES_KEY = 'evenset:roles';
export const PUBLIC_KEY = 'evenset:public';

/** The roles that may use a route. A route that declares neither this nor `@Public()` is refused. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);

/** Everyone, signed in or not, may use this route. */
export const Public = () => SetMetadata(PUBLIC_KEY, true);

/** Every signed-in person, whatever their roles. */
export const ANY_ROLE: Role[] = ['inspector', 'engineer', 'sales', 'service', 'admin'];
