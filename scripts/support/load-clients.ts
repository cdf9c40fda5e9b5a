import { HttpSession } from './http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '../../lib/demo/demo-organisation';

/**
 * Signed-in analysts for concurrency tests and the load benchmark: the demo
 * administrator adds `count` analyst accounts (invented names of the demo
 * organisation), each signs in through next-auth and creates a memo of its
 * own, so concurrent saves touch different memos owned by different people.
 */
export interface LoadAnalyst {
  session: HttpSession;
  email: string;
  memoId: number;
  version: number;
}

export async function signedInAnalystsWithMemos(
  baseUrl: string,
  count: number,
  opts: { label: string; templateId?: string },
): Promise<LoadAnalyst[]> {
  const admin = new HttpSession(baseUrl);
  const adminAccount = DEMO_USERS.find((u) => u.role === 'admin')!;
  if (!(await admin.signIn(adminAccount.email, DEMO_PASSWORD)))
    throw new Error('the demo administrator could not sign in');
  const run = `${Date.now().toString(36)}`;
  const password = 'load-analyst-passphrase-26';
  const analysts: LoadAnalyst[] = [];
  for (let i = 1; i <= count; i++) {
    const email = `${opts.label}-${run}-${i}@brightwater.example`;
    const made = await admin.json('/api/users', {
      method: 'POST',
      body: JSON.stringify({ email, name: `${opts.label} analyst ${i}`, role: 'analyst', password }),
    });
    if (made.status !== 201) throw new Error(`could not add ${email}: ${made.status} ${JSON.stringify(made.body)}`);
    const session = new HttpSession(baseUrl);
    if (!(await session.signIn(email, password))) throw new Error(`${email} could not sign in`);
    const memo = await session.json<{ id: number; version: number }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({
        title: `${opts.label} memo ${i}`,
        ...(opts.templateId ? { templateId: opts.templateId } : {}),
      }),
    });
    if (memo.status !== 201)
      throw new Error(`${email} could not create a memo: ${memo.status} ${JSON.stringify(memo.body)}`);
    analysts.push({ session, email, memoId: memo.body.id, version: memo.body.version ?? 1 });
  }
  return analysts;
}

/** A one-paragraph document whose text names who saved it and when. */
export function paragraphDoc(text: string) {
  return { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] };
}
