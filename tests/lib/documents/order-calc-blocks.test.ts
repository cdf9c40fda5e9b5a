import { describe, expect, it } from 'vitest';
import { orderCalcBlocks } from '@/lib/documents/order-calc-blocks';
import type { CalcBlockAttrs, InputEntry } from '@/lib/documents/calc-nodes';

const ref = (blockId: string, output = 'altitudeKm'): InputEntry => ({ ref: { blockId, output } });
const block = (blockId: string, label: string, inputs: Record<string, InputEntry> = {}): CalcBlockAttrs => ({
  blockId,
  kind: 'sso-inclination',
  label,
  inputs,
});

describe('orderCalcBlocks (dependency order, Kahn 1962; cycles by Tarjan 1972)', () => {
  it('puts every block after the blocks it reads, keeping document order otherwise', () => {
    // Document order: sun (reads sso), sso (reads repeat), drag (reads repeat), repeat.
    const blocks = [
      block('sun', 'Sun', { altitudeKm: ref('repeat'), inclinationDeg: ref('sso', 'inclinationDeg') }),
      block('sso', 'SSO', { altitudeKm: ref('repeat') }),
      block('drag', 'Drag', { altitudeKm: ref('repeat') }),
      block('repeat', 'Repeat'),
    ];
    const { order, cyclic, missing } = orderCalcBlocks(blocks);
    expect(order).toEqual(['repeat', 'sso', 'sun', 'drag']);
    expect(cyclic.size).toBe(0);
    expect(missing.size).toBe(0);
  });

  it('refuses a cycle with a message naming its blocks, and holds back what depends on it', () => {
    const blocks = [
      block('a', 'Orbit A', { altitudeKm: ref('c') }),
      block('b', 'Orbit B', { altitudeKm: ref('a') }),
      block('c', 'Orbit C', { altitudeKm: ref('b') }),
      block('d', 'Downstream', { altitudeKm: ref('c') }),
      block('e', 'Free'),
    ];
    const { order, cyclic } = orderCalcBlocks(blocks);
    expect(order).toEqual(['e']);
    expect(cyclic.get('a')).toBe(
      'reference cycle: “Orbit A” → “Orbit B” → “Orbit C” → “Orbit A”; break one of these references',
    );
    expect(cyclic.get('b')).toBe(cyclic.get('a'));
    expect(cyclic.get('d')).toMatch(/waits on “Orbit C”, which is part of a reference cycle/);
  });

  it('a block reading itself is a cycle of one', () => {
    const { order, cyclic } = orderCalcBlocks([block('x', 'Self', { altitudeKm: ref('x') })]);
    expect(order).toEqual([]);
    expect(cyclic.get('x')).toMatch(/“Self” → “Self”/);
  });

  it('a reference to a removed block is reported, and the block still gets ordered', () => {
    const { order, missing } = orderCalcBlocks([block('s', 'SSO', { altitudeKm: ref('gone') })]);
    expect(order).toEqual(['s']);
    expect(missing.get('s')).toMatch(/no longer in the memo \(gone\)/);
  });
});
