import type { ReactNode } from 'react';
import { Button } from './button';

export function Loading({ label }: { label: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 py-10 text-ink-soft">
      <span className="h-3 w-3 animate-pulse rounded-full bg-glow" aria-hidden="true" />
      {label}
    </div>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-xl border border-dashed border-rule bg-panel px-6 py-10 text-center">
      <p className="text-lg font-semibold">{title}</p>
      {children && <div className="mt-2 text-ink-soft">{children}</div>}
    </div>
  );
}

export function ErrorState({ error, onRetry }: { error: unknown; onRetry?: () => void }) {
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  return (
    <div role="alert" className="rounded-xl border border-danger/40 bg-danger-soft px-5 py-4 text-ink">
      <p className="font-semibold text-danger">That did not load.</p>
      <p className="mt-1">{message}</p>
      {onRetry && (
        <Button variant="quiet" className="mt-3" onClick={onRetry}>
          Try again
        </Button>
      )}
    </div>
  );
}
