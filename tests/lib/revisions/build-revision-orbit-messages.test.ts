/**
 * What a frozen revision of the demo memo carries: the OPM of its design state
 * (the "Design state at the reference epoch" block) and the OEM of its one-day
 * check; read back through the import kind they give the design's mean elements
 * (a within 1e-5 km, e 1e-8, i and RAAN 1e-6°: the printed precision of the OPM,
 * 1 mm and 1 µm/s), and both pass the CCSDS 502.0-B checks of our reader.
 */
import { describe, expect, it } from 'vitest';
import crypto from 'node:crypto';
import { runCalc } from '@/lib/calc';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import { ssoDesignRationale } from '@/lib/templates/sso-design-rationale';
import { buildRevisionOrbitMessages } from '@/lib/revisions/build-revision-orbit-messages';
import { readOrbitMessage } from '@/lib/orbit-data/read-orbit-message';
import type { FrozenBlock } from '@/lib/revisions/revision-record';
import type { OrbitEphemerisMessage, OrbitParameterMessage } from '@/lib/orbit-data/orbit-message-types';

const content = ssoDesignRationale.build();
const blocks: FrozenBlock[] = [...evaluateDocument(content).values()].flatMap((e) =>
  e.status === 'ok'
    ? [
        {
          blockId: e.blockId,
          kind: e.block.kind,
          label: e.block.label,
          storedInputs: e.block.inputs,
          inputs: e.result.inputs,
          outputs: e.result.outputs,
          warnings: e.result.warnings,
          engineVersion: e.result.engineVersion,
        },
      ]
    : [],
);
const memo = { documentNumber: 'BWO-TL1-DM-001', title: 'TERNLIGHT-1 orbit design rationale', content };
const frozenAt = new Date('2026-12-02T13:30:00Z');

describe('buildRevisionOrbitMessages', () => {
  const messages = buildRevisionOrbitMessages(memo, 'A', blocks, 'Brightwater Orbital', frozenAt);

  it('finds the design state of the demo memo and hashes both messages', () => {
    expect(messages.designBlock).toBe('Design state at the reference epoch');
    expect(messages.opmSha256).toBe(crypto.createHash('sha256').update(messages.opmKvn!).digest('hex'));
    expect(messages.oemSha256).toBe(crypto.createHash('sha256').update(messages.oemKvn!).digest('hex'));
  });

  it('writes messages our reader accepts: an OPM in EME2000 at the reference epoch, an OEM of 1441 states over one day', () => {
    const opm = readOrbitMessage(messages.opmKvn!) as OrbitParameterMessage;
    expect(opm.metadata).toMatchObject({
      refFrame: 'EME2000',
      objectId: 'BWO-TL1-DM-001',
      centerName: 'EARTH',
      timeSystem: 'UTC',
    });
    expect(opm.state.epochText).toBe('2027-09-15T00:00:00.000');
    expect(opm.header.comments.join(' ') + opm.metadata.comments.join(' ')).not.toMatch(/from memory/i);
    const oem = readOrbitMessage(messages.oemKvn!) as OrbitEphemerisMessage;
    expect(oem.segments[0].states).toHaveLength(1441);
    expect(oem.segments[0].states[0].positionKm).toEqual(opm.state.positionKm);
  });

  it('the frozen OPM read back through import gives the design mean elements', () => {
    const design = blocks.find((b) => b.blockId === 'state')!.inputs as Record<string, number>;
    const r = runCalc('orbit-message', { message: messages.opmKvn });
    if (!r.ok) throw new Error(r.error);
    const out = r.result.outputs as Record<string, number>;
    expect(Math.abs(out.meanSemiMajorAxisKm - design.semiMajorAxisKm)).toBeLessThan(1e-5);
    expect(Math.abs(out.meanEccentricity - design.eccentricity)).toBeLessThan(1e-8);
    expect(Math.abs(out.meanInclinationDeg - design.inclinationDeg)).toBeLessThan(1e-6);
    expect(Math.abs(out.meanRaanDeg - design.raanDeg)).toBeLessThan(1e-6);
  });

  it('gives no messages for a memo without a dated state', () => {
    const none = buildRevisionOrbitMessages(
      memo,
      'A',
      blocks.filter((b) => b.kind !== 'mean-to-osculating'),
      'Brightwater Orbital',
      frozenAt,
    );
    expect(none).toEqual({ opmKvn: null, opmSha256: null, oemKvn: null, oemSha256: null, designBlock: null });
  });
});
