import { parseQuantity } from './quantity-parse';

/** Where a capacitor meets the mains: across the line (X class) or line to chassis/earth (Y class). */
export type MainsPosition = 'none' | 'across-line' | 'line-to-chassis';

export interface PartWarning {
  level: 'danger' | 'caution';
  message: string;
}

const CAPACITANCE = /(\d+(?:\.\d+)?\s*[pnuµμm]\s*F?|\d+[pnuµμ]\d+|\d+(?:\.\d+)?\s*F)(?![a-z])/i;
const VOLTAGE = /(\d+(?:\.\d+)?)\s*V\b/i;

/** Capacitance (F) and voltage (V) read from a rating as people write it: "50µF 350V", "0.047 µF 600 V", "32u/450", "4n7". */
export function readRating(text: string): { farads?: number; volts?: number } {
  const out: { farads?: number; volts?: number } = {};
  const c = CAPACITANCE.exec(text);
  if (c) {
    try {
      out.farads = parseQuantity(c[1]!.replace(/\s+/g, ''), { expectUnit: 'F' }).value;
    } catch {
      // Not a value after all ("5 F" in a part name, say): leave it out.
    }
  }
  const v = VOLTAGE.exec(text) ?? (c ? /\/\s*(\d+(?:\.\d+)?)\b/.exec(text.slice(c.index)) : null);
  if (v) out.volts = Number(v[1]);
  return out;
}

const safetyClass = (text: string) => /\b(X1|X2|Y1|Y2|Y4)\b/i.exec(text)?.[1]?.toUpperCase();

/**
 * Flags unsafe or doubtful replacements: a lower voltage rating than the original (never lower it,
 * trade practice), an electrolytic far from the original value (outside −20 %/+50 %, the usual
 * electrolytic tolerance, IEC 60062 letter S), and a capacitor on the mains without the right
 * safety class (IEC 60384-14: X across the line, Y line to chassis; Y may replace X, never X in a Y position).
 */
export function partWarnings(part: {
  original: string;
  replacement: string;
  mainsPosition?: MainsPosition;
}): PartWarning[] {
  const warnings: PartWarning[] = [];
  const was = readRating(part.original);
  const now = readRating(part.replacement);
  const cls = safetyClass(part.replacement);
  // A safety class carries an AC mains rating, not comparable with an old part's DC working voltage.
  if (was.volts && now.volts && now.volts < was.volts && !cls)
    warnings.push({ level: 'danger', message: `Rated ${now.volts} V, below the original's ${was.volts} V: never lower the voltage rating.` });
  if (was.farads && now.farads && was.farads >= 1e-6) {
    const ratio = now.farads / was.farads;
    if (ratio < 0.8 || ratio > 1.5)
      warnings.push({
        level: 'caution',
        message: `${+(ratio * 100 - 100).toFixed(0)} % from the original capacitance; an electrolytic usually stays within −20 %/+50 % (a much larger reservoir strains the rectifier).`,
      });
  }
  const position = part.mainsPosition ?? 'none';
  if (position === 'across-line' && !cls)
    warnings.push({ level: 'danger', message: 'Across the mains this must be an X-class (or Y-class) safety capacitor; none is named.' });
  if (position === 'line-to-chassis' && !cls?.startsWith('Y'))
    warnings.push({ level: 'danger', message: `From the mains to the chassis this must be a Y-class safety capacitor${cls ? `, not ${cls}` : ''}.` });
  return warnings;
}
