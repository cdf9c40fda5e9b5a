import { Transaction } from 'sequelize';
import { db, OrganisationSetting } from '@/models';
import { assertGlobal, type Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { getOrganisation, ORGANISATION_ROW_ID } from './get-organisation';
import { organisationInputSchema, type OrganisationInput, type OrganisationRecord } from './organisation-schema';

/**
 * An administrator sets the issuing organisation (one row, written whole in
 * one transaction, so two concurrent changes leave one of them, never a mix).
 * Only later renders and freezes print it; stored revisions keep their PDF.
 */
export async function updateOrganisation(actor: Actor, input: OrganisationInput): Promise<OrganisationRecord> {
  assertGlobal(actor, 'organisation.manage');
  const parsed = organisationInputSchema.parse(input);
  const sequelize = await db();
  return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const before = await getOrganisation(transaction);
    await OrganisationSetting.upsert(
      { id: ORGANISATION_ROW_ID, ...parsed, updatedBy: actor.id, updatedAt: new Date() },
      { transaction },
    );
    await recordAudit(
      {
        actor,
        action: 'organisation.update',
        details: { from: { name: before.name, distributionStatement: before.distributionStatement }, to: parsed },
      },
      transaction,
    );
    return getOrganisation(transaction);
  });
}
