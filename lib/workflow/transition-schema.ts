import { z } from 'zod';

export const TRANSITION_ACTIONS = ['submit', 'approve', 'request-changes', 'freeze', 'reopen'] as const;
export type TransitionAction = (typeof TRANSITION_ACTIONS)[number];

const note = z.string({ error: 'note must be text' }).trim().max(4000, 'note must have at most 4000 characters');

/** POST /api/memos/[id]/transitions */
export const transitionInputSchema = z.discriminatedUnion(
  'action',
  [
    z.strictObject({ action: z.literal('submit'), reviewerIds: z.array(z.number().int().positive(), { error: 'reviewerIds must list the reviewers’ ids' }).min(1, 'pick at least one reviewer').max(10), note: note.optional() }),
    z.strictObject({ action: z.literal('approve'), note: note.optional() }),
    z.strictObject({ action: z.literal('request-changes'), note: z.string({ error: 'say what should change' }).trim().min(1, 'say what should change').max(4000, 'note must have at most 4000 characters') }),
    z.strictObject({ action: z.literal('freeze'), changeSummary: z.string({ error: 'a change summary is required to freeze' }).trim().min(1, 'a change summary is required to freeze').max(2000) }),
    z.strictObject({ action: z.literal('reopen'), note: note.optional() }),
  ],
  { error: `action must be one of ${TRANSITION_ACTIONS.join(', ')}` },
);
export type TransitionInput = z.infer<typeof transitionInputSchema>;
