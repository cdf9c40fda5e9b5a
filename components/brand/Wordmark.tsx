/** Nodewright's mark: an orbit ellipse crossing the equator line at its node. */
export function Wordmark({ size = 'md' }: { size?: 'md' | 'lg' }) {
  const px = size === 'lg' ? 36 : 24;
  return (
    <span className="inline-flex items-center gap-2 font-semibold tracking-tight text-ink">
      <svg width={px} height={px} viewBox="0 0 32 32" aria-hidden="true">
        <line x1="2" y1="16" x2="30" y2="16" stroke="#b9b5a8" strokeWidth="1.5" />
        <ellipse
          cx="16"
          cy="16"
          rx="12"
          ry="6.5"
          transform="rotate(-28 16 16)"
          fill="none"
          stroke="#2f4a7a"
          strokeWidth="2"
        />
        <circle cx="5.6" cy="16" r="2.6" fill="#b7791f" />
      </svg>
      <span className={size === 'lg' ? 'text-title' : 'text-lead'}>Nodewright</span>
    </span>
  );
}
