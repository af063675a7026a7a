import { parseQuantity } from './quantity-parse';

/** Where a capacitor meets the mains: across the line (X class) or line to chassis/earth (Y class). */
export type MainsPosition = 'none' | 'across-line' | 'line-to-chassis';

export interface PartWarning {
  level: 'danger' | 'caution';
  message: string;
}

// A capacitance as marked: "32µF", "0.1 mfd", "8 MF" (old American: microfarads), "47UF", "100 mmfd", "4n7", "32u".
const CAPACITANCE =
  /(?<![\w.])(\d+[pnuµμ]\d+(?:\s*f)?(?![a-z])|\d+(?:\.\d+)?\s*(?:mmfd|mfd|mmf|mf|[pnuµμ]f?)(?![a-z\d]))/i;
// A voltage rating as marked: "450 V", "400 VDC", "250 WV", "350 WVDC", "250 VAC", "1 kV", "1.6 kV".
const VOLTAGE = /(?<![\w.])(\d+(?:\.\d+)?)\s*(k)?\s*(V\s*(?:DC|AC|RMS|W)?|WV(?:DC)?|DCWV)(?![a-z])/i;

/**
 * Capacitance (F) and voltage (V) read from a rating as people write it: "32µF 350V", "0.047 µF 600 V", "32u/450",
 * "4n7", "0.1 mfd 400 VDC", "8 MF 350 WV", "0.01 µF 1 kV"; `ac` is set when the voltage is marked as AC.
 */
export function readRating(text: string): { farads?: number; volts?: number; ac?: boolean } {
  const out: { farads?: number; volts?: number; ac?: boolean } = {};
  const c = CAPACITANCE.exec(text);
  if (c) {
    try {
      out.farads = parseQuantity(c[1]!.replace(/\s+/g, ''), { expectUnit: 'F' }).value;
    } catch {
      // Not a value after all ("5 F" in a part name, say): leave it out.
    }
  }
  const v = VOLTAGE.exec(text);
  if (v) {
    out.volts = Number(v[1]) * (v[2] ? 1000 : 1);
    if (/AC/i.test(v[3] ?? '')) out.ac = true;
  } else {
    const slash = c ? /\/\s*(\d+(?:\.\d+)?)\b/.exec(text.slice(c.index)) : null;
    if (slash) out.volts = Number(slash[1]);
  }
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
    warnings.push({
      level: 'danger',
      message: `Rated ${now.volts} V${now.ac ? ' AC' : ''}, below the original's ${was.volts} V${was.ac ? ' AC' : ''}: never lower the voltage rating.`,
    });
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
    warnings.push({
      level: 'danger',
      message: 'Across the mains this must be an X-class (or Y-class) safety capacitor; none is named.',
    });
  if (position === 'line-to-chassis' && !cls?.startsWith('Y'))
    warnings.push({
      level: 'danger',
      message: `From the mains to the chassis this must be a Y-class safety capacitor${cls ? `, not ${cls}` : ''}.`,
    });
  return warnings;
}
