import type { Role } from '@evenset/contracts';
import { holdsAny } from '../../../lib/roles';
import { useSignedInUser } from './use-signed-in-user';

/** True when the signed-in person holds one of `roles`. */
export function useMay(roles: readonly Role[]): boolean {
  return holdsAny(useSignedInUser().roles, roles);
}
