import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '@/models';
import { ApiError } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { getOrganisation } from '@/lib/organisation/get-organisation';
import { updateOrganisation } from '@/lib/organisation/update-organisation';
import { organisationInputSchema } from '@/lib/organisation/organisation-schema';
import { DEFAULT_DISTRIBUTION, UNSET_ORGANISATION } from '@/lib/pdf/pdf-text';
import { freshDatabase, makeUser } from '../../support/factories';

let admin: Actor;
let manager: Actor;

beforeAll(async () => {
  await freshDatabase();
  admin = await makeUser('admin');
  manager = await makeUser('config-manager');
});

async function refusal(p: Promise<unknown>): Promise<ApiError> {
  const err = await p.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(ApiError);
  return err as ApiError;
}

describe('organisation setting', () => {
  it('reads as visibly unset (and the generic distribution statement) before anyone sets it', async () => {
    expect(await getOrganisation()).toEqual({
      name: UNSET_ORGANISATION,
      distributionStatement: DEFAULT_DISTRIBUTION,
      updatedAt: null,
    });
  });

  it('is changed by an administrator, trimmed, and the change is in the audit trail with before and after', async () => {
    const saved = await updateOrganisation(admin, {
      name: '  Fenwick Orbital Works ',
      distributionStatement: 'Distribution: Fenwick staff only.',
    });
    expect(saved.name).toBe('Fenwick Orbital Works');
    expect(saved.updatedAt).not.toBeNull();
    expect(await getOrganisation()).toEqual(saved);
    const event = await AuditEvent.findOne({ where: { action: 'organisation.update' }, order: [['id', 'DESC']] });
    expect(event?.actorId).toBe(admin.id);
    expect(event?.details).toMatchObject({ from: { name: UNSET_ORGANISATION }, to: { name: 'Fenwick Orbital Works' } });
  });

  it('refuses everyone but administrators with 403 and changes nothing', async () => {
    const before = await getOrganisation();
    for (const role of ['analyst', 'reviewer', 'config-manager', 'customer'] as const) {
      const err = await refusal(
        updateOrganisation(role === 'config-manager' ? manager : await makeUser(role), {
          name: 'Other',
          distributionStatement: 'x',
        }),
      );
      expect(err.status, role).toBe(403);
    }
    expect(await getOrganisation()).toEqual(before);
  });

  it('names the field that is empty, too long or missing', () => {
    const fields = (v: unknown) => {
      const r = organisationInputSchema.safeParse(v);
      expect(r.success).toBe(false);
      return r.error!.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    };
    expect(fields({ name: '   ', distributionStatement: 'x' })).toEqual(['name: name is required']);
    expect(fields({ name: 'x'.repeat(201), distributionStatement: 'x' })).toEqual([
      'name: name must have at most 200 characters',
    ]);
    expect(fields({ name: 'x' })).toEqual(['distributionStatement: distributionStatement must be text']);
    expect(fields({ name: 'x', distributionStatement: 'y', logo: 'z' })[0]).toMatch(/logo/);
  });

  it('keeps the last of two concurrent changes whole, never a mix of both', async () => {
    await Promise.all([
      updateOrganisation(admin, { name: 'First Works', distributionStatement: 'First statement.' }),
      updateOrganisation(admin, { name: 'Second Works', distributionStatement: 'Second statement.' }),
    ]);
    const now = await getOrganisation();
    expect([
      ['First Works', 'First statement.'],
      ['Second Works', 'Second statement.'],
    ]).toContainEqual([now.name, now.distributionStatement]);
  });
});
