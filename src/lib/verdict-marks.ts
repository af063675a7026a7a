import type { Measurement } from '../../shared/schemas/measurements';

export type Verdict = Measurement['verdict'];

/**
 * Never colour alone: every verdict has a glyph and a word, and on the plot a shape of its own.
 * Colours are the app's own theme tokens from src/styles.css (ok, glow, danger), chosen for the product's
 * paper-and-bakelite look, not taken from a published palette; the glyph and word carry the meaning.
 */
export const verdictMarks: Record<Verdict, { glyph: string; word: string; tone: string; svg: string }> = {
  within: { glyph: '✓', word: 'within', tone: 'border-ok text-ok', svg: 'fill-ok stroke-ok' },
  marginal: { glyph: '◐', word: 'marginal', tone: 'border-glow text-glow-strong', svg: 'fill-glow stroke-glow-strong' },
  out: { glyph: '✕', word: 'out', tone: 'border-danger text-danger', svg: 'fill-danger stroke-danger' },
  unknown: { glyph: '?', word: 'unknown', tone: 'border-rule text-ink-soft', svg: 'fill-ink-soft stroke-ink-soft' },
};
