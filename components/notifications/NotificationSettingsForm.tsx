'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { putJson, swrFetcher } from '@/lib/client/fetch-json';
import { swrKeys } from '@/lib/client/swr-keys';
import {
  WORKFLOW_KIND_TITLES,
  WORKFLOW_NOTIFICATION_KINDS,
  type WorkflowNotificationKind,
} from '@/lib/notifications/notification-kinds';
import type { NotificationSettingsRecord } from '@/lib/notifications/notification-settings-schema';

/** Who gets each kind, shown beside its switch so people know why a mail reaches them. */
const AUDIENCE_WORDS: Record<WorkflowNotificationKind, string> = {
  submitted: 'Reviewers picked at submission, with the submit note.',
  'changes-requested': 'The memo’s owner and co-authors, with the reviewer’s note.',
  approved: 'The memo’s owner and co-authors, and configuration managers.',
  frozen: 'The memo’s owner, co-authors and reviewers, with the change summary.',
  released: 'The memo’s owner, with the cover note.',
};

/** One switch per kind of workflow notification: also by e-mail, or only under Review notes. Saved as each switch changes. */
export function NotificationSettingsForm() {
  const { data, error, mutate } = useSWR<NotificationSettingsRecord>(swrKeys.notificationSettings(), swrFetcher);
  const [problem, setProblem] = useState<string | null>(null);
  const [saving, setSaving] = useState<WorkflowNotificationKind | null>(null);

  // The switch moves at once; a refused save puts it back and says why.
  const toggle = async (kind: WorkflowNotificationKind, on: boolean) => {
    if (!data) return;
    setSaving(kind);
    setProblem(null);
    void mutate({ email: { ...data.email, [kind]: on } }, { revalidate: false });
    const r = await putJson<NotificationSettingsRecord>(swrKeys.notificationSettings(), { email: { [kind]: on } });
    setSaving(null);
    if (r.ok) void mutate(r.data, { revalidate: false });
    else {
      setProblem(r.error);
      void mutate();
    }
  };

  if (error) return <p className="text-ember-700">{(error as Error).message}</p>;
  if (!data) return <p className="text-ink-faint">Loading…</p>;
  return (
    <fieldset className="sheet divide-y divide-rule p-0">
      <legend className="sr-only">E-mail per kind of notification</legend>
      {WORKFLOW_NOTIFICATION_KINDS.map((kind) => (
        <label key={kind} className="flex items-start gap-3 px-4 py-3">
          <input
            type="checkbox"
            className="mt-1 accent-orbit-600"
            checked={data.email[kind]}
            disabled={saving === kind}
            onChange={(e) => void toggle(kind, e.target.checked)}
            data-kind={kind}
          />
          <span>
            <span className="block font-medium">{WORKFLOW_KIND_TITLES[kind]}</span>
            <span className="block text-note text-ink-soft">{AUDIENCE_WORDS[kind]}</span>
          </span>
        </label>
      ))}
      {problem && (
        <p className="px-4 py-2 text-note text-ember-700" role="alert">
          {problem}
        </p>
      )}
    </fieldset>
  );
}
