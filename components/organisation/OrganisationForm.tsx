'use client';

import { useState, type FormEvent } from 'react';
import { putJson } from '@/lib/client/fetch-json';
import type { OrganisationRecord } from '@/lib/organisation/organisation-schema';

/** Name and distribution statement of the issuing organisation; saved with one button, refusals shown by field. */
export function OrganisationForm({ initial }: { initial: OrganisationRecord }) {
  const [name, setName] = useState(initial.name);
  const [statement, setStatement] = useState(initial.distributionStatement);
  const [state, setState] = useState<{
    saving: boolean;
    problem: string | null;
    fields: Record<string, string>;
    savedAt: string | null;
  }>({ saving: false, problem: null, fields: {}, savedAt: initial.updatedAt });

  const save = async (e: FormEvent) => {
    e.preventDefault();
    setState((s) => ({ ...s, saving: true, problem: null, fields: {} }));
    const r = await putJson<OrganisationRecord>('/api/organisation', { name, distributionStatement: statement });
    if (r.ok) {
      setName(r.data.name);
      setStatement(r.data.distributionStatement);
      setState({ saving: false, problem: null, fields: {}, savedAt: r.data.updatedAt });
    } else setState((s) => ({ ...s, saving: false, problem: r.error, fields: r.fields ?? {} }));
  };

  return (
    <form className="sheet space-y-3 p-4" onSubmit={(e) => void save(e)} aria-label="Issuing organisation">
      <div>
        <label htmlFor="org-name" className="label">
          Name
        </label>
        <input
          id="org-name"
          className="field w-full"
          value={name}
          maxLength={200}
          onChange={(e) => setName(e.target.value)}
          aria-invalid={Boolean(state.fields.name)}
        />
        {state.fields.name && <p className="text-note text-ember-700">{state.fields.name}</p>}
      </div>
      <div>
        <label htmlFor="org-distribution" className="label">
          Distribution statement
        </label>
        <textarea
          id="org-distribution"
          className="field w-full"
          rows={3}
          value={statement}
          maxLength={1000}
          onChange={(e) => setStatement(e.target.value)}
          aria-invalid={Boolean(state.fields.distributionStatement)}
        />
        {state.fields.distributionStatement && (
          <p className="text-note text-ember-700">{state.fields.distributionStatement}</p>
        )}
      </div>
      <div className="flex items-center gap-3">
        <button type="submit" className="btn-primary" disabled={state.saving}>
          {state.saving ? 'Saving…' : 'Save'}
        </button>
        <span className="text-note text-ink-soft" role="status">
          {state.savedAt
            ? `Last changed ${new Date(state.savedAt).toISOString().slice(0, 16).replace('T', ' ')} UTC`
            : 'Not set yet'}
        </span>
      </div>
      {state.problem && (
        <p className="text-note text-ember-700" role="alert">
          {state.problem}
        </p>
      )}
    </form>
  );
}
