import { z } from 'zod';
import { withActor, parseWith, searchParamsObject } from '@/lib/api/route-handler';
import { listOutboxMessages } from '@/lib/mail/list-outbox-messages';

export const dynamic = 'force-dynamic';

const querySchema = z.strictObject({
  to: z.string().trim().max(320).optional(),
  limit: z.coerce.number({ error: 'limit must be a number' }).int().min(1).max(500).optional(),
});

/** Messages the local SMTP server received, newest first (administrators); ?to= filters by recipient. */
export const GET = withActor(async ({ req, actor }) => ({
  messages: await listOutboxMessages(actor, parseWith(querySchema, searchParamsObject(req))),
}));
