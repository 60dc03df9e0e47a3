/** Slackwater's mark: a still tide line over ink. */
export function Logo({ size = 28 }: { size?: number }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" aria-hidden="true">
      <rect width="32" height="32" rx="6" fill="#1d3257" />
      <path d="M5 20c4-6 7-6 11 0s7 6 11 0" fill="none" stroke="#45b394" strokeWidth="3" strokeLinecap="round" />
    </svg>
  );
}
