import { beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '@/lib/demo/seed-demo';
import { DEMO_DISTRIBUTION_STATEMENT, DEMO_ORGANISATION } from '@/lib/demo/demo-organisation';
import { getOrganisation } from '@/lib/organisation/get-organisation';
import { freshDatabase } from '../../support/factories';

beforeAll(async () => {
  await freshDatabase();
});

describe('seedDemo', () => {
  it('stores the invented demo organisation as the organisation setting the PDFs print', async () => {
    expect(await seedDemo()).toEqual({ seeded: true });
    expect(await getOrganisation()).toMatchObject({
      name: DEMO_ORGANISATION,
      distributionStatement: DEMO_DISTRIBUTION_STATEMENT,
    });
  });

  it('does nothing a second time, so a changed setting is never put back', async () => {
    expect(await seedDemo()).toEqual({ seeded: false });
  });
});
