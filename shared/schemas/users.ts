import { z } from 'zod';
import { ROLES } from '../roles.js';
import { listQuery, pageOf } from './common.js';
import { line, text } from './text.js';

export const USER_STATUSES = ['active', 'deactivated'] as const;
export type UserStatus = (typeof USER_STATUSES)[number];

export const user = z
  .object({
    id: z.number().int(),
    email: z.string(),
    name: z.string(),
    role: z.enum(ROLES),
    status: z.enum(USER_STATUSES),
    lastSignInAt: z.string().nullable(),
    createdAt: z.string(),
    updatedAt: z.string(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), deactivate: z.boolean(), reactivate: z.boolean() }),
  })
  .meta({ id: 'User' });
export type User = z.infer<typeof user>;

export const usersQuery = listQuery(['name', 'email', 'role', 'createdAt', 'lastSignInAt'], 'name').extend({
  role: z.enum(ROLES).optional(),
  status: z.enum(USER_STATUSES).optional(),
  q: line(100, 'Search').optional(),
});
export type UsersQuery = z.infer<typeof usersQuery>;

export const userPage = pageOf(user).meta({ id: 'UserPage' });

export const updateUserBody = z
  .object({
    name: text(120, 'Name').optional(),
    role: z.enum(ROLES, { error: 'Choose one of the roles.' }).optional(),
    version: z.number().int().min(1),
  })
  .meta({ id: 'UpdateUserBody' });
export type UpdateUserBody = z.infer<typeof updateUserBody>;

export const deactivateUserBody = z
  .object({ reason: text(500, 'Reason', 'free').optional() })
  .meta({ id: 'DeactivateUserBody' });
export type DeactivateUserBody = z.infer<typeof deactivateUserBody>;
