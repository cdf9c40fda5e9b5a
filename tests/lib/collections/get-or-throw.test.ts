import { describe, expect, it } from 'vitest';
import { getOrThrow } from '@/lib/collections/get-or-throw';

describe('getOrThrow', () => {
  it('returns the stored value, including falsy ones', () => {
    const m = new Map<string, number | null>([
      ['a', 1],
      ['z', 0],
      ['n', null],
    ]);
    expect(getOrThrow(m, 'a', 'thing')).toBe(1);
    expect(getOrThrow(m, 'z', 'thing')).toBe(0);
    expect(getOrThrow(m, 'n', 'thing')).toBeNull();
  });

  it('throws an Error naming what was missing', () => {
    expect(() => getOrThrow(new Map<string, number>(), 'b1', 'calc block')).toThrow('calc block not found: b1');
  });
});
