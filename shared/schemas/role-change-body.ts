import { z } from 'zod';
import { jsonObject } from './json-object';
import { roleSchema } from './role-schema';

/** Body of `PATCH /api/users/:id`. */
export const roleChangeBody = jsonObject({ role: roleSchema });

export type RoleChangeBody = z.infer<typeof roleChangeBody>;
