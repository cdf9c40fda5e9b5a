'use client';

import { useState } from 'react';
import type { CalcResult } from '@/lib/calc';
import { useCalcContext } from './calc-context';

const hasVector = (v: unknown) => Array.isArray(v) && v.length === 3;

/**
 * "Download OPM" under a block whose result is a state vector (mean-to-osculating,
 * an imported orbit data message): the server recomputes the block from the inputs
 * it ran with and answers its state as a CCSDS OPM in EME2000 (POST /api/calc/opm).
 * Without an epoch the button says what to add instead of downloading.
 */
export function DownloadOpmButton({ result, label }: { result: CalcResult; label: string }) {
  const { memo } = useCalcContext();
  const [problem, setProblem] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  if (!hasVector(result.outputs.positionKm) || !hasVector(result.outputs.velocityKmS)) return null;
  const download = async () => {
    setBusy(true);
    setProblem(null);
    try {
      const res = await fetch('/api/calc/opm', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({
          kind: result.kind,
          inputs: result.inputs,
          label,
          objectName: memo?.title.slice(0, 80),
          objectId: memo?.documentNumber,
        }),
      });
      if (!res.ok) {
        const body = (await res.json().catch(() => ({}))) as { error?: string };
        setProblem(body.error ?? `The server answered ${res.status}.`);
        return;
      }
      const name = /filename="([^"]+)"/.exec(res.headers.get('content-disposition') ?? '')?.[1] ?? 'state.opm';
      const url = URL.createObjectURL(await res.blob());
      const a = document.createElement('a');
      a.href = url;
      a.download = name;
      a.click();
      URL.revokeObjectURL(url);
    } catch {
      setProblem('The server could not be reached; try again.');
    } finally {
      setBusy(false);
    }
  };
  return (
    <div className="flex flex-wrap items-center gap-2">
      <button
        type="button"
        className="btn-quiet py-0.5 text-note"
        onClick={() => void download()}
        disabled={busy}
        // A download reads the stored result and changes nothing: it stays available in a read-only memo.
        data-reads-only=""
        title="The state as a CCSDS Orbit Parameter Message (KVN, EME2000)"
      >
        {busy ? 'Preparing OPM…' : 'Download OPM'}
      </button>
      {problem && (
        <span role="alert" className="text-note text-ember-700">
          {problem}
        </span>
      )}
    </div>
  );
}
