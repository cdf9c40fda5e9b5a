/**
 * lib/sessions/remember-session-actors.ts on its own: the recheck interval
 * (NODEWRIGHT_SESSION_RECHECK_MS, and 0 switching memory off), the
 * generation check that drops a lookup overlapping a change, and the bound
 * on entries. Times are passed in, so nothing here waits.
 */
import { afterEach, describe, expect, it } from 'vitest';
import {
  forgetSessionActors,
  recallSessionActor,
  rememberSessionActor,
  sessionMemoryGeneration,
  sessionRecheckMs,
} from '@/lib/sessions/remember-session-actors';
import type { Actor } from '@/lib/auth/permissions';

const person = (id: number): Actor => ({
  id,
  role: 'analyst',
  name: `Analyst ${id}`,
  email: `a${id}@brightwater.example`,
});

afterEach(() => {
  delete process.env.NODEWRIGHT_SESSION_RECHECK_MS;
  forgetSessionActors();
});

describe('remembered sessions', () => {
  it('are recalled for the interval from when they were read, then read again', () => {
    process.env.NODEWRIGHT_SESSION_RECHECK_MS = '2000';
    rememberSessionActor('s1', 1, person(1), sessionMemoryGeneration(), 10_000);
    expect(recallSessionActor('s1', 1, 11_999)?.id).toBe(1);
    expect(recallSessionActor('s1', 1, 12_000)).toBeNull();
    expect(recallSessionActor('s1', 1, 11_000)).toBeNull(); // dropped when found too old
  });

  it('are never recalled for a token naming another person', () => {
    rememberSessionActor('s1', 1, person(1), sessionMemoryGeneration(), performance.now());
    expect(recallSessionActor('s1', 2)).toBeNull();
  });

  it('drop a lookup that began before a change', () => {
    const before = sessionMemoryGeneration();
    forgetSessionActors();
    rememberSessionActor('s1', 1, person(1), before, performance.now());
    expect(recallSessionActor('s1', 1)).toBeNull();
    rememberSessionActor('s1', 1, person(1), sessionMemoryGeneration(), performance.now());
    expect(recallSessionActor('s1', 1)?.id).toBe(1);
  });

  it('are all forgotten at once', () => {
    for (let i = 1; i <= 5; i++)
      rememberSessionActor(`s${i}`, i, person(i), sessionMemoryGeneration(), performance.now());
    forgetSessionActors();
    for (let i = 1; i <= 5; i++) expect(recallSessionActor(`s${i}`, i)).toBeNull();
  });

  it('are not kept at all with an interval of 0', () => {
    process.env.NODEWRIGHT_SESSION_RECHECK_MS = '0';
    expect(sessionRecheckMs()).toBe(0);
    rememberSessionActor('s1', 1, person(1), sessionMemoryGeneration(), performance.now());
    expect(recallSessionActor('s1', 1)).toBeNull();
  });

  it('fall back to 2000 ms for an interval that is not a whole number of milliseconds up to a minute', () => {
    for (const bad of ['-1', 'soon', '1.5', '600000']) {
      process.env.NODEWRIGHT_SESSION_RECHECK_MS = bad;
      expect(sessionRecheckMs(), bad).toBe(2000);
    }
  });

  it('hold at most 10 000 sessions, the oldest going first', () => {
    const now = performance.now();
    for (let i = 0; i <= 10_000; i++) rememberSessionActor(`s${i}`, i, person(i), sessionMemoryGeneration(), now);
    expect(recallSessionActor('s0', 0, now)).toBeNull();
    expect(recallSessionActor('s1', 1, now)?.id).toBe(1);
    expect(recallSessionActor('s10000', 10_000, now)?.id).toBe(10_000);
  });
});
