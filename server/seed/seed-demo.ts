import type { DataSource } from 'typeorm';
import { User } from '../entities/user';
import { passwords } from '../auth/passwords';
import { DEMO_USERS } from './demo-users';

/**
 * Adds the demo users that are missing. Existing rows are left as they are, so a
 * role an admin changed survives the next `npm start`. Returns how many it added.
 */
export async function seedDemo(dataSource: DataSource): Promise<number> {
  const users = dataSource.getRepository(User);
  let added = 0;
  for (const demo of DEMO_USERS) {
    if (await users.existsBy({ email: demo.email })) continue;
    await users.insert({
      email: demo.email,
      displayName: demo.displayName,
      role: demo.role,
      passwordHash: await passwords.hash(demo.password),
    });
    added += 1;
  }
  return added;
}
