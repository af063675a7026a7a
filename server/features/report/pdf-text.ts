import { createRequire } from 'node:module';
import path from 'node:path';
import * as fontkit from 'fontkit';
import { readFileSync } from 'node:fs';

const require = createRequire(import.meta.url);
const fontFile = (pkg: string, file: string) =>
  path.join(path.dirname(require.resolve(`${pkg}/package.json`)), 'files', file);

/**
 * Fonts ship with the app: Atkinson Hyperlegible Next for the text (as on screen), with Noto Sans
 * filling in the signs it lacks (µ, Ω). Each run of text goes to the first font that has every glyph.
 */
export const FONTS = {
  body: fontFile('@fontsource/atkinson-hyperlegible-next', 'atkinson-hyperlegible-next-latin-400-normal.woff'),
  bold: fontFile('@fontsource/atkinson-hyperlegible-next', 'atkinson-hyperlegible-next-latin-700-normal.woff'),
  fallbackLatin: fontFile('@fontsource/noto-sans', 'noto-sans-latin-400-normal.woff'),
  fallbackGreek: fontFile('@fontsource/noto-sans', 'noto-sans-greek-400-normal.woff'),
} as const;

type FontName = keyof typeof FONTS;
const glyphs = new Map<FontName, { hasGlyphForCodePoint(cp: number): boolean }>();
const load = (name: FontName) => {
  if (!glyphs.has(name)) glyphs.set(name, fontkit.create(readFileSync(FONTS[name])) as never);
  return glyphs.get(name)!;
};

// Signs none of the fonts carry, written the way a person would.
const SUBSTITUTES: Record<string, string> = { '→': '->', '✓': '', '✕': 'x', '◐': '~', '≈': '~', '≤': '<=', '≥': '>=' };

/** Splits text into runs, each with the first font (primary, then fallbacks) that can draw it. */
export function fontRuns(text: string, primary: 'body' | 'bold' = 'body'): { font: FontName; text: string }[] {
  const order: FontName[] = [primary, 'fallbackLatin', 'fallbackGreek'];
  const runs: { font: FontName; text: string }[] = [];
  for (const raw of text) {
    const ch = SUBSTITUTES[raw] ?? raw;
    for (const c of ch) {
      const cp = c.codePointAt(0)!;
      const font =
        c === '\n' || c === ' '
          ? (runs.at(-1)?.font ?? primary)
          : (order.find((f) => load(f).hasGlyphForCodePoint(cp)) ?? primary);
      const last = runs.at(-1);
      if (last && last.font === font) last.text += c;
      else runs.push({ font, text: c });
    }
  }
  return runs;
}
