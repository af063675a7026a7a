import type { ReactNode } from 'react';

const looks = {
  /** A strip down the left edge: cautions beside a form or a list. */
  strip: 'rounded-lg border-l-4 border-danger bg-danger-soft px-3 py-2 text-ink',
  /** Bordered all round: the caution that must not be missed (a live chassis, a recap). */
  box: 'rounded-xl border-2 border-danger bg-danger-soft px-4 py-3 text-ink',
};

/**
 * A safety caution, the one red box for every warning the product gives before someone measures, powers up or
 * replaces. Its content is paragraphs (or a list), led by `CautionLead`; `className` adds spacing or text size.
 */
export function Caution({
  look = 'strip',
  role = 'note',
  label,
  className = '',
  children,
}: {
  look?: keyof typeof looks;
  role?: 'note' | 'alert';
  label?: string;
  className?: string;
  children: ReactNode;
}) {
  return (
    <div role={role} aria-label={label} className={`${looks[look]} ${className}`}>
      {children}
    </div>
  );
}

/** The caution's first words in red, after a warning sign that screen readers skip. */
export function CautionLead({ children, className = '' }: { children: ReactNode; className?: string }) {
  return (
    <strong className={`text-danger ${className}`}>
      <span aria-hidden="true">⚠ </span>
      {children}
    </strong>
  );
}
