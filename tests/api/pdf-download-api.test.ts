import crypto from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAppServer, type AppServer } from '../../scripts/support/start-app-server';
import type { HttpSession } from '../../scripts/support/http-session';
import { demoEmail, frozenMemo, signedIn } from '../support/delivery-flow';
import type { OutboxDetail, OutboxSummary } from '@/lib/mail/list-outbox-messages';
import { pageTexts, writePdf } from '../lib/pdf/support/pdf-tools';

/**
 * One file per revision: every place a frozen revision's PDF is offered
 * (memo page, revision API, customer portal, release mail) gives the same
 * bytes (compared by SHA-256, FIPS 180-4) under the same file name; a draft's
 * file name and every page carry its version; every download is in the audit trail.
 */

// Its own app instance: releases to the demo customer must not change what other test files see.
let app: AppServer;
let baseUrl = '';
let analyst: HttpSession, reviewer: HttpSession, cm: HttpSession, customer: HttpSession, admin: HttpSession;
let memoId = 0;
let sha256 = '';
let documentNumber = '';

const digest = (b: ArrayBuffer | Buffer) =>
  crypto
    .createHash('sha256')
    .update(Buffer.from(b as ArrayBuffer))
    .digest('hex');
const fileNameOf = (res: Response) => /filename="([^"]+)"/.exec(res.headers.get('content-disposition') ?? '')?.[1];

beforeAll(async () => {
  app = await startAppServer();
  baseUrl = app.baseUrl;
  [analyst, reviewer, cm, customer, admin] = await Promise.all(
    (['analyst', 'reviewer', 'config-manager', 'customer', 'admin'] as const).map((r) => signedIn(baseUrl, r)),
  );
  ({ memoId, sha256 } = await frozenMemo({ analyst, reviewer, cm }, 'TERNLIGHT-1 one file per revision'));
  documentNumber = (await analyst.json<{ documentNumber: string }>(`/api/memos/${memoId}`)).body.documentNumber;
}, 300_000);
afterAll(() => app?.stop());

describe('a frozen memo has one PDF file', () => {
  it('memo page, revision API, portal and release mail all give the stored bytes under <document number>-rev-A.pdf', async () => {
    const expectedName = `${documentNumber}-rev-A.pdf`;
    const seen: [string, string | undefined, string][] = [];
    for (const [who, session, path] of [
      ['memo page (analyst)', analyst, `/api/memos/${memoId}/pdf`],
      ['memo page, letter paper asked (reviewer)', reviewer, `/api/memos/${memoId}/pdf?paper=letter`],
      ['revision API (configuration manager)', cm, `/api/memos/${memoId}/revisions/A/pdf`],
    ] as const) {
      const res = await session.request(path);
      expect(res.status, who).toBe(200);
      seen.push([who, fileNameOf(res), digest(await res.arrayBuffer())]);
      expect(res.headers.get('x-content-sha256'), who).toBe(sha256);
    }

    const customers = await cm.json<{ users: { id: number; name: string }[] }>('/api/users?role=customer');
    const samirId = customers.body.users.find((u) => u.name === 'Samir Dunmore')!.id;
    expect(
      (
        await cm.json(`/api/memos/${memoId}/distribution`, {
          method: 'POST',
          body: JSON.stringify({ userId: samirId }),
        })
      ).status,
    ).toBe(201);
    const release = await cm.json(`/api/memos/${memoId}/revisions/A/releases`, {
      method: 'POST',
      body: JSON.stringify({ recipientIds: [samirId], coverNote: 'One file per revision.' }),
    });
    expect(release.status).toBe(201);

    // The customer: the memo route and the portal page's download link.
    const viaMemo = await customer.request(`/api/memos/${memoId}/pdf`);
    expect(viaMemo.status).toBe(200);
    seen.push(['memo route (customer)', fileNameOf(viaMemo), digest(await viaMemo.arrayBuffer())]);
    const portalPage = await (await customer.request(`/portal/${memoId}/A`)).text();
    expect(portalPage).toContain(`download="${expectedName}"`);
    const viaPortal = await customer.request(`/api/memos/${memoId}/revisions/A/pdf`);
    seen.push(['portal (customer)', fileNameOf(viaPortal), digest(await viaPortal.arrayBuffer())]);

    // The release mail's attachment, as the local SMTP server received it.
    const messages = (
      await admin.json<{ messages: OutboxSummary[] }>(`/api/outbox?to=${encodeURIComponent(demoEmail('customer'))}`)
    ).body.messages;
    const mail = messages.find((m) => m.subject?.includes('TERNLIGHT-1 one file per revision'))!;
    const detail = (await admin.json<OutboxDetail>(`/api/outbox/${mail.id}`)).body;
    const attachment = await admin.request(`/api/outbox/${detail.id}/attachments/${detail.attachmentList[0].id}`);
    seen.push(['release mail', detail.attachmentList[0].filename ?? undefined, digest(await attachment.arrayBuffer())]);

    for (const [who, name, hash] of seen) {
      expect(hash, who).toBe(sha256);
      expect(name, who).toBe(expectedName);
    }
  });

  it('each download is in the audit trail with the stored SHA-256', async () => {
    const events = (
      await admin.json<{
        events: {
          action: string;
          actorEmail: string;
          revisionLetter: string | null;
          details: { pdfSha256?: string };
        }[];
      }>(`/api/audit?action=pdf.download&memoId=${memoId}`)
    ).body.events;
    expect(events.length).toBeGreaterThanOrEqual(5);
    expect(events.every((e) => e.revisionLetter === 'A' && e.details.pdfSha256 === sha256)).toBe(true);
    expect(new Set(events.map((e) => e.actorEmail))).toEqual(
      new Set(['analyst', 'reviewer', 'config-manager', 'customer'].map((r) => demoEmail(r as 'analyst'))),
    );
  });
});

describe('a draft PDF', () => {
  it('is rendered now, named <document number>-draft-v<version>.pdf, and audited with its version', async () => {
    const created = await analyst.json<{ id: number; documentNumber: string; version: number }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'TERNLIGHT-1 draft naming', templateId: 'sso-design-rationale' }),
    });
    expect(created.status).toBe(201);
    const { id, documentNumber: number, version } = created.body;
    const res = await analyst.request(`/api/memos/${id}/pdf`);
    expect(res.status).toBe(200);
    expect(fileNameOf(res)).toBe(`${number}-draft-v${version}.pdf`);
    const bytes = Buffer.from(await res.arrayBuffer());
    const hash = digest(bytes);
    // Every page (read back with poppler's pdftotext) carries the DRAFT band and the version in its running header.
    const pages = pageTexts(writePdf(`draft-${id}.pdf`, bytes));
    expect(pages.length).toBeGreaterThan(1);
    for (const [i, text] of pages.entries()) {
      expect(text, `page ${i + 1}`).toContain(`${number} · Draft, version ${version}`);
      expect(text, `page ${i + 1}`).toContain('DRAFT');
    }
    expect(res.headers.get('x-content-sha256')).toBe(hash);
    const events = (
      await admin.json<{
        events: { revisionLetter: string | null; details: { draft?: boolean; version?: number; pdfSha256?: string } }[];
      }>(`/api/audit?action=pdf.download&memoId=${id}`)
    ).body.events;
    expect(events).toEqual([
      expect.objectContaining({
        revisionLetter: null,
        details: expect.objectContaining({ draft: true, version, pdfSha256: hash }),
      }),
    ]);
  });
});
