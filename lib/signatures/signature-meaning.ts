import type { SignedAction } from '@/models/signature';

export type { SignedAction };

/** The transitions that are signed: the signer enters their password again and states what the signature means. */
export const SIGNED_ACTIONS: readonly SignedAction[] = ['approve', 'request-changes', 'freeze'];

export const isSignedAction = (action: string): action is SignedAction =>
  (SIGNED_ACTIONS as readonly string[]).includes(action);

/**
 * The meaning a signature carries when the signer does not state another
 * one. A signed record states the meaning of each signature (review,
 * approval, responsibility, authorship) beside the printed name and the date
 * and time: 21 CFR 11.50(a)(1)–(3).
 */
export const DEFAULT_MEANING: Record<SignedAction, string> = {
  approve: 'Reviewed and approved',
  'request-changes': 'Reviewed; changes requested',
  freeze: 'Released as baseline',
};

/** Other meanings offered beside the default (the signer may also type their own). */
export const OFFERED_MEANINGS: Record<SignedAction, readonly string[]> = {
  approve: ['Reviewed and approved', 'Reviewed and approved with comments', 'Approved as technically responsible'],
  'request-changes': ['Reviewed; changes requested', 'Reviewed; not approved'],
  freeze: ['Released as baseline', 'Released under configuration control'],
};

export const MEANING_MAX_CHARS = 120;
