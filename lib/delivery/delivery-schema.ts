import { z } from 'zod';
import { emailSchema, passwordSchema, personNameSchema } from '@/lib/users/user-schema';

const id = z.number({ error: 'must be a user id' }).int('must be a user id').positive('must be a user id');

/** POST /api/memos/[id]/revisions/[letter]/releases */
export const releaseInputSchema = z.strictObject({
  recipientIds: z.union([z.literal('all'), z.array(id).min(1, 'pick at least one recipient').max(500)], {
    error: 'recipientIds must be "all" or a list of contact ids',
  }),
  coverNote: z
    .string({ error: 'a cover note is required' })
    .trim()
    .min(1, 'a cover note is required')
    .max(4000, 'cover note must have at most 4000 characters'),
});
export type ReleaseInput = z.infer<typeof releaseInputSchema>;

/** POST /api/memos/[id]/distribution: an existing customer by id, or an e-mail address to invite. */
export const addContactInputSchema = z.union(
  [z.strictObject({ userId: id }), z.strictObject({ email: emailSchema, name: personNameSchema })],
  { error: 'give either userId, or email and name' },
);
export type AddContactInput = z.infer<typeof addContactInputSchema>;

const tokenSchema = z
  .string({ error: 'token is required' })
  .min(20, 'token is not valid')
  .max(600, 'token is not valid');

export const acceptInvitationInputSchema = z.strictObject({
  token: tokenSchema,
  name: personNameSchema,
  password: passwordSchema,
});
export const requestPasswordResetInputSchema = z.strictObject({ email: emailSchema });
export const completePasswordResetInputSchema = z.strictObject({ token: tokenSchema, password: passwordSchema });
