import type { Transaction } from 'sequelize';
import { db, OrganisationSetting } from '@/models';
import { DEFAULT_DISTRIBUTION, UNSET_ORGANISATION } from '@/lib/pdf/pdf-text';
import type { OrganisationRecord } from './organisation-schema';

export const ORGANISATION_ROW_ID = 1;

/**
 * The issuing organisation the PDF front matter prints (read at every render
 * and freeze; a frozen revision keeps the PDF it stored, so a later change
 * never reaches a baseline).
 */
export async function getOrganisation(transaction?: Transaction): Promise<OrganisationRecord> {
  await db();
  const row = await OrganisationSetting.findByPk(ORGANISATION_ROW_ID, { transaction });
  if (!row) return { name: UNSET_ORGANISATION, distributionStatement: DEFAULT_DISTRIBUTION, updatedAt: null };
  return {
    name: row.name,
    distributionStatement: row.distributionStatement,
    updatedAt: new Date(row.updatedAt).toISOString(),
  };
}
