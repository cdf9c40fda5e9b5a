import { Transaction } from 'sequelize';
import type { z } from 'zod';
import { db } from '@/models';
import { recordAudit } from '@/lib/audit/record-audit';
import { hashPassword } from '@/lib/users/password';
import { completePasswordResetInputSchema } from './delivery-schema';
import { spendAccountLink } from './spend-account-link';
import { endUserSessions } from '@/lib/sessions/end-sessions';

/** Spends a reset link, sets the new password of its (active) account and ends every session of that account. */
export async function completePasswordReset(
  input: z.infer<typeof completePasswordResetInputSchema>,
): Promise<{ email: string }> {
  const parsed = completePasswordResetInputSchema.parse(input);
  const sequelize = await db();
  const passwordHash = await hashPassword(parsed.password);
  return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const user = await spendAccountLink(parsed.token, 'password-reset', transaction);
    await user.update({ passwordHash }, { transaction });
    const sessionsEnded = await endUserSessions(user.id, 'password-reset', { transaction });
    await recordAudit(
      {
        actor: { id: user.id, email: user.email },
        action: 'password-reset.complete',
        details: { userId: user.id, sessionsEnded },
      },
      transaction,
    );
    return { email: user.email };
  });
}
