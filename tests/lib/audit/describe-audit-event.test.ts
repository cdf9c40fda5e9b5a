import { describe, expect, it } from 'vitest';
import { AUDIT_ACTION_LABELS, describeAuditEvent, type DescribableEvent } from '@/lib/audit/describe-audit-event';
import { AUDIT_ACTIONS } from '@/lib/audit/record-audit';

/*
 * What is checked: each audit event reads as a sentence naming the person by
 * name and the memo by document number, with the facts of its details — not
 * as JSON, ids or action codes. Expected sentences are written out by hand.
 */

const event = (over: Partial<DescribableEvent>): DescribableEvent => ({
  action: 'memo.save',
  actorName: 'Ilse Marrow',
  actorEmail: 'ilse.marrow@brightwater.example',
  documentNumber: 'BWO-TL1-DM-001',
  memoId: 4,
  revisionLetter: null,
  details: null,
  ...over,
});

describe('describeAuditEvent', () => {
  it.each<[string, Partial<DescribableEvent>, string]>([
    ['a save', { details: { version: 12 } }, 'Ilse Marrow saved BWO-TL1-DM-001 as version 12.'],
    [
      'a submission',
      {
        action: 'memo.submit',
        details: { version: 12, reviewers: ['Tobias Quenby', 'Ada Brenn'], note: 'Drag table is new.' },
      },
      'Ilse Marrow submitted BWO-TL1-DM-001 version 12 for review to Tobias Quenby and Ada Brenn: “Drag table is new.”',
    ],
    [
      'an approval',
      {
        action: 'memo.approve',
        actorName: 'Tobias Quenby',
        details: { version: 12, round: 2, note: null, meaning: 'Reviewed and approved' },
      },
      'Tobias Quenby approved BWO-TL1-DM-001 version 12 (review round 2).',
    ],
    [
      'a signature',
      {
        action: 'signature.sign',
        actorName: 'Ruth Okafor-Lind',
        revisionLetter: 'A',
        details: {
          signedAction: 'freeze',
          meaning: 'Released as baseline',
          printedName: 'Ruth Okafor-Lind',
          role: 'config-manager',
          signedAt: '2026-12-02T12:41:05.000Z',
          version: 12,
          round: 2,
        },
      },
      'Ruth Okafor-Lind (Configuration manager) electronically signed the freeze of BWO-TL1-DM-001 revision A version 12, meaning “Released as baseline”, at 2026-12-02 12:41 UTC.',
    ],
    [
      'a refused signature',
      { action: 'signature.refused', actorName: 'Tobias Quenby', details: { clientAddress: '127.0.0.1' } },
      'Tobias Quenby tried to sign on BWO-TL1-DM-001 with a wrong or missing password; nothing was signed.',
    ],
    [
      'a comment',
      {
        action: 'comment.create',
        actorName: 'Tobias Quenby',
        details: { threadId: 3, quote: 'Five-year design life', excerpt: 'Show the ΔV budget.' },
      },
      'Tobias Quenby commented on BWO-TL1-DM-001 at “Five-year design life”: “Show the ΔV budget.”',
    ],
    [
      'a resolve',
      { action: 'comment.resolve', details: { threadId: 3, quote: 'Five-year design life' } },
      'Ilse Marrow resolved the thread on BWO-TL1-DM-001 at “Five-year design life”.',
    ],
    [
      'a draft download',
      { action: 'pdf.download', details: { draft: true, version: 12, pdfSha256: 'ab12cd34ef56ab12cd34ef56' } },
      'Ilse Marrow downloaded the draft PDF of BWO-TL1-DM-001 version 12 (SHA-256 ab12cd34ef56…).',
    ],
    [
      'a revision download',
      {
        action: 'pdf.download',
        actorName: 'Samir Dunmore',
        revisionLetter: 'A',
        details: { pdfSha256: 'ab12cd34ef56ab12cd34ef56' },
      },
      'Samir Dunmore downloaded the PDF of BWO-TL1-DM-001 revision A (SHA-256 ab12cd34ef56…).',
    ],
    [
      'a refused sign-in (no person)',
      {
        action: 'sign-in-refused',
        actorName: null,
        actorEmail: null,
        memoId: null,
        documentNumber: null,
        details: { email: 'x@example.org', clientAddress: '10.0.0.7' },
      },
      'A sign-in as x@example.org was refused: wrong password (from 10.0.0.7).',
    ],
  ])('%s', (_what, over, sentence) => {
    expect(describeAuditEvent(event(over))).toBe(sentence);
  });

  it('every recorded action has its own sentence: no action code, no JSON, no "undefined"', () => {
    for (const action of AUDIT_ACTIONS) {
      const text = describeAuditEvent(event({ action, details: {} }));
      expect(text, action).not.toContain(action);
      expect(text, action).not.toMatch(/[{}]|undefined|null|NaN/);
      expect(text, action).toMatch(/[.”]$/);
    }
  });

  it('details of another type than expected do not leak into the sentence', () => {
    const text = describeAuditEvent(
      event({
        action: 'memo.submit',
        details: { version: '12; DROP', reviewers: 'not a list', note: { nested: true } },
      }),
    );
    expect(text).toBe('Ilse Marrow submitted BWO-TL1-DM-001 version ? for review to nobody.');
  });

  it('an action recorded by an older build still reads as a sentence', () => {
    expect(describeAuditEvent(event({ action: 'memo.archive' }))).toBe('Ilse Marrow: memo.archive on BWO-TL1-DM-001.');
  });

  it('the filter names each action in words, each name once, no action codes', () => {
    const labels = AUDIT_ACTIONS.map((a) => AUDIT_ACTION_LABELS[a]);
    expect(new Set(labels).size).toBe(AUDIT_ACTIONS.length);
    for (const label of labels) expect(label).toMatch(/^[A-Z][A-Za-z-]*( [A-Za-z()-]+)*$/);
    expect(AUDIT_ACTION_LABELS['signature.sign']).toBe('Electronic signature');
  });
});
