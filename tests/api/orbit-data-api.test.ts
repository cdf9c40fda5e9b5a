/**
 * CCSDS orbit data messages over HTTP: a frozen revision of a memo made from the
 * design-rationale template carries the OPM of its design state and the OEM of its
 * one-day check, hashed like the PDF; the OPM read back through the orbit-message
 * kind gives the design's mean elements to the OPM's printed precision (a 1e-5 km,
 * i and RAAN 1e-6°); a block's "Download OPM" and a malformed message are answered
 * as the README says. Message format checks: CCSDS 502.0-B (tests/lib/orbit-data).
 */
import crypto from 'node:crypto';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';

const baseUrl = inject('baseUrl');
const email = (role: Role) => DEMO_USERS.find((u) => u.role === role)!.email;
async function as(role: Role) {
  const s = new HttpSession(baseUrl);
  expect(await s.signIn(email(role), DEMO_PASSWORD)).toBe(true);
  return s;
}

let analyst: HttpSession, reviewer: HttpSession, cm: HttpSession, customer: HttpSession;
let memoId: number;

beforeAll(async () => {
  [analyst, reviewer, cm, customer] = await Promise.all(
    (['analyst', 'reviewer', 'config-manager', 'customer'] as Role[]).map(as),
  );
  const created = await analyst.json<{ id: number }>('/api/memos', {
    method: 'POST',
    body: JSON.stringify({ title: 'Orbit data trial', templateId: 'sso-design-rationale' }),
  });
  memoId = created.body.id;
  const dir = await analyst.json<{ users: { id: number; name: string }[] }>('/api/users?role=reviewer');
  const reviewerId = dir.body.users.find((u) => u.name === 'Tobias Quenby')!.id;
  const move = (s: HttpSession, body: Record<string, unknown>) =>
    s.json(`/api/memos/${memoId}/transitions`, { method: 'POST', body: JSON.stringify(body) });
  expect((await move(analyst, { action: 'submit', reviewerIds: [reviewerId] })).status).toBe(200);
  expect((await move(reviewer, { action: 'approve', note: 'Sound.', password: DEMO_PASSWORD })).status).toBe(200);
  expect(
    (await move(cm, { action: 'freeze', changeSummary: 'First issue with orbit data.', password: DEMO_PASSWORD }))
      .status,
  ).toBe(200);
}, 180_000);

describe('a frozen revision carries its design orbit as CCSDS messages', () => {
  it('GET …/revisions/A/opm and …/oem: KVN text, the same every time, its SHA-256 in the header and in the revision list', async () => {
    const list = await analyst.json<{
      revisions: { letter: string; opmSha256: string | null; oemSha256: string | null }[];
    }>(`/api/memos/${memoId}/revisions`);
    const [rev] = list.body.revisions;
    for (const kind of ['opm', 'oem'] as const) {
      const [a, b] = await Promise.all([1, 2].map(() => reviewer.request(`/api/memos/${memoId}/revisions/A/${kind}`)));
      expect(a.status).toBe(200);
      expect(a.headers.get('content-disposition')).toMatch(new RegExp(`attachment; filename=".*-rev-A\\.${kind}"`));
      const [ta, tb] = [await a.text(), await b.text()];
      expect(ta).toBe(tb);
      expect(ta.startsWith(kind === 'opm' ? 'CCSDS_OPM_VERS' : 'CCSDS_OEM_VERS')).toBe(true);
      const sha = crypto.createHash('sha256').update(ta, 'utf8').digest('hex');
      expect(a.headers.get('x-content-sha256')).toBe(sha);
      expect(kind === 'opm' ? rev.opmSha256 : rev.oemSha256).toBe(sha);
    }
    expect((await reviewer.request(`/api/memos/${memoId}/revisions/A/tle`)).status).toBe(404);
    // Not released to this customer: the same 404 as an unknown memo.
    expect((await customer.request(`/api/memos/${memoId}/revisions/A/opm`)).status).toBe(404);
  });

  it('the OPM read back through the orbit-message kind gives the design mean elements', async () => {
    const opm = await (await analyst.request(`/api/memos/${memoId}/revisions/A/opm`)).text();
    const imported = await analyst.json<{ outputs: Record<string, number> }>('/api/calc', {
      method: 'POST',
      body: JSON.stringify({ kind: 'orbit-message', inputs: { message: opm } }),
    });
    expect(imported.status).toBe(200);
    const out = imported.body.outputs;
    // The design block's mean elements, from the blocks it is fed from in the template (repeat 175/12, its SSO inclination, the node at the reference epoch).
    const calc = async (kind: string, inputs: Record<string, unknown>) =>
      (
        await analyst.json<{ outputs: Record<string, number> }>('/api/calc', {
          method: 'POST',
          body: JSON.stringify({ kind, inputs }),
        })
      ).body.outputs;
    const repeat = await calc('repeat-orbit', { revolutions: 175, days: 12 });
    const sso = await calc('sso-inclination', { altitudeKm: repeat.altitudeKm, eccentricity: 0.0011 });
    const ltan = await calc('node-local-time', { epoch: '2027-09-15T00:00:00Z', ltanHours: 22.5 });
    expect(Math.abs(out.meanSemiMajorAxisKm - repeat.semiMajorAxisKm)).toBeLessThan(1e-5);
    expect(Math.abs(out.meanInclinationDeg - sso.inclinationDeg)).toBeLessThan(1e-6);
    expect(Math.abs(out.meanRaanDeg - ltan.raanDeg)).toBeLessThan(1e-6);
  });
});

describe('POST /api/calc/opm and the orbit-message kind', () => {
  const mean = {
    semiMajorAxisKm: 7070,
    eccentricity: 0.00115,
    inclinationDeg: 98.19,
    raanDeg: 261.5,
    argPerigeeDeg: 90,
    meanAnomalyDeg: 0,
  };
  it('exports a dated state as an OPM; without an epoch 400 naming epoch', async () => {
    const ok = await analyst.request('/api/calc/opm', {
      method: 'POST',
      body: JSON.stringify({
        kind: 'mean-to-osculating',
        inputs: { ...mean, epoch: '2027-09-15T00:00:00Z' },
        objectName: 'TERNLIGHT-1',
        objectId: 'BWO-TL1-DM-001',
      }),
    });
    expect(ok.status).toBe(200);
    const text = await ok.text();
    expect(text).toMatch(/^REF_FRAME\s+= EME2000$/m);
    expect(text).toMatch(/^OBJECT_NAME\s+= TERNLIGHT-1$/m);
    const missing = await analyst.json<{ error: string; fields: Record<string, string> }>('/api/calc/opm', {
      method: 'POST',
      body: JSON.stringify({ kind: 'mean-to-osculating', inputs: { semiMajorAxisKm: 7070 } }),
    });
    expect(missing.status).toBe(400);
    expect(missing.body.fields.epoch).toMatch(/no epoch/);
    const noState = await analyst.json<{ fields: Record<string, string> }>('/api/calc/opm', {
      method: 'POST',
      body: JSON.stringify({ kind: 'sso-inclination', inputs: {} }),
    });
    expect(noState.status).toBe(400);
    expect(noState.body.fields.kind).toMatch(/does not yield a state vector/);
  });

  it('a malformed message is 400 naming its line and keyword', async () => {
    const bad =
      'CCSDS_OPM_VERS = 2.0\nCREATION_DATE = 2026-12-02T00:00:00\nORIGINATOR = X\nOBJECT_NAME = T\nOBJECT_ID = T\nCENTER_NAME = MOON\n';
    const r = await analyst.json<{ fields: Record<string, string> }>('/api/calc', {
      method: 'POST',
      body: JSON.stringify({ kind: 'orbit-message', inputs: { message: bad } }),
    });
    expect(r.status).toBe(400);
    expect(r.body.fields.message).toMatch(/line 6, CENTER_NAME: "MOON" is not accepted: only EARTH/);
  });
});
