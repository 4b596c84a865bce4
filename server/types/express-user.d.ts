import type { User as SheetkeeperUser } from '../entities/user';

declare global {
  namespace Express {
    /** The signed-in user on `req.user` is the User entity. */
    // An interface (not a type alias) so that it merges with the one @types/passport declares.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SheetkeeperUser {}
  }
}
