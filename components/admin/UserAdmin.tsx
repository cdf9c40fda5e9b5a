'use client';

import { useState, type FormEvent } from 'react';
import { useRouter } from 'next/navigation';
import { ROLES, ROLE_LABELS, type Role } from '@/lib/auth/roles';
import type { UserRecord } from '@/lib/users/user-record';
import { patchJson, postJson, requestJson } from '@/lib/client/fetch-json';
import { formatDateTime } from '@/lib/format/format-date';

export function UserAdmin({ users, selfId }: { users: UserRecord[]; selfId: number }) {
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [notice, setNotice] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function addUser(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formEl = event.currentTarget;
    const f = new FormData(formEl);
    setBusy(true);
    const res = await postJson<UserRecord>('/api/users', {
      email: String(f.get('email') ?? ''),
      name: String(f.get('name') ?? ''),
      role: String(f.get('role') ?? ''),
      password: String(f.get('password') ?? ''),
    });
    setBusy(false);
    if (res.ok) {
      setErrors({});
      setNotice({ kind: 'ok', text: `Added ${res.data.name} as ${ROLE_LABELS[res.data.role]}.` });
      formEl.reset();
      router.refresh();
    } else {
      setErrors(res.fields);
      setNotice({ kind: 'error', text: res.error });
    }
  }

  async function change(user: UserRecord, patch: { role?: Role; active?: boolean }) {
    const res = await patchJson<UserRecord>(`/api/users/${user.id}`, patch);
    setNotice(res.ok ? { kind: 'ok', text: `Updated ${res.data.name}.` } : { kind: 'error', text: res.error });
    router.refresh();
  }

  async function signOutEverywhere(user: UserRecord) {
    if (!window.confirm(`Sign ${user.name} out of every browser? They will have to sign in again.`)) return;
    const res = await requestJson<{ sessionsEnded: number }>(`/api/users/${user.id}/sessions`, { method: 'DELETE' });
    const n = res.ok ? res.data.sessionsEnded : 0;
    setNotice(
      res.ok
        ? {
            kind: 'ok',
            text: `${user.name}: ${n} session${n === 1 ? '' : 's'} ended${user.id === selfId ? ' (this browser stays signed in)' : ''}.`,
          }
        : { kind: 'error', text: res.error },
    );
  }

  return (
    <div className="space-y-6">
      {notice && (
        <p
          role={notice.kind === 'error' ? 'alert' : 'status'}
          className={`rounded-chip border px-3 py-2 text-note ${notice.kind === 'error' ? 'border-ember-500 bg-ember-50 text-ember-700' : 'border-moss-500 bg-moss-50 text-moss-700'}`}
        >
          {notice.text}
        </p>
      )}
      <div className="sheet overflow-x-auto">
        <table className="w-full border-collapse text-left">
          <thead className="border-b border-rule bg-paper-sunk text-micro uppercase text-ink-soft">
            <tr>
              <th scope="col" className="px-3 py-2">
                Name
              </th>
              <th scope="col" className="px-3 py-2">
                E-mail
              </th>
              <th scope="col" className="px-3 py-2">
                Role
              </th>
              <th scope="col" className="px-3 py-2">
                Account
              </th>
              <th scope="col" className="px-3 py-2">
                Added
              </th>
              <th scope="col" className="px-3 py-2">
                Sessions
              </th>
            </tr>
          </thead>
          <tbody>
            {users.map((u) => (
              <tr key={u.id} className={`border-b border-rule last:border-0 ${u.active ? '' : 'text-ink-faint'}`}>
                <td className="px-3 py-2 font-medium">{u.name}</td>
                <td className="px-3 py-2 font-mono text-note">{u.email}</td>
                <td className="px-3 py-2">
                  <label className="sr-only" htmlFor={`role-${u.id}`}>
                    Role of {u.name}
                  </label>
                  <select
                    id={`role-${u.id}`}
                    className="field w-52 py-1"
                    value={u.role}
                    disabled={u.id === selfId}
                    onChange={(e) => change(u, { role: e.target.value as Role })}
                  >
                    {ROLES.map((r) => (
                      <option key={r} value={r}>
                        {ROLE_LABELS[r]}
                      </option>
                    ))}
                  </select>
                </td>
                <td className="px-3 py-2">
                  {u.id === selfId ? (
                    <span className="text-note text-ink-soft">You</span>
                  ) : (
                    <button
                      type="button"
                      className={u.active ? 'btn-danger' : 'btn-quiet'}
                      onClick={() => change(u, { active: !u.active })}
                    >
                      {u.active ? 'Deactivate' : 'Reactivate'}
                    </button>
                  )}
                </td>
                <td className="px-3 py-2 text-note">{formatDateTime(u.createdAt)}</td>
                <td className="px-3 py-2">
                  <button
                    type="button"
                    className="btn-quiet"
                    onClick={() => void signOutEverywhere(u)}
                    aria-label={`Sign ${u.name} out everywhere`}
                  >
                    Sign out everywhere
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>

      <form onSubmit={addUser} className="sheet grid gap-3 p-4 md:grid-cols-5" aria-label="Add a person" noValidate>
        <h2 className="md:col-span-5 text-body font-semibold">Add a person</h2>
        {(
          [
            ['name', 'Name', 'text'],
            ['email', 'E-mail', 'email'],
            ['password', 'Initial password', 'password'],
          ] as const
        ).map(([name, label, type]) => (
          <div key={name}>
            <label htmlFor={`add-${name}`} className="label">
              {label}
            </label>
            <input
              id={`add-${name}`}
              name={name}
              type={type}
              className="field"
              aria-invalid={Boolean(errors[name])}
              autoComplete="off"
            />
            {errors[name] && <p className="mt-1 text-note text-ember-700">{errors[name]}</p>}
          </div>
        ))}
        <div>
          <label htmlFor="add-role" className="label">
            Role
          </label>
          <select id="add-role" name="role" className="field" defaultValue="analyst">
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
        </div>
        <div className="flex items-end">
          <button type="submit" className="btn-primary" disabled={busy}>
            {busy ? 'Adding…' : 'Add person'}
          </button>
        </div>
      </form>
    </div>
  );
}
