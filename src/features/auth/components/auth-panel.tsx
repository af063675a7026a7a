import type { ReactNode } from 'react';
import { Logo } from '../../../components/logo';

/** The calm frame around the sign-in, sign-up and reset forms. */
export function AuthPanel({ title, intro, children }: { title: string; intro?: ReactNode; children: ReactNode }) {
  return (
    <div className="mx-auto w-full max-w-md py-6">
      <div className="mb-5 flex items-center gap-3">
        <Logo className="h-10 w-10" />
        <h1 className="text-2xl font-bold">{title}</h1>
      </div>
      {intro && <div className="mb-4 text-ink-soft">{intro}</div>}
      <div className="rounded-xl border border-rule bg-panel p-5 shadow-sm">{children}</div>
    </div>
  );
}
