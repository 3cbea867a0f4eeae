/** Platload's mark: a plat of four lots, one turned. */
export function Brand({ size = 22 }: { size?: number }) {
  return (
    <span className="inline-flex items-center gap-2 font-semibold tracking-tight text-zinc-900">
      <svg width={size} height={size} viewBox="0 0 24 24" aria-hidden="true">
        <rect x="2" y="2" width="9" height="9" rx="1.5" fill="var(--color-accent-600)" />
        <rect x="13" y="2" width="9" height="9" rx="1.5" fill="var(--color-accent-100)" />
        <rect x="2" y="13" width="9" height="9" rx="1.5" fill="var(--color-accent-100)" />
        <rect
          x="14"
          y="14"
          width="7.5"
          height="7.5"
          rx="1.5"
          fill="var(--color-accent-700)"
          transform="rotate(20 17.75 17.75)"
        />
      </svg>
      Platload
    </span>
  );
}
