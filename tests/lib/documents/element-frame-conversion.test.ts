import { describe, expect, it } from 'vitest';
import { getCalcKind, runCalc } from '@/lib/calc';
import { eme2000ConversionFor } from '@/lib/documents/element-frame-conversion';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import { calc, doc } from '@/lib/templates/build-doc';

function kind(name: string) {
  const k = getCalcKind(name);
  if (!k) throw new Error(name);
  return k;
}

describe('entering elements in EME2000 (element-frame block fed into a block of date)', () => {
  it('feeds both elements of mean-to-osculating from a converter that carries the typed EME2000 values; the evaluated chain equals element-frame then mean-to-osculating', () => {
    const host = {
      blockId: 'host',
      kind: 'mean-to-osculating',
      label: 'Injection',
      inputs: { inclinationDeg: { text: '98.1' }, raanDeg: { text: '120 deg' }, semiMajorAxisKm: { text: '7078' } },
    };
    const plan = eme2000ConversionFor(kind('mean-to-osculating'), host, 'conv');
    expect(plan.converter).toMatchObject({
      blockId: 'conv',
      kind: 'element-frame',
      inputs: {
        fromFrame: { text: 'EME2000' },
        toFrame: { text: 'TOD' },
        inclinationDeg: { text: '98.1' },
        raanDeg: { text: '120 deg' },
      },
    });
    expect(plan.converter.label).toBe('Injection: elements from EME2000 to true of date');
    expect(plan.hostInputs).toEqual({
      inclinationDeg: { ref: { blockId: 'conv', output: 'inclinationDeg' } },
      raanDeg: { ref: { blockId: 'conv', output: 'raanDeg' } },
      semiMajorAxisKm: { text: '7078' },
    });

    const d = doc(
      calc('conv', 'element-frame', plan.converter.label, plan.converter.inputs),
      calc('host', 'mean-to-osculating', 'Injection', plan.hostInputs),
    );
    const ev = evaluateDocument(d);
    const conv = runCalc('element-frame', { inclinationDeg: 98.1, raanDeg: 120 });
    const hostEv = ev.get('host');
    expect(conv.ok && hostEv?.status === 'ok').toBe(true);
    if (!conv.ok || hostEv?.status !== 'ok') return;
    expect(hostEv.result.inputs.inclinationDeg).toBe(conv.result.outputs.inclinationDeg);
    expect(hostEv.result.inputs.raanDeg).toBe(conv.result.outputs.raanDeg);
    expect(hostEv.result.inputs.inclinationDeg).not.toBe(98.1);
  });

  it('copies the host epoch; a kind without RAAN input feeds only its inclination', () => {
    const host = {
      blockId: 'h',
      kind: 'sun-geometry',
      label: '',
      inputs: { startEpoch: { text: '2028-03-01T00:00:00Z' } },
    };
    const plan = eme2000ConversionFor(kind('sun-geometry'), host, 'c');
    expect(plan.converter.inputs.epoch).toEqual({ text: '2028-03-01T00:00:00Z' });
    expect(plan.converter.inputs.inclinationDeg).toBeUndefined();
    expect(Object.keys(plan.hostInputs)).toEqual(['startEpoch', 'inclinationDeg']);
    const nodeRate = eme2000ConversionFor(
      kind('node-rate'),
      { blockId: 'n', kind: 'node-rate', label: '', inputs: {} },
      'c2',
    );
    expect(nodeRate.converter.inputs.epoch).toBeUndefined();
  });
});
