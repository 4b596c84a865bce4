import type { User as SheetkeeperUser } from '../entities/user';

declare global {
  namespace Express {
    /** The signed-in user on `req.user` is the User entity. */
    interface User extends SheetkeeperUser {}
  }
}
