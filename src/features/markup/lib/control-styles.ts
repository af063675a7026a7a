/** The canvas's compact controls: at least 44 px square for a finger, the pressed one lit in the accent. */
export const controlClass =
  'inline-flex min-h-11 min-w-11 items-center justify-center gap-1.5 rounded-lg px-2.5 text-sm font-semibold text-ink hover:bg-sunken aria-pressed:bg-glow-soft aria-pressed:text-glow-strong aria-pressed:ring-2 aria-pressed:ring-glow aria-expanded:bg-sunken disabled:cursor-not-allowed disabled:opacity-50';

/** A panel floating over the stage (legend, shortcut help). */
export const floatingPanelClass =
  'absolute top-2 right-2 z-10 max-h-[calc(100%-1rem)] w-[min(22rem,calc(100%-1rem))] overflow-y-auto rounded-xl border border-rule bg-panel p-4 text-ink shadow-lg';
