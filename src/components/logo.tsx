/** Gridleak's mark: a valve envelope with its grid, and the leak to ground. */
export function Logo({ className = 'h-8 w-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="7" className="fill-bakelite" />
      <path d="M16 4a9 9 0 0 1 9 9v13H7V13a9 9 0 0 1 9-9Z" fill="none" stroke="#f2a03d" strokeWidth="2.2" />
      <path d="M10 15h12M10 19h12" stroke="#f2a03d" strokeWidth="1.6" strokeDasharray="2 2" />
      <circle cx="16" cy="24" r="1.8" fill="#f2a03d" />
    </svg>
  );
}
