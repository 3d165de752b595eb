/** Stopwright's mark: four pipe bodies of falling height standing on a brass toe board. */
export function Logo({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="6" fill="#1d2433" />
      <g fill="none" stroke="#e9d9b3" strokeWidth="2" strokeLinecap="round">
        <path d="M8 26V6" />
        <path d="M13 26V10" />
        <path d="M18 26V14" />
        <path d="M23 26V17" />
      </g>
      <path d="M5 26h22" stroke="#b0852f" strokeWidth="2.5" strokeLinecap="round" />
    </svg>
  );
}

export function Wordmark() {
  return (
    <span className="flex items-center gap-2">
      <Logo />
      <span className="font-serif text-lg font-semibold tracking-tight text-ink">Stopwright</span>
    </span>
  );
}
