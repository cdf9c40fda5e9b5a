import { beforeAll, describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { authoriseAttachmentUpload } from '@/lib/attachments/authorise-attachment-upload';
import { readAttachment } from '@/lib/attachments/read-attachment';
import { MAX_IMAGE_BYTES, storeAttachment } from '@/lib/attachments/store-attachment';
import { transitionMemo } from '@/lib/workflow/transition-memo';
import { freshDatabase, makeMemo, makeUser } from '../../support/factories';

/*
 * Images stored with a memo: refused by type, size and signature (the PNG
 * signature, W3C PNG specification §5.2; a JPEG starts with the SOI marker
 * FF D8 of ITU-T T.81 Annex B — from memory), and by who may edit or view the memo.
 */

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
const png = (size = 64) => Buffer.concat([PNG_SIGNATURE, Buffer.alloc(size - PNG_SIGNATURE.length, 7)]);

let owner: Actor, otherAnalyst: Actor, reviewer: Actor, otherReviewer: Actor, customer: Actor;

beforeAll(async () => {
  await freshDatabase();
  [owner, otherAnalyst] = [await makeUser('analyst'), await makeUser('analyst')];
  [reviewer, otherReviewer] = [await makeUser('reviewer'), await makeUser('reviewer')];
  customer = await makeUser('customer');
});

async function refusal(p: Promise<unknown>): Promise<ApiError> {
  const err = await p.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(err, 'expected a refusal').toBeInstanceOf(ApiError);
  return err as ApiError;
}

describe('storeAttachment: what is refused', () => {
  it('stores a PNG for the memo’s author with its size and SHA-256', async () => {
    const memo = await makeMemo(owner);
    const stored = await storeAttachment(owner, memo.id, { name: 'ground-track.png', type: 'image/png', bytes: png() });
    expect(stored).toMatchObject({ contentType: 'image/png', byteSize: 64, url: `/api/attachments/${stored.id}` });
    const row = await readAttachment(owner, stored.id);
    expect(Buffer.from(row.data).equals(png())).toBe(true);
  });

  it('refuses SVG and undeclared types with 400 naming the file field', async () => {
    const memo = await makeMemo(owner);
    for (const type of ['image/svg+xml', 'application/pdf', '']) {
      const err = await refusal(storeAttachment(owner, memo.id, { name: 'x', type, bytes: png() }));
      expect(err.status, type).toBe(400);
      expect(err.fields?.file).toBe('unsupported type');
    }
  });

  it('refuses a file whose bytes do not start with its type’s signature, and an empty file', async () => {
    const memo = await makeMemo(owner);
    expect(
      (await refusal(storeAttachment(owner, memo.id, { name: 'fake.jpg', type: 'image/jpeg', bytes: png() }))).fields
        ?.file,
    ).toBe('content does not match its type');
    expect(
      (await refusal(storeAttachment(owner, memo.id, { name: 'empty.png', type: 'image/png', bytes: Buffer.alloc(0) })))
        .fields?.file,
    ).toBe('empty');
  });

  it('refuses one byte over the size limit with 413 and stores exactly at the limit', async () => {
    const memo = await makeMemo(owner);
    const over = await refusal(
      storeAttachment(owner, memo.id, { name: 'big.png', type: 'image/png', bytes: png(MAX_IMAGE_BYTES + 1) }),
    );
    expect(over.status).toBe(413);
    expect(over.fields?.file).toBe('too large');
    expect(
      (await storeAttachment(owner, memo.id, { name: 'limit.png', type: 'image/png', bytes: png(MAX_IMAGE_BYTES) }))
        .byteSize,
    ).toBe(MAX_IMAGE_BYTES);
  });
});

describe('attachments: ownership', () => {
  it('lets only the memo’s authors upload (403 for another analyst and a reviewer, 409 once submitted)', async () => {
    const memo = await makeMemo(owner, { reviewers: [reviewer] });
    expect((await refusal(authoriseAttachmentUpload(otherAnalyst, memo.id))).status).toBe(403);
    expect(
      (await refusal(storeAttachment(reviewer, memo.id, { name: 'x.png', type: 'image/png', bytes: png() }))).status,
    ).toBe(403);
    await transitionMemo(
      owner,
      memo.id,
      { action: 'submit', reviewerIds: [reviewer.id] },
      { clientAddress: '127.0.0.1' },
    );
    expect((await refusal(authoriseAttachmentUpload(owner, memo.id))).status).toBe(409);
  });

  it('lets whoever may view the memo read an image, and answers a hidden memo’s image like an unknown id (404)', async () => {
    const memo = await makeMemo(owner, { reviewers: [reviewer] });
    const { id } = await storeAttachment(owner, memo.id, { name: 'eclipse.png', type: 'image/png', bytes: png() });
    expect((await readAttachment(otherAnalyst, id)).memoId).toBe(memo.id);
    expect((await readAttachment(reviewer, id)).memoId).toBe(memo.id);
    const hidden = await refusal(readAttachment(otherReviewer, id));
    const unknown = await refusal(readAttachment(otherReviewer, id + 10_000));
    expect([hidden.status, hidden.message]).toEqual([unknown.status, unknown.message]);
    expect(hidden.status).toBe(404);
    expect((await refusal(readAttachment(customer, id))).status).toBe(404);
  });
});
