import { UniqueConstraintError } from 'sequelize';
import { db, User } from '@/models';
import { ApiError } from '@/lib/api/errors';
import { hashPassword } from './password';
import { recordAudit } from '@/lib/audit/record-audit';
import { createUserInputSchema, type CreateUserInput } from './user-schema';
import { toUserRecord, type UserRecord } from './user-record';

/** Creates a user; a taken e-mail address is a 409 naming the field. */
export async function createUser(
  input: CreateUserInput,
  by: { id: number; email: string } | null = null,
): Promise<UserRecord> {
  const parsed = createUserInputSchema.parse(input);
  await db();
  try {
    const user = await User.create({
      email: parsed.email,
      name: parsed.name,
      role: parsed.role,
      passwordHash: await hashPassword(parsed.password),
    });
    await recordAudit({
      actor: by,
      action: 'user.create',
      details: { userId: user.id, email: user.email, role: user.role, via: by ? 'admin' : 'command line' },
    });
    return toUserRecord(user);
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      throw new ApiError('conflict', `A user with e-mail ${parsed.email} already exists.`, {
        fields: { email: 'already in use' },
      });
    }
    throw err;
  }
}
