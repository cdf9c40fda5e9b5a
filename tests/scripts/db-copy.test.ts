import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Model, type ModelStatic } from 'sequelize';
import * as models from '@/models';
import {
  Attachment,
  Comment,
  Delivery,
  DistributionContact,
  Memo,
  NotificationSetting,
  Release,
  Revision,
  User,
} from '@/models';
import { closeDatabase } from '@/lib/db/connection';
import { copyDatabase, CopyRefused } from '@/lib/db/copy-database';
import { seedDemo } from '@/lib/demo/seed-demo';
import { freshDatabase, makeFrozenRevision, makeMemo } from '../support/factories';

/*
 * What is checked: `npm run db:copy` (lib/db/copy-database.ts) from a SQLite
 * installation holding the demo organisation plus a frozen revision with a
 * 300 kB PDF, an attachment, a thread, a release and a delivery — into this
 * test file's own database: a fresh PostgreSQL database under
 * `npm run test:postgres`, a second SQLite file under `npm test`. The outside
 * reference is the source itself: every row of every model is read back
 * through the same models from both and compared whole (no tolerance), and
 * each stored file's SHA-256 is recomputed with node:crypto.
 */

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'nodewright-copy-'));
const sourceUrl = `sqlite:${path.join(dir, 'source.sqlite')}`;
let targetUrl = '';
let pdfSha256 = '';

const everyModel = (Object.values(models) as unknown[]).filter(
  (m): m is ModelStatic<Model> => typeof m === 'function' && m.prototype instanceof Model,
);

/** Every row of every model, plain, in primary-key order, from the database DATABASE_URL names. */
async function snapshot(): Promise<Record<string, unknown[]>> {
  const all: Record<string, unknown[]> = {};
  for (const model of everyModel) {
    const rows = await model.findAll({ order: model.primaryKeyAttributes.map((k) => [k, 'ASC']) });
    // BIGINT comes back from PostgreSQL as a string (see models/rate-limit-counter.ts).
    all[model.name] = rows.map((r) => JSON.parse(JSON.stringify(r.get({ plain: true }))));
  }
  return all;
}

async function onDatabase<T>(url: string, work: () => Promise<T>): Promise<T> {
  await closeDatabase();
  process.env.DATABASE_URL = url;
  try {
    await models.db();
    return await work();
  } finally {
    await closeDatabase();
  }
}

let source: Record<string, unknown[]>;

beforeAll(async () => {
  targetUrl = process.env.DATABASE_URL!;
  source = await onDatabase(sourceUrl, async () => {
    await freshDatabase();
    await seedDemo();
    const cm = await User.findOne({ where: { role: 'config-manager' }, rejectOnEmpty: true });
    const analyst = await User.findOne({ where: { role: 'analyst' }, rejectOnEmpty: true });
    const customer = await User.findOne({ where: { role: 'customer' }, rejectOnEmpty: true });
    const demo = await Memo.findOne({ rejectOnEmpty: true });
    const pdf = Buffer.concat([Buffer.from('%PDF-1.7\n'), crypto.randomBytes(300_000), Buffer.from('\n%%EOF\n')]);
    pdfSha256 = crypto.createHash('sha256').update(pdf).digest('hex');
    const revision = await makeFrozenRevision(
      demo.id,
      { id: cm.id, role: 'config-manager', name: cm.name, email: cm.email },
      { pdf },
    );
    const other = await makeMemo(
      { id: analyst.id, role: 'analyst', name: analyst.name, email: analyst.email },
      { title: 'Disposal options for TERNLIGHT-1' },
    );
    const image = crypto.randomBytes(5000);
    await Attachment.create({
      memoId: other.id,
      filename: 'ground-track.png',
      contentType: 'image/png',
      byteSize: image.length,
      sha256: crypto.createHash('sha256').update(image).digest('hex'),
      data: image,
      uploadedBy: analyst.id,
    });
    const root = await Comment.create({
      memoId: other.id,
      parentId: null,
      authorId: cm.id,
      body: 'Which drag model?',
      anchor: { blockId: 'b1', from: 0, to: 4, quote: 'drag' } as never,
      status: 'open',
      resolvedBy: null,
      resolvedAt: null,
    });
    await Comment.create({
      memoId: other.id,
      parentId: root.id,
      authorId: analyst.id,
      body: 'The exponential table, as in the memo.',
      anchor: null,
      status: null,
      resolvedBy: null,
      resolvedAt: null,
    });
    await NotificationSetting.create({ userId: analyst.id, kind: 'submitted' as never, email: false });
    await DistributionContact.create({ memoId: demo.id, userId: customer.id, addedBy: cm.id });
    const release = await Release.create({
      memoId: demo.id,
      revisionId: revision.id,
      coverNote: 'For the Northmere review board.',
      releasedBy: cm.id,
      releasedAt: new Date(),
    });
    await Delivery.create({
      releaseId: release.id,
      memoId: demo.id,
      revisionId: revision.id,
      recipientId: customer.id,
      recipientEmail: customer.email,
      status: 'delivered',
      attempts: 1,
      lastAttemptAt: new Date(),
      deliveredAt: new Date(),
      lastError: null,
      smtpResponse: '250 OK',
      smtpMessageId: '<x@nodewright.example>',
      pdfAttached: true,
      nextAttemptAt: null,
      firstOpenedAt: null,
      acknowledgedAt: null,
    });
    return snapshot();
  });
  process.env.DATABASE_URL = targetUrl;
});

afterAll(async () => {
  await closeDatabase();
  process.env.DATABASE_URL = targetUrl;
  fs.rmSync(dir, { recursive: true, force: true });
});

describe('db:copy', () => {
  it('copies every table with the same rows, and verifies counts and every stored file', async () => {
    const lines: string[] = [];
    const report = await copyDatabase({ from: sourceUrl, to: targetUrl, log: (l) => lines.push(l) });
    expect(report.replacedTarget).toBe(false);
    const order = report.tables.map((t) => t.table);
    // Dependency order: a table comes after every table its foreign keys point to.
    expect(order.indexOf('users')).toBeLessThan(order.indexOf('memos'));
    expect(order.indexOf('revisions')).toBeLessThan(order.indexOf('releases'));
    expect(order.indexOf('releases')).toBeLessThan(order.indexOf('deliveries'));
    expect(order).not.toContain('schema_migrations');
    expect(report.filesChecked).toEqual(
      expect.arrayContaining([
        { table: 'revisions', files: 1 },
        { table: 'attachments', files: 1 },
      ]),
    );
    expect(lines).toContain('verified 1 stored files in revisions (SHA-256)');

    const copied = await onDatabase(targetUrl, snapshot);
    for (const model of everyModel) expect(copied[model.name], model.name).toEqual(source[model.name]);
    expect(source.User.length).toBeGreaterThanOrEqual(5);
    expect(source.Comment).toHaveLength(2);
  });

  it('the copied revision serves the same PDF bytes, and the app writes on after the copied ids', async () => {
    await onDatabase(targetUrl, async () => {
      const revision = await Revision.findOne({ rejectOnEmpty: true });
      expect(crypto.createHash('sha256').update(revision.pdfData).digest('hex')).toBe(pdfSha256);
      const analyst = await User.findOne({ where: { role: 'analyst' }, rejectOnEmpty: true });
      const memo = await makeMemo(
        { id: analyst.id, role: 'analyst', name: analyst.name, email: analyst.email },
        { title: 'Written after the move' },
      );
      expect(memo.id).toBeGreaterThan(Math.max(...(source.Memo as { id: number }[]).map((m) => m.id)));
    });
  });

  it('refuses a target that holds rows, naming them, and changes nothing there', async () => {
    const before = await onDatabase(targetUrl, () => Memo.count());
    await expect(copyDatabase({ from: sourceUrl, to: targetUrl })).rejects.toThrow(CopyRefused);
    await expect(copyDatabase({ from: sourceUrl, to: targetUrl })).rejects.toThrow(
      /The target is not empty: .*memos \(3\).*--replace-target/,
    );
    expect(await onDatabase(targetUrl, () => Memo.count())).toBe(before);
  });

  it('with --replace-target, empties the target first (undoing every migration) and copies again', async () => {
    const report = await copyDatabase({ from: sourceUrl, to: targetUrl, replaceTarget: true });
    expect(report.replacedTarget).toBe(true);
    const copied = await onDatabase(targetUrl, snapshot);
    for (const model of everyModel) expect(copied[model.name], model.name).toEqual(source[model.name]);
  });

  it('refuses a source that is no installation, and the same database on both sides', async () => {
    await expect(copyDatabase({ from: `sqlite:${path.join(dir, 'empty.sqlite')}`, to: targetUrl })).rejects.toThrow(
      /no schema_migrations table/,
    );
    await expect(copyDatabase({ from: sourceUrl, to: sourceUrl })).rejects.toThrow(/the same database/);
  });
});
