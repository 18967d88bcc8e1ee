import type { SessionUser } from '@evenset/contracts';

declare global {
  namespace Express {
    // passport types `req.user` as this interface; ours is the contract's session user.
    interface User extends SessionUser {}
  }
}
