import type { Role } from './roles';
import type { MemoStatus } from '@/lib/memos/memo-status';
import { ApiError } from '@/lib/api/errors';

/**
 * The one place that decides who may do what. Every page and route handler
 * asks here, on the server. Role refusals are 403; refusals because of the
 * memo's state (e.g. editing a frozen memo) are 409 with the reason; a memo
 * the caller may not see at all is a 404 worded exactly like an unknown id.
 */

export interface Actor {
  id: number;
  role: Role;
  name: string;
  email: string;
}

/** What the permission rules need to know about a memo. */
export interface MemoFacts {
  /** The analyst who created the memo; only they add or remove co-authors. */
  ownerId: number;
  /**
   * Analysts the owner added as co-authors: with the owner, the memo's
   * authors, who alone edit, submit, settle threads and reopen it as analysts.
   */
  coAuthorIds: readonly number[];
  status: MemoStatus;
  reviewerIds: readonly number[];
  /**
   * Customers who may read the memo as it stands: those its latest revision
   * was released to (a frozen memo's content is its latest revision).
   * Filled from the delivery records by loadMemoFacts.
   */
  releasedToUserIds: readonly number[];
}

/** What the rules need to know about one frozen revision. */
export interface RevisionFacts {
  memo: MemoFacts;
  /** Customers this revision was released to. */
  releasedToUserIds: readonly number[];
}

export const MEMO_ACTIONS = [
  'memo.view',
  'memo.edit',
  'memo.versions',
  'memo.comment',
  'memo.resolve',
  'memo.submit',
  'memo.decide',
  'memo.freeze',
  'memo.reopen',
  'memo.release',
  'memo.distribute',
  'memo.tracking',
  'memo.threads',
  'memo.co-authors',
  'memo.name-version',
] as const;
export type MemoAction = (typeof MEMO_ACTIONS)[number];

export const GLOBAL_ACTIONS = [
  'memo.list',
  'memo.create',
  'calc.run',
  'user.directory',
  'user.manage',
  'audit.view',
  'outbox.view',
  'portal.view',
  'review.notes',
  'organisation.manage',
] as const;
export type GlobalAction = (typeof GLOBAL_ACTIONS)[number];

/** 403: the role or person may not; 404: hidden (answered exactly as an unknown id); 409: the memo's state. */
export type Decision = { allowed: true } | { allowed: false; status: 403 | 404 | 409; reason: string };

/**
 * The one answer for a memo (or revision) that does not exist and for one
 * the caller may not see, so that ids cannot be probed: same status, same body.
 */
export const NOT_SHARED_OR_MISSING = 'Not found, or not shared with you.';
export const notSharedOrMissing = (): ApiError => new ApiError('not_found', NOT_SHARED_OR_MISSING);

const ALLOW: Decision = { allowed: true };
const deny = (reason: string): Decision => ({ allowed: false, status: 403, reason });
const hidden: Decision = { allowed: false, status: 404, reason: NOT_SHARED_OR_MISSING };
const wrongState = (reason: string): Decision => ({ allowed: false, status: 409, reason });

const STAFF: readonly Role[] = ['analyst', 'reviewer', 'config-manager', 'admin'];

const GLOBAL_RULES: Record<GlobalAction, readonly Role[]> = {
  'memo.list': ['analyst', 'reviewer', 'config-manager', 'customer', 'admin'],
  'memo.create': ['analyst'],
  'calc.run': STAFF,
  'user.directory': STAFF,
  'user.manage': ['admin'],
  'audit.view': ['admin'],
  'outbox.view': ['admin'],
  'portal.view': ['customer'],
  'review.notes': ['analyst', 'reviewer', 'config-manager'],
  'organisation.manage': ['admin'],
};

export function decideGlobal(actor: Actor, action: GlobalAction): Decision {
  return GLOBAL_RULES[action].includes(actor.role)
    ? ALLOW
    : deny(`The ${actor.role} role may not ${describe(action)}.`);
}

/** Which memos an actor may see at all; list queries are built from this. */
export type MemoVisibility =
  { scope: 'all' } | { scope: 'assigned'; reviewerId: number } | { scope: 'released'; customerId: number };

export function memoVisibility(actor: Actor): MemoVisibility {
  switch (actor.role) {
    case 'analyst':
    case 'config-manager':
    case 'admin':
      return { scope: 'all' };
    case 'reviewer':
      return { scope: 'assigned', reviewerId: actor.id };
    case 'customer':
      return { scope: 'released', customerId: actor.id };
  }
}

function canSee(actor: Actor, memo: MemoFacts): boolean {
  const v = memoVisibility(actor);
  if (v.scope === 'all') return true;
  if (v.scope === 'assigned') return memo.reviewerIds.includes(v.reviewerId);
  return memo.status === 'frozen' && memo.releasedToUserIds.includes(v.customerId);
}

/** The memo's authors: its owner and the co-authors the owner added. */
function isAuthor(actor: Actor, memo: MemoFacts): boolean {
  return actor.id === memo.ownerId || memo.coAuthorIds.includes(actor.id);
}

const NOT_AN_AUTHOR = 'Only the memo’s owner and its co-authors may do this; other analysts read and comment.';

export function decideMemo(actor: Actor, action: MemoAction, memo: MemoFacts): Decision {
  if (!canSee(actor, memo)) return hidden;
  const role = actor.role;
  switch (action) {
    case 'memo.view':
      return ALLOW;
    case 'memo.versions':
      return role === 'customer' ? deny('Customers see released revisions only.') : ALLOW;
    case 'memo.edit':
      if (role !== 'analyst') return deny('Only analysts edit memo text.');
      if (!isAuthor(actor, memo)) return deny(NOT_AN_AUTHOR);
      return memo.status === 'draft'
        ? ALLOW
        : wrongState(`The memo is ${statusWords(memo.status)}; only a draft can be edited.`);
    case 'memo.comment':
      // Any analyst may comment on any memo (peer review beyond the assigned reviewers); reviewers only see memos assigned to them.
      if (role !== 'analyst' && role !== 'reviewer') return deny('Only analysts and assigned reviewers comment.');
      return memo.status === 'frozen'
        ? wrongState('The memo is frozen; reopen it as a new draft to discuss changes.')
        : ALLOW;
    case 'memo.resolve':
      // Resolving or reopening a comment thread: the memo's authors settle a point; reviewers and other analysts reply.
      if (role !== 'analyst')
        return deny(
          role === 'reviewer'
            ? 'Only the memo’s authors resolve or reopen threads; reviewers may reply.'
            : 'Only the memo’s authors resolve or reopen threads.',
        );
      if (!isAuthor(actor, memo))
        return deny('Only the memo’s owner and its co-authors resolve or reopen threads; other analysts may reply.');
      return memo.status === 'frozen' ? wrongState('The memo is frozen; its threads can no longer change.') : ALLOW;
    case 'memo.submit':
      if (role !== 'analyst') return deny('Only analysts submit memos for review.');
      if (!isAuthor(actor, memo)) return deny(NOT_AN_AUTHOR);
      return memo.status === 'draft'
        ? ALLOW
        : wrongState(`The memo is ${statusWords(memo.status)}; only a draft can be submitted.`);
    case 'memo.decide':
      if (role !== 'reviewer') return deny('Only assigned reviewers approve or request changes.');
      return memo.status === 'in-review'
        ? ALLOW
        : wrongState(`The memo is ${statusWords(memo.status)}; decisions are made while it is in review.`);
    case 'memo.freeze':
      if (role !== 'config-manager') return deny('Only configuration managers freeze revisions.');
      return memo.status === 'approved'
        ? ALLOW
        : wrongState(`The memo is ${statusWords(memo.status)}; only an approved memo can be frozen.`);
    case 'memo.reopen':
      if (role !== 'config-manager' && role !== 'analyst')
        return deny('Only the memo’s authors and configuration managers reopen a frozen memo.');
      if (role === 'analyst' && !isAuthor(actor, memo)) return deny(NOT_AN_AUTHOR);
      return memo.status === 'frozen'
        ? ALLOW
        : wrongState(`The memo is ${statusWords(memo.status)}; only a frozen memo can be reopened.`);
    case 'memo.release':
      if (role !== 'config-manager') return deny('Only configuration managers release revisions to customers.');
      return memo.status === 'frozen' ? ALLOW : wrongState('Only a frozen revision can be released.');
    case 'memo.distribute':
      // The distribution list and resending what was already released: any state.
      return role === 'config-manager'
        ? ALLOW
        : deny('Only configuration managers manage distribution lists and deliveries.');
    case 'memo.tracking':
    case 'memo.threads':
      return role === 'customer' ? deny('Customers see released revisions only.') : ALLOW;
    case 'memo.co-authors':
      // Who writes the memo is the owner's call, in any state (a frozen memo's next draft may need other hands).
      return role === 'analyst' && actor.id === memo.ownerId
        ? ALLOW
        : deny('Only the memo’s owner adds or removes co-authors.');
    case 'memo.name-version':
      // Naming a saved version changes no text, so any state will do; it is the authors' account of their own work.
      if (role !== 'analyst') return deny('Only the memo’s authors name its versions.');
      return isAuthor(actor, memo) ? ALLOW : deny(NOT_AN_AUTHOR);
  }
}

export const REVISION_ACTIONS = ['revision.view', 'revision.acknowledge'] as const;
export type RevisionAction = (typeof REVISION_ACTIONS)[number];

/**
 * A frozen revision is immutable, so a customer keeps access to a revision
 * released to them whatever the memo's current state; staff follow the memo.
 */
export function decideRevision(actor: Actor, action: RevisionAction, revision: RevisionFacts): Decision {
  if (actor.role === 'customer') {
    // Not released to them: answered as if it did not exist, like a hidden memo.
    return revision.releasedToUserIds.includes(actor.id) ? ALLOW : hidden;
  }
  if (action === 'revision.acknowledge')
    return deny('Only the customers a revision was released to acknowledge receipt.');
  return decideMemo(actor, 'memo.view', revision.memo);
}

export function assertRevision(actor: Actor, action: RevisionAction, revision: RevisionFacts): void {
  const d = decideRevision(actor, action, revision);
  if (!d.allowed) throw refusal(d);
}

export function assertGlobal(actor: Actor, action: GlobalAction): void {
  const d = decideGlobal(actor, action);
  if (!d.allowed) throw new ApiError('forbidden', d.reason);
}

export function assertMemo(actor: Actor, action: MemoAction, memo: MemoFacts): void {
  const d = decideMemo(actor, action, memo);
  if (!d.allowed) throw refusal(d);
}

function refusal(d: Extract<Decision, { allowed: false }>): ApiError {
  if (d.status === 404) return notSharedOrMissing();
  return new ApiError(d.status === 409 ? 'conflict' : 'forbidden', d.reason);
}

function statusWords(status: MemoStatus): string {
  return { draft: 'a draft', 'in-review': 'in review', approved: 'approved', frozen: 'frozen' }[status];
}

function describe(action: GlobalAction): string {
  return {
    'memo.list': 'list memos',
    'memo.create': 'create memos',
    'calc.run': 'run calculations',
    'user.directory': 'read the staff directory',
    'user.manage': 'manage users',
    'audit.view': 'view the audit trail',
    'outbox.view': 'read the local outbox',
    'portal.view': 'open the customer portal',
    'review.notes': 'receive review notes',
    'organisation.manage': 'change the organisation settings',
  }[action];
}
