// Bellows' mark: a folded bellows between two plates with a bubble of gas
// at its heart. Drawn here so the app needs no image request.
export function Logo({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="7" fill="#1d2a3a" />
      <path d="M9 7h14M9 25h14" stroke="#f7f8f6" strokeWidth="2.2" strokeLinecap="round" />
      <path
        d="M11 7l-3 3 3 3-3 3 3 3-3 3 3 3M21 7l3 3-3 3 3 3-3 3 3 3-3 3"
        fill="none"
        stroke="#b4652b"
        strokeWidth="2"
        strokeLinejoin="round"
      />
      <circle cx="16" cy="16" r="2.2" fill="#f7f8f6" />
    </svg>
  );
}

export function Wordmark() {
  return (
    <span className="flex items-center gap-2 font-semibold tracking-tight text-ink">
      <Logo />
      <span className="text-lg">Bellows</span>
    </span>
  );
}
