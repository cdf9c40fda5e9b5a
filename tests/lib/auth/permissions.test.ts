import { describe, expect, it } from 'vitest';
import {
  decideGlobal,
  decideMemo,
  decideRevision,
  memoVisibility,
  type Actor,
  type MemoAction,
  type MemoFacts,
} from '@/lib/auth/permissions';
import type { Role } from '@/lib/auth/roles';
import type { MemoStatus } from '@/lib/memos/memo-status';

/**
 * The permission matrix: every role against every memo action and memo
 * state, allowed and refused. The expectation table below is written out
 * by hand from the role definitions in README ("Roles"), not derived from
 * the code under test.
 */

const actors: Record<Role, Actor> = {
  analyst: { id: 1, role: 'analyst', name: 'A', email: 'a@x.example' },
  reviewer: { id: 2, role: 'reviewer', name: 'R', email: 'r@x.example' },
  'config-manager': { id: 3, role: 'config-manager', name: 'C', email: 'c@x.example' },
  customer: { id: 4, role: 'customer', name: 'K', email: 'k@x.example' },
  admin: { id: 5, role: 'admin', name: 'D', email: 'd@x.example' },
};

const memo = (status: MemoStatus, opts: Partial<MemoFacts> = {}): MemoFacts => ({
  ownerId: 1,
  coAuthorIds: [],
  status,
  reviewerIds: [2],
  releasedToUserIds: [],
  ...opts,
});

// Y = allowed, 4 = refused with 403 (role or person), 9 = refused with 409 (state),
// N = 404, answered like an unknown memo (the caller may not see it at all).
type Cell = 'Y' | '4' | '9' | 'N';
const cellOf = (d: ReturnType<typeof decideMemo>): Cell =>
  d.allowed ? 'Y' : d.status === 403 ? '4' : d.status === 404 ? 'N' : '9';
// Columns: draft, in-review, approved, frozen. The analyst owns the memo; the reviewer is assigned; the customer has nothing released.
const MATRIX: Record<MemoAction, Record<Role, [Cell, Cell, Cell, Cell]>> = {
  'memo.view': {
    analyst: ['Y', 'Y', 'Y', 'Y'],
    reviewer: ['Y', 'Y', 'Y', 'Y'],
    'config-manager': ['Y', 'Y', 'Y', 'Y'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['Y', 'Y', 'Y', 'Y'],
  },
  'memo.versions': {
    analyst: ['Y', 'Y', 'Y', 'Y'],
    reviewer: ['Y', 'Y', 'Y', 'Y'],
    'config-manager': ['Y', 'Y', 'Y', 'Y'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['Y', 'Y', 'Y', 'Y'],
  },
  'memo.edit': {
    analyst: ['Y', '9', '9', '9'],
    reviewer: ['4', '4', '4', '4'],
    'config-manager': ['4', '4', '4', '4'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
  'memo.comment': {
    analyst: ['Y', 'Y', 'Y', '9'],
    reviewer: ['Y', 'Y', 'Y', '9'],
    'config-manager': ['4', '4', '4', '4'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
  'memo.resolve': {
    analyst: ['Y', 'Y', 'Y', '9'],
    reviewer: ['4', '4', '4', '4'],
    'config-manager': ['4', '4', '4', '4'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
  'memo.submit': {
    analyst: ['Y', '9', '9', '9'],
    reviewer: ['4', '4', '4', '4'],
    'config-manager': ['4', '4', '4', '4'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
  'memo.decide': {
    analyst: ['4', '4', '4', '4'],
    reviewer: ['9', 'Y', '9', '9'],
    'config-manager': ['4', '4', '4', '4'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
  'memo.freeze': {
    analyst: ['4', '4', '4', '4'],
    reviewer: ['4', '4', '4', '4'],
    'config-manager': ['9', '9', 'Y', '9'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
  'memo.reopen': {
    analyst: ['9', '9', '9', 'Y'],
    reviewer: ['4', '4', '4', '4'],
    'config-manager': ['9', '9', '9', 'Y'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
  'memo.release': {
    analyst: ['4', '4', '4', '4'],
    reviewer: ['4', '4', '4', '4'],
    'config-manager': ['9', '9', '9', 'Y'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
  'memo.distribute': {
    analyst: ['4', '4', '4', '4'],
    reviewer: ['4', '4', '4', '4'],
    'config-manager': ['Y', 'Y', 'Y', 'Y'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
  'memo.tracking': {
    analyst: ['Y', 'Y', 'Y', 'Y'],
    reviewer: ['Y', 'Y', 'Y', 'Y'],
    'config-manager': ['Y', 'Y', 'Y', 'Y'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['Y', 'Y', 'Y', 'Y'],
  },
  'memo.threads': {
    analyst: ['Y', 'Y', 'Y', 'Y'],
    reviewer: ['Y', 'Y', 'Y', 'Y'],
    'config-manager': ['Y', 'Y', 'Y', 'Y'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['Y', 'Y', 'Y', 'Y'],
  },
  'memo.co-authors': {
    analyst: ['Y', 'Y', 'Y', 'Y'],
    reviewer: ['4', '4', '4', '4'],
    'config-manager': ['4', '4', '4', '4'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
  'memo.name-version': {
    analyst: ['Y', 'Y', 'Y', 'Y'],
    reviewer: ['4', '4', '4', '4'],
    'config-manager': ['4', '4', '4', '4'],
    customer: ['N', 'N', 'N', 'N'],
    admin: ['4', '4', '4', '4'],
  },
};

/**
 * Authorship among analysts (README, "Roles" and "Who writes a memo"): the
 * owner (id 1) and a co-author the owner added (id 6) edit, submit, settle
 * threads and reopen; another analyst (id 7) reads and comments; only the
 * owner changes the co-authors.
 */
const owner: Actor = actors.analyst;
const coAuthor: Actor = { id: 6, role: 'analyst', name: 'E', email: 'e@x.example' };
const otherAnalyst: Actor = { id: 7, role: 'analyst', name: 'F', email: 'f@x.example' };
const AUTHORSHIP: Record<MemoAction, { owner: Cell[]; coAuthor: Cell[]; otherAnalyst: Cell[] }> = {
  'memo.view': { owner: ['Y', 'Y', 'Y', 'Y'], coAuthor: ['Y', 'Y', 'Y', 'Y'], otherAnalyst: ['Y', 'Y', 'Y', 'Y'] },
  'memo.versions': { owner: ['Y', 'Y', 'Y', 'Y'], coAuthor: ['Y', 'Y', 'Y', 'Y'], otherAnalyst: ['Y', 'Y', 'Y', 'Y'] },
  'memo.edit': { owner: ['Y', '9', '9', '9'], coAuthor: ['Y', '9', '9', '9'], otherAnalyst: ['4', '4', '4', '4'] },
  'memo.comment': { owner: ['Y', 'Y', 'Y', '9'], coAuthor: ['Y', 'Y', 'Y', '9'], otherAnalyst: ['Y', 'Y', 'Y', '9'] },
  'memo.resolve': { owner: ['Y', 'Y', 'Y', '9'], coAuthor: ['Y', 'Y', 'Y', '9'], otherAnalyst: ['4', '4', '4', '4'] },
  'memo.submit': { owner: ['Y', '9', '9', '9'], coAuthor: ['Y', '9', '9', '9'], otherAnalyst: ['4', '4', '4', '4'] },
  'memo.decide': { owner: ['4', '4', '4', '4'], coAuthor: ['4', '4', '4', '4'], otherAnalyst: ['4', '4', '4', '4'] },
  'memo.freeze': { owner: ['4', '4', '4', '4'], coAuthor: ['4', '4', '4', '4'], otherAnalyst: ['4', '4', '4', '4'] },
  'memo.reopen': { owner: ['9', '9', '9', 'Y'], coAuthor: ['9', '9', '9', 'Y'], otherAnalyst: ['4', '4', '4', '4'] },
  'memo.release': { owner: ['4', '4', '4', '4'], coAuthor: ['4', '4', '4', '4'], otherAnalyst: ['4', '4', '4', '4'] },
  'memo.distribute': {
    owner: ['4', '4', '4', '4'],
    coAuthor: ['4', '4', '4', '4'],
    otherAnalyst: ['4', '4', '4', '4'],
  },
  'memo.tracking': { owner: ['Y', 'Y', 'Y', 'Y'], coAuthor: ['Y', 'Y', 'Y', 'Y'], otherAnalyst: ['Y', 'Y', 'Y', 'Y'] },
  'memo.threads': { owner: ['Y', 'Y', 'Y', 'Y'], coAuthor: ['Y', 'Y', 'Y', 'Y'], otherAnalyst: ['Y', 'Y', 'Y', 'Y'] },
  'memo.co-authors': {
    owner: ['Y', 'Y', 'Y', 'Y'],
    coAuthor: ['4', '4', '4', '4'],
    otherAnalyst: ['4', '4', '4', '4'],
  },
  'memo.name-version': {
    owner: ['Y', 'Y', 'Y', 'Y'],
    coAuthor: ['Y', 'Y', 'Y', 'Y'],
    otherAnalyst: ['4', '4', '4', '4'],
  },
};

const STATUSES: MemoStatus[] = ['draft', 'in-review', 'approved', 'frozen'];

describe('memo permission matrix (role × action × state)', () => {
  for (const [action, byRole] of Object.entries(MATRIX) as [MemoAction, Record<Role, Cell[]>][]) {
    for (const [role, cells] of Object.entries(byRole) as [Role, Cell[]][]) {
      it(`${role} ${action}: ${cells.join(' ')}`, () => {
        STATUSES.forEach((status, i) => {
          const d = decideMemo(actors[role], action, memo(status));
          expect(cellOf(d), `${role} ${action} on ${status}`).toBe(cells[i]);
          if (!d.allowed) expect(d.reason.length).toBeGreaterThan(10);
        });
      });
    }
  }
});

describe('authorship: owner, co-author, another analyst', () => {
  const who = { owner, coAuthor, otherAnalyst };
  for (const [action, byPerson] of Object.entries(AUTHORSHIP) as [MemoAction, Record<keyof typeof who, Cell[]>][]) {
    for (const [person, cells] of Object.entries(byPerson) as [keyof typeof who, Cell[]][]) {
      it(`${person} ${action}: ${cells.join(' ')}`, () => {
        STATUSES.forEach((status, i) => {
          const d = decideMemo(who[person], action, memo(status, { coAuthorIds: [6] }));
          expect(cellOf(d), `${person} ${action} on ${status}`).toBe(cells[i]);
        });
      });
    }
  }
  it('another analyst is told why, and that reading and commenting stay open', () => {
    expect(decideMemo(otherAnalyst, 'memo.edit', memo('draft', { coAuthorIds: [6] }))).toEqual({
      allowed: false,
      status: 403,
      reason: 'Only the memo’s owner and its co-authors may do this; other analysts read and comment.',
    });
  });
  it('a co-author taken off the list is an other analyst again', () => {
    expect(decideMemo(coAuthor, 'memo.edit', memo('draft', { coAuthorIds: [] })).allowed).toBe(false);
  });
});

describe('visibility', () => {
  it('a reviewer not assigned to a memo cannot see it', () => {
    const d = decideMemo(actors.reviewer, 'memo.view', memo('in-review', { reviewerIds: [99] }));
    // 404, worded like an unknown memo, so that ids cannot be probed.
    expect(d).toEqual({ allowed: false, status: 404, reason: 'Not found, or not shared with you.' });
  });
  it('a customer sees a frozen memo only once it is released to them, and never a draft', () => {
    expect(decideMemo(actors.customer, 'memo.view', memo('frozen', { releasedToUserIds: [4] })).allowed).toBe(true);
    expect(decideMemo(actors.customer, 'memo.view', memo('frozen', { releasedToUserIds: [7] })).allowed).toBe(false);
    expect(decideMemo(actors.customer, 'memo.view', memo('draft', { releasedToUserIds: [4] })).allowed).toBe(false);
    expect(decideMemo(actors.customer, 'memo.versions', memo('frozen', { releasedToUserIds: [4] })).allowed).toBe(
      false,
    );
    // Reading the current memo does not open its review threads or delivery tracking.
    expect(decideMemo(actors.customer, 'memo.threads', memo('frozen', { releasedToUserIds: [4] })).allowed).toBe(false);
    expect(decideMemo(actors.customer, 'memo.tracking', memo('frozen', { releasedToUserIds: [4] })).allowed).toBe(
      false,
    );
  });
  it('a customer keeps a revision released to them after the memo is reopened, and sees no other revision', () => {
    const reopened = memo('draft');
    expect(decideRevision(actors.customer, 'revision.view', { memo: reopened, releasedToUserIds: [4] }).allowed).toBe(
      true,
    );
    expect(
      decideRevision(actors.customer, 'revision.acknowledge', { memo: reopened, releasedToUserIds: [4] }).allowed,
    ).toBe(true);
    expect(
      decideRevision(actors.customer, 'revision.view', {
        memo: memo('frozen', { releasedToUserIds: [4] }),
        releasedToUserIds: [7],
      }),
    ).toEqual({ allowed: false, status: 404, reason: 'Not found, or not shared with you.' });
  });
  it('staff see revisions as they see the memo; only customers acknowledge', () => {
    expect(
      decideRevision(actors.reviewer, 'revision.view', { memo: memo('frozen'), releasedToUserIds: [] }).allowed,
    ).toBe(true);
    expect(
      decideRevision(actors.reviewer, 'revision.view', {
        memo: memo('frozen', { reviewerIds: [99] }),
        releasedToUserIds: [],
      }).allowed,
    ).toBe(false);
    expect(
      decideRevision(actors['config-manager'], 'revision.acknowledge', { memo: memo('frozen'), releasedToUserIds: [3] })
        .allowed,
    ).toBe(false);
  });
  it('list scopes per role', () => {
    expect(memoVisibility(actors.analyst)).toEqual({ scope: 'all' });
    expect(memoVisibility(actors.reviewer)).toEqual({ scope: 'assigned', reviewerId: 2 });
    expect(memoVisibility(actors.customer)).toEqual({ scope: 'released', customerId: 4 });
  });
});

describe('global actions', () => {
  const EXPECTED: Record<string, Role[]> = {
    'memo.list': ['analyst', 'reviewer', 'config-manager', 'customer', 'admin'],
    'memo.create': ['analyst'],
    'calc.run': ['analyst', 'reviewer', 'config-manager', 'admin'],
    'user.directory': ['analyst', 'reviewer', 'config-manager', 'admin'],
    'user.manage': ['admin'],
    'audit.view': ['admin'],
    'outbox.view': ['admin'],
    'portal.view': ['customer'],
    'review.notes': ['analyst', 'reviewer', 'config-manager'],
    'organisation.manage': ['admin'],
  };
  for (const [action, allowed] of Object.entries(EXPECTED)) {
    it(`${action} is allowed for ${allowed.join(', ')} only`, () => {
      for (const role of Object.keys(actors) as Role[]) {
        expect(decideGlobal(actors[role], action as never).allowed, `${role} ${action}`).toBe(allowed.includes(role));
      }
    });
  }
});
