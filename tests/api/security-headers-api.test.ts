import { beforeAll, describe, expect, inject, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * Security headers (issue 11, item 7) over HTTP against the real server:
 * pages carry a nonce-based Content-Security-Policy that changes per response,
 * the API a `default-src 'none'` policy, every response the anti-framing,
 * no-sniff, referrer and permissions headers; attachments are served inline
 * under a safe name with a sandboxing policy.
 */

const baseUrl = inject('baseUrl');
let analyst: HttpSession;

beforeAll(async () => {
  analyst = new HttpSession(baseUrl);
  expect(await analyst.signIn(DEMO_USERS.find((u) => u.role === 'analyst')!.email, DEMO_PASSWORD)).toBe(true);
});

function expectCommonHeaders(res: Response, what: string) {
  expect(res.headers.get('x-frame-options'), what).toBe('DENY');
  expect(res.headers.get('x-content-type-options'), what).toBe('nosniff');
  expect(res.headers.get('referrer-policy'), what).toBe('strict-origin-when-cross-origin');
  expect(res.headers.get('permissions-policy'), what).toMatch(/camera=\(\)/);
}

const directives = (policy: string) =>
  new Map(
    policy
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .map(([name, ...values]) => [name, values] as const),
  );

describe('pages', () => {
  it('sign-in page and memo list: a nonce CSP without unsafe-inline or unsafe-eval scripts, fresh per response, on the scripts Next writes', async () => {
    const seen = new Set<string>();
    for (const path of ['/signin', '/signin', '/memos']) {
      const session = path === '/memos' ? analyst : new HttpSession(baseUrl);
      const res = await session.request(path);
      expect(res.status, path).toBe(200);
      expectCommonHeaders(res, path);
      const policy = res.headers.get('content-security-policy') ?? '';
      const d = directives(policy);
      const script = d.get('script-src') ?? [];
      const nonce = script.find((v) => v.startsWith("'nonce-"))?.slice(7, -1);
      expect(nonce, policy).toBeTruthy();
      expect(script).not.toContain("'unsafe-inline'");
      expect(script).not.toContain("'unsafe-eval'");
      expect(d.get('frame-ancestors')).toEqual(["'none'"]);
      expect(d.get('object-src')).toEqual(["'none'"]);
      expect(d.get('base-uri')).toEqual(["'self'"]);
      seen.add(nonce!);
      // Every <script> tag of the page carries the response's nonce.
      const html = await res.text();
      const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
      expect(scripts.length).toBeGreaterThan(0);
      for (const tag of scripts) expect(tag, path).toContain(`nonce="${nonce}"`);
    }
    expect(seen.size).toBe(3);
  });
});

describe('API', () => {
  it('JSON and errors: a policy that allows nothing, and the common headers', async () => {
    for (const [session, path, status] of [
      [analyst, '/api/memos', 200],
      [new HttpSession(baseUrl), '/api/memos', 401],
      [new HttpSession(baseUrl), '/api/auth/csrf', 200],
    ] as const) {
      const res = await session.request(path);
      expect(res.status, path).toBe(status);
      expectCommonHeaders(res, path);
      expect(res.headers.get('content-security-policy'), path).toBe("default-src 'none'; frame-ancestors 'none'");
    }
  });

  it('PDFs: only the anti-framing directive, which leaves the browser PDF viewer working', async () => {
    const created = await analyst.json<{ id: number }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'PDF headers' }),
    });
    const res = await analyst.request(`/api/memos/${created.body.id}/pdf`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('content-security-policy')).toBe("frame-ancestors 'none'");
    expectCommonHeaders(res, 'pdf');
  });

  it('attachments: inline with a safe filename, sandboxed, not sniffed', async () => {
    const created = await analyst.json<{ id: number }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'Attachment headers' }),
    });
    const png = Buffer.from(
      'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==',
      'base64',
    );
    const form = new FormData();
    form.append(
      'file',
      new Blob([new Uint8Array(png)], { type: 'image/png' }),
      '"quoted"\r\nX-Injected: 1; <script>.png',
    );
    const up = await analyst.json<{ url: string }>(`/api/memos/${created.body.id}/attachments`, {
      method: 'POST',
      body: form,
      headers: { origin: baseUrl },
    });
    expect(up.status).toBe(201);
    const res = await analyst.request(up.body.url);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('image/png');
    expect(res.headers.get('x-injected')).toBeNull();
    const disposition = res.headers.get('content-disposition') ?? '';
    expect(disposition).toMatch(/^inline; filename="[A-Za-z0-9._-]+\.png"$/);
    const d = directives(res.headers.get('content-security-policy') ?? '');
    expect(d.has('sandbox'), res.headers.get('content-security-policy') ?? '').toBe(true);
    expect(d.get('default-src')).toEqual(["'none'"]);
    expectCommonHeaders(res, 'attachment');
  });
});
