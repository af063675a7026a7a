import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'quiet' | 'danger';

const styles: Record<Variant, string> = {
  primary: 'bg-glow text-white hover:bg-glow-strong dark:text-bakelite shadow-sm',
  quiet: 'bg-panel text-ink border border-rule hover:bg-sunken',
  danger: 'bg-danger text-white hover:opacity-90',
};

export function buttonClass(variant: Variant = 'primary', extra = ''): string {
  return `inline-flex min-h-11 items-center justify-center gap-2 rounded-lg px-4 py-2 font-semibold transition-colors disabled:cursor-not-allowed disabled:opacity-60 ${styles[variant]} ${extra}`;
}

export function Button({
  variant = 'primary',
  className = '',
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return <button type="button" className={buttonClass(variant, className)} {...props} />;
}
