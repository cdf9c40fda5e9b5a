/**
 * A signed-in HTTP client against the running app: it goes through
 * next-auth's real credentials flow (CSRF token, callback, session cookie).
 */
export class HttpSession {
  private cookies = new Map<string, string>();
  constructor(readonly baseUrl: string) {}

  /** The session cookies as a Cookie header, for clients that build their own requests. */
  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  private keepCookies(res: Response) {
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const i = pair.indexOf('=');
      this.cookies.set(pair.slice(0, i).trim(), pair.slice(i + 1).trim());
    }
  }

  async request(path: string, init: RequestInit = {}): Promise<Response> {
    const res = await fetch(this.baseUrl + path, {
      ...init,
      redirect: 'manual',
      headers: {
        ...(init.body && typeof init.body === 'string' ? { 'content-type': 'application/json' } : {}),
        cookie: this.cookieHeader(),
        ...(init.headers ?? {}),
      },
    });
    this.keepCookies(res);
    return res;
  }

  async json<T = Record<string, unknown>>(path: string, init: RequestInit = {}): Promise<{ status: number; body: T }> {
    const res = await this.request(path, init);
    const text = await res.text();
    return { status: res.status, body: (text ? JSON.parse(text) : null) as T };
  }

  /** Another client holding a copy of this one's cookies (a stolen or kept cookie, a second tab; or another app instance behind the same proxy). */
  copy(baseUrl = this.baseUrl): HttpSession {
    const twin = new HttpSession(baseUrl);
    for (const [k, v] of this.cookies) twin.cookies.set(k, v);
    return twin;
  }

  /** Signs out through next-auth's sign-out route (CSRF token, POST); returns the status. */
  async signOut(): Promise<number> {
    const csrf = await this.json<{ csrfToken: string }>('/api/auth/csrf');
    const form = new URLSearchParams({
      csrfToken: csrf.body.csrfToken,
      json: 'true',
      callbackUrl: this.baseUrl + '/signin',
    });
    const res = await this.request('/api/auth/signout', {
      method: 'POST',
      body: form,
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
    });
    return res.status;
  }

  /** Signs in; returns true when next-auth issued a session cookie. */
  async signIn(email: string, password: string): Promise<boolean> {
    const csrf = await this.json<{ csrfToken: string }>('/api/auth/csrf');
    const form = new URLSearchParams({
      csrfToken: csrf.body.csrfToken,
      email,
      password,
      json: 'true',
      callbackUrl: this.baseUrl + '/memos',
    });
    await this.request('/api/auth/callback/credentials', {
      method: 'POST',
      body: form,
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
    });
    return [...this.cookies.keys()].some((k) => k.endsWith('next-auth.session-token'));
  }
}
