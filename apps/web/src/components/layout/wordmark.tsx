/**
 * Railyard's mark: a yard ladder drawn like copper — a main line with sidings branching off
 * at 45°, each ending in a pad. The top pad is the lamp: the rail being followed.
 */
export function Wordmark() {
  return (
    <span className="inline-flex items-center gap-2">
      <RailyardMark size={22} />
      <span className="text-[15px] leading-none font-semibold tracking-[-0.01em] text-ink">
        Rail<span className="text-accent">yard</span>
      </span>
    </span>
  );
}

export function RailyardMark({ size }: { size: number }) {
  return (
    <svg viewBox="0 0 24 24" width={size} height={size} aria-hidden="true" className="shrink-0">
      <g
        stroke="var(--ry-accent)"
        strokeWidth="2"
        strokeLinecap="round"
        strokeLinejoin="round"
        fill="none"
      >
        <path d="M2 20H18.9" />
        <path d="M3.5 20l13-13h2.4" />
        <path d="M10 13.5h8.9" />
      </g>
      <circle cx="20.5" cy="20" r="1.6" fill="none" stroke="var(--ry-accent)" strokeWidth="1.5" />
      <circle cx="20.5" cy="13.5" r="1.6" fill="none" stroke="var(--ry-accent)" strokeWidth="1.5" />
      <circle cx="20.5" cy="7" r="2.2" fill="var(--ry-lamp)" />
    </svg>
  );
}
