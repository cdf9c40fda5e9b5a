import { z } from 'zod';
import { MEANING_MAX_CHARS } from '@/lib/signatures/signature-meaning';

export const TRANSITION_ACTIONS = ['submit', 'approve', 'request-changes', 'freeze', 'reopen'] as const;
export type TransitionAction = (typeof TRANSITION_ACTIONS)[number];

const note = z.string({ error: 'note must be text' }).trim().max(4000, 'note must have at most 4000 characters');

/**
 * What a signed action (approve, request changes, freeze) carries besides its own fields:
 * the signer's password, checked again (a missing or wrong one is a 401, not a 400, see
 * lib/signatures/verify-signing-password.ts), and optionally the meaning of the signature
 * (lib/signatures/signature-meaning.ts gives the default of each action).
 */
const signing = {
  password: z
    .string({ error: 'password must be text' })
    .max(1024, 'password must have at most 1024 characters')
    .optional(),
  meaning: z
    .string({ error: 'meaning must be text' })
    .trim()
    .min(1, 'say what the signature means, or leave it out for the default')
    .max(MEANING_MAX_CHARS, `meaning must have at most ${MEANING_MAX_CHARS} characters`)
    .optional(),
};

/** POST /api/memos/[id]/transitions */
export const transitionInputSchema = z.discriminatedUnion(
  'action',
  [
    z.strictObject({
      action: z.literal('submit'),
      reviewerIds: z
        .array(z.number().int().positive(), { error: 'reviewerIds must list the reviewers’ ids' })
        .min(1, 'pick at least one reviewer')
        .max(10),
      note: note.optional(),
    }),
    z.strictObject({ action: z.literal('approve'), note: note.optional(), ...signing }),
    z.strictObject({
      action: z.literal('request-changes'),
      note: z
        .string({ error: 'say what should change' })
        .trim()
        .min(1, 'say what should change')
        .max(4000, 'note must have at most 4000 characters'),
      ...signing,
    }),
    z.strictObject({
      action: z.literal('freeze'),
      changeSummary: z
        .string({ error: 'a change summary is required to freeze' })
        .trim()
        .min(1, 'a change summary is required to freeze')
        .max(2000),
      ...signing,
    }),
    z.strictObject({ action: z.literal('reopen'), note: note.optional() }),
  ],
  { error: `action must be one of ${TRANSITION_ACTIONS.join(', ')}` },
);
export type TransitionInput = z.infer<typeof transitionInputSchema>;
