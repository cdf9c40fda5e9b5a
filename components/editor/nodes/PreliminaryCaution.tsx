/** The caution shown beside every computed result. */
export function PreliminaryCaution() {
  return (
    <p className="border-t border-rule pt-1 text-micro text-ink-faint">
      Preliminary design only: verify with high-fidelity tools; the programme’s approved procedures and licensed
      practice govern.
    </p>
  );
}
