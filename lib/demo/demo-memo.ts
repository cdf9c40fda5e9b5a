import type { TiptapDoc, TiptapNode } from '@/lib/memos/memo-schema';

export const DEMO_MEMO = {
  documentNumber: 'BWO-TL1-DM-001',
  title: 'TERNLIGHT-1 orbit design rationale',
};

const p = (text: string): TiptapNode => ({ type: 'paragraph', content: [{ type: 'text', text }] });
const h = (level: number, text: string): TiptapNode => ({ type: 'heading', attrs: { level }, content: [{ type: 'text', text }] });
const li = (text: string): TiptapNode => ({ type: 'listItem', content: [p(text)] });

/** The demo memo: an invented mission, written as an analyst would start it. */
export function demoMemoContent(): TiptapDoc {
  return {
    type: 'doc',
    content: [
      h(1, 'Purpose'),
      p('This memo records why TERNLIGHT-1, Brightwater Orbital’s wetland-monitoring imager for the Northmere Basin Authority, flies a near-circular sun-synchronous orbit, and how its altitude, node local time and repeat cycle were chosen.'),
      h(1, 'Mission drivers'),
      {
        type: 'bulletList',
        content: [
          li('Revisit every wetland site at least once every 11 days with a 120 km swath.'),
          li('Constant illumination: a descending node near 10:30 local mean solar time.'),
          li('A five-year design life without exceeding the propellant budget of 28 m/s.'),
        ],
      },
      h(1, 'Candidate orbits'),
      p('Three candidate altitudes between 600 km and 720 km are traded in the sections that follow; each candidate is sun-synchronous and has an exact repeat ground track.'),
      h(1, 'Open points'),
      p('Launch-vehicle injection accuracy is still to be confirmed by the launch provider.'),
    ],
  };
}
