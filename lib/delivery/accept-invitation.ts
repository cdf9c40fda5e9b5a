import { Transaction } from 'sequelize';
import type { z } from 'zod';
import { db } from '@/models';
import { recordAudit } from '@/lib/audit/record-audit';
import { hashPassword } from '@/lib/users/password';
import { acceptInvitationInputSchema } from './delivery-schema';
import { spendAccountLink } from './spend-account-link';

/** Spends an invitation: the invited customer account gets its name and password and becomes active. */
export async function acceptInvitation(input: z.infer<typeof acceptInvitationInputSchema>): Promise<{ email: string }> {
  const parsed = acceptInvitationInputSchema.parse(input);
  const sequelize = await db();
  const passwordHash = await hashPassword(parsed.password);
  return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const user = await spendAccountLink(parsed.token, 'invitation', transaction);
    await user.update({ name: parsed.name, passwordHash, active: true }, { transaction });
    await recordAudit(
      { actor: { id: user.id, email: user.email }, action: 'invitation.accept', details: { userId: user.id } },
      transaction,
    );
    return { email: user.email };
  });
}
