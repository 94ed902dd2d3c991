/** Loopwright's mark: a signal path whose output loops back into a summing junction. */
export function Logo({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden className={className}>
      <rect x="1" y="1" width="30" height="30" rx="6" className="fill-signal" />
      <path
        d="M5 13h2.8M14.2 13H27M21 13v9H11v-5.8"
        fill="none"
        stroke="#fff"
        strokeWidth="2.2"
        strokeLinecap="round"
        strokeLinejoin="round"
      />
      <circle cx="11" cy="13" r="3.2" fill="none" className="stroke-trace" strokeWidth="2.2" />
    </svg>
  );
}
