import { z } from 'zod';
import { ROLES } from '@/lib/auth/roles';

export const emailSchema = z.email({ error: 'e-mail address is not valid' }).trim().toLowerCase().max(320);
export const passwordSchema = z
  .string()
  .min(10, 'password must have at least 10 characters')
  .max(200, 'password must have at most 200 characters');
export const personNameSchema = z
  .string()
  .trim()
  .min(1, 'name is required')
  .max(200, 'name must have at most 200 characters');
export const roleSchema = z.enum(ROLES, { error: `role must be one of ${ROLES.join(', ')}` });

export const createUserInputSchema = z.strictObject({
  email: emailSchema,
  name: personNameSchema,
  role: roleSchema,
  password: passwordSchema,
});
export type CreateUserInput = z.infer<typeof createUserInputSchema>;

export const updateUserInputSchema = z
  .strictObject({
    name: personNameSchema.optional(),
    role: roleSchema.optional(),
    active: z.boolean({ error: 'active must be true or false' }).optional(),
    password: passwordSchema.optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: 'nothing to change', path: ['_'] });
export type UpdateUserInput = z.infer<typeof updateUserInputSchema>;

export const listUsersQuerySchema = z.strictObject({ role: roleSchema.optional() });
