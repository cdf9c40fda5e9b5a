import { z } from 'zod';

/** The issuing organisation as the PDF prints it: title page, page header, distribution statement. */
export interface OrganisationRecord {
  name: string;
  distributionStatement: string;
  /** When an administrator last changed it; null while the built-in defaults apply. */
  updatedAt: string | null;
}

/** PUT /api/organisation: both fields, trimmed, non-empty. */
export const organisationInputSchema = z.strictObject({
  name: z
    .string({ error: 'name must be text' })
    .trim()
    .min(1, 'name is required')
    .max(200, 'name must have at most 200 characters'),
  distributionStatement: z
    .string({ error: 'distributionStatement must be text' })
    .trim()
    .min(1, 'distributionStatement is required')
    .max(1000, 'distributionStatement must have at most 1000 characters'),
});
export type OrganisationInput = z.infer<typeof organisationInputSchema>;
