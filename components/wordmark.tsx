/** Throwline's mark: a lens point throwing a soft-edged pool, drawn in plain SVG. */
export function Wordmark({ small = false }: { small?: boolean }) {
  return (
    <span className="inline-flex items-center gap-2 font-semibold tracking-tight">
      <svg width={small ? 22 : 28} height={small ? 22 : 28} viewBox="0 0 28 28" aria-hidden="true">
        <circle cx="5" cy="5" r="3" fill="var(--accent)" />
        <path d="M6 7 L13 25 L25 16 Z" fill="var(--accent)" opacity="0.18" />
        <ellipse
          cx="19"
          cy="21"
          rx="7"
          ry="4.5"
          transform="rotate(-35 19 21)"
          fill="none"
          stroke="var(--accent)"
          strokeWidth="1.6"
        />
      </svg>
      <span className={small ? "text-base" : "text-xl"}>Throwline</span>
    </span>
  );
}
