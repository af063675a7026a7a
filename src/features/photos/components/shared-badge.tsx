/** Marks a photo the owner can see: an open-eye glyph and the word, never colour alone. */
export function SharedBadge({ className = '' }: { className?: string }) {
  return (
    <span
      className={`inline-flex items-center gap-1 rounded-full border border-rule bg-panel/90 px-2 py-0.5 text-xs font-semibold text-ink ${className}`}
    >
      <svg
        aria-hidden="true"
        viewBox="0 0 16 16"
        className="h-3.5 w-3.5"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.6"
      >
        <path d="M1.5 8S4 3.5 8 3.5 14.5 8 14.5 8 12 12.5 8 12.5 1.5 8 1.5 8Z" strokeLinejoin="round" />
        <circle cx="8" cy="8" r="2" />
      </svg>
      Shared
    </span>
  );
}
