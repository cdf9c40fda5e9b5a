import type { Actor } from '@/lib/auth/permissions';
import { decideGlobal, memoVisibility } from '@/lib/auth/permissions';
import { listCalcKinds } from '@/lib/calc';
import type { CalcResult } from '@/lib/calc';
import { loadDeliveryPanel, type DeliveryPanelData } from '@/lib/delivery/load-delivery-panel';
import { listPortalRevisions } from '@/lib/delivery/list-portal-revisions';
import { initialResults } from '@/lib/documents/initial-results';
import { listRevisions } from '@/lib/revisions/list-revisions';
import type { RevisionSummary } from '@/lib/revisions/revision-record';
import { roundDecisions } from '@/lib/workflow/transition-memo';
import { Memo } from '@/models';
import { getMemo } from './get-memo';
import { getMemoVersion } from './list-memo-versions';
import type { MemoDetail, MemoVersionDetail } from './memo-record';
import type { TiptapDoc } from './memo-schema';

export interface MemoPageData {
  memo: MemoDetail;
  /** An older version asked for with ?version=N, shown read-only; null for the current one. */
  shownVersion: MemoVersionDetail | null;
  /** The content the editor opens: the shown version's or the current one. */
  content: TiptapDoc;
  editable: boolean;
  canCompute: boolean;
  revisions: RevisionSummary[];
  /** This review round's verdicts; empty for a draft never submitted. */
  decisions: Awaited<ReturnType<typeof roundDecisions>>;
  delivery: DeliveryPanelData | null;
  kinds: ReturnType<typeof listCalcKinds>;
  initialResults: Record<string, CalcResult>;
}

/** What the memo page shows: a customer is sent to their portal (or told the memo is not theirs), staff get the editor's data. */
export type MemoPageLoad =
  { kind: 'portal'; path: string } | { kind: 'not-shared' } | ({ kind: 'memo' } & MemoPageData);

/**
 * Everything the memo page (app/(workspace)/memos/[id]) renders, read for
 * one actor. Throws ApiError (404, 403, 400 for a bad version) for the page
 * to show as a problem.
 */
export async function loadMemoPage(actor: Actor, memoId: number, version?: number): Promise<MemoPageLoad> {
  // Customers never see the editor: the newest revision released to them opens in their portal.
  if (memoVisibility(actor).scope === 'released') {
    const newest = (await listPortalRevisions(actor)).find((e) => e.memoId === memoId);
    return newest ? { kind: 'portal', path: `/portal/${memoId}/${newest.letter}` } : { kind: 'not-shared' };
  }
  const memo = await getMemo(actor, memoId);
  const revisions = await listRevisions(actor, memoId);
  const delivery = await loadDeliveryPanel(actor, memoId, revisions);
  const round = (await Memo.findByPk(memoId, { attributes: ['reviewRound'] }))?.reviewRound ?? 0;
  const decisions = memo.status !== 'draft' || round > 0 ? await roundDecisions(memoId, round) : [];
  const shownVersion = version === undefined ? null : await getMemoVersion(actor, memoId, version);
  const content = shownVersion ? shownVersion.content : memo.content;
  return {
    kind: 'memo',
    memo,
    shownVersion,
    content,
    editable: !shownVersion && memo.allowedActions.includes('memo.edit'),
    canCompute: decideGlobal(actor, 'calc.run').allowed,
    revisions,
    decisions,
    delivery,
    kinds: listCalcKinds(),
    initialResults: await initialResults(actor.id, content),
  };
}
