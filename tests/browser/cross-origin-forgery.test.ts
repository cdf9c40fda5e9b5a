import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, signInAsDemo } from '../support/browser';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * Cross-site request forgery through real Chromium (issue 11, item 1): the
 * signed-in analyst visits a page served by a second HTTP server on another
 * loopback port of the same host name. Being the same site (host names match,
 * ports do not count), the browser sends the analyst's SameSite=Lax session
 * cookie with the page's requests to the app. The page tries a text/plain
 * form post (its body is valid JSON) and a no-cors fetch; nothing is created.
 */

const baseUrl = inject('baseUrl');
const analystEmail = DEMO_USERS.find((u) => u.role === 'analyst')!.email;
const FORM_TITLE = 'Forged through a text/plain form';
const FETCH_TITLE = 'Forged through a no-cors fetch';

function attackPage(): string {
  // enctype="text/plain" sends `name=value`: name `{"title":"…` and value `"}` make the valid JSON `{"title":"…="}`.
  const name = JSON.stringify({ title: FORM_TITLE }).slice(0, -2);
  return `<!doctype html><html><body>
<iframe name="sink" id="sink"></iframe>
<form id="f" method="POST" action="${baseUrl}/api/memos" enctype="text/plain" target="sink"><input name='${name}' value='"}'></form>
<script>
  window.done = Promise.all([
    fetch(${JSON.stringify(`${baseUrl}/api/memos`)}, { method: 'POST', mode: 'no-cors', credentials: 'include', headers: { 'content-type': 'text/plain' }, body: ${JSON.stringify(JSON.stringify({ title: FETCH_TITLE }))} }).then(() => 'sent', (e) => String(e)),
    new Promise((resolve) => { document.getElementById('sink').addEventListener('load', () => resolve('form answered'), { once: true }); document.getElementById('f').submit(); }),
  ]);
</script></body></html>`;
}

let context: BrowserContext;
let close: () => Promise<void>;
let attacker: http.Server;
let attackerUrl: string;
const formAnswers: number[] = [];

beforeAll(async () => {
  ({ context, close } = await openBrowser());
  attacker = http.createServer((req, res) => {
    res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
    res.end(attackPage());
  });
  await new Promise<void>((resolve) => attacker.listen(0, '127.0.0.1', resolve));
  attackerUrl = `http://${new URL(baseUrl).hostname}:${(attacker.address() as AddressInfo).port}/prize.html`;
});
afterAll(async () => {
  await close();
  await new Promise((resolve) => attacker.close(resolve));
});

describe('a page on another port of the same host, with the analyst signed in', () => {
  it('creates nothing: the form post and the fetch are refused for their Origin', async () => {
    const page = await signInAsDemo(context, baseUrl, analystEmail, DEMO_PASSWORD);
    const cookies = await context.cookies(baseUrl);
    expect(cookies.some((c) => c.name.endsWith('next-auth.session-token'))).toBe(true);
    // The app's answers to the two posts, as the browser received them.
    page.on('response', (res) => {
      if (res.url() === `${baseUrl}/api/memos` && res.request().method() === 'POST') formAnswers.push(res.status());
    });
    await page.goto(attackerUrl);
    const results = await page.evaluate(() => (window as unknown as { done: Promise<string[]> }).done);
    expect(results).toEqual(['sent', 'form answered']);
    await expect.poll(() => formAnswers.length).toBe(2);
    expect(formAnswers).toEqual([403, 403]);

    const analyst = new HttpSession(baseUrl);
    expect(await analyst.signIn(analystEmail, DEMO_PASSWORD)).toBe(true);
    const titles = (await analyst.json<{ memos: { title: string }[] }>('/api/memos')).body.memos.map((m) => m.title);
    // Without the origin rule (tried on the code before it) the fetch created its memo (201); the form body is valid JSON too.
    expect(titles.filter((t) => t.startsWith(FORM_TITLE) || t === FETCH_TITLE)).toEqual([]);
    await page.close();
  });
});
