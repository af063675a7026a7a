// American (RETMA) type numbers: the leading number gives the heater voltage, letters are a serial, the final
// digit counts the useful elements; suffixes G (glass ST bulb), GT (glass T-9 bulb), A/B/C (improved), W (ruggedised).
// Source for the scheme: a collector's tube-numbering page (RETMA numbers). Figures per type: recalled from valve
// data handbooks and marked 'from memory' until checked against the type's published data.
import type { DataConfidence } from './valve-data';

export interface AmericanValveData {
  description: string;
  heaterVolts: number;
  heaterAmps: number;
  base: string;
  /** Common European types with the same ratings (European valve type code). */
  equivalents: string[];
  maxAnodeWatts?: number;
  maxDcAmps?: number;
  confidence: DataConfidence;
  source: string;
}

const MEMORY = 'valve data handbook figures recalled, not checked against published data';
const OCTAL = 'international octal';
const B7G = 'miniature (B7G)';
const NOVAL = 'noval (B9A)';

export const AMERICAN_VALVES: Readonly<Record<string, AmericanValveData>> = {
  '6V6': {
    description: 'beam power output valve',
    heaterVolts: 6.3,
    heaterAmps: 0.45,
    base: OCTAL,
    equivalents: [],
    maxAnodeWatts: 12,
    confidence: 'from memory',
    source: MEMORY,
  },
  '6AQ5': {
    description: 'beam power output valve (miniature 6V6)',
    heaterVolts: 6.3,
    heaterAmps: 0.45,
    base: B7G,
    equivalents: ['EL90'],
    maxAnodeWatts: 12,
    confidence: 'from memory',
    source: MEMORY,
  },
  '6BQ5': {
    description: 'output pentode',
    heaterVolts: 6.3,
    heaterAmps: 0.76,
    base: NOVAL,
    equivalents: ['EL84'],
    maxAnodeWatts: 12,
    confidence: 'published',
    source: 'two encyclopedia articles (EL84 = 6BQ5)',
  },
  '6X4': {
    description: 'full-wave rectifier',
    heaterVolts: 6.3,
    heaterAmps: 0.6,
    base: B7G,
    equivalents: ['EZ90'],
    confidence: 'mixed',
    source: 'heater from a 6X4 data sheet scan; equivalent from memory',
  },
  '5Y3': {
    description: 'directly heated full-wave rectifier',
    heaterVolts: 5,
    heaterAmps: 2,
    base: OCTAL,
    equivalents: [],
    maxDcAmps: 0.125,
    confidence: 'from memory',
    source: MEMORY,
  },
  '12AX7': {
    description: 'high-µ double triode; 12.6 V 0.15 A in series or 6.3 V 0.3 A parallel',
    heaterVolts: 12.6,
    heaterAmps: 0.15,
    base: NOVAL,
    equivalents: ['ECC83'],
    confidence: 'published',
    source: "encyclopedia article citing a maker's data sheet",
  },
  '12AT7': {
    description: 'high-frequency double triode',
    heaterVolts: 12.6,
    heaterAmps: 0.15,
    base: NOVAL,
    equivalents: ['ECC81'],
    confidence: 'from memory',
    source: MEMORY,
  },
  '12AU7': {
    description: 'medium-µ double triode',
    heaterVolts: 12.6,
    heaterAmps: 0.15,
    base: NOVAL,
    equivalents: ['ECC82'],
    confidence: 'from memory',
    source: MEMORY,
  },
  '12BE6': {
    description: 'pentagrid frequency changer',
    heaterVolts: 12.6,
    heaterAmps: 0.15,
    base: B7G,
    equivalents: ['HK90'],
    confidence: 'from memory',
    source: MEMORY,
  },
  '12BA6': {
    description: 'variable-µ IF pentode',
    heaterVolts: 12.6,
    heaterAmps: 0.15,
    base: B7G,
    equivalents: ['HF93'],
    confidence: 'from memory',
    source: MEMORY,
  },
  '12AV6': {
    description: 'double diode and high-µ triode',
    heaterVolts: 12.6,
    heaterAmps: 0.15,
    base: B7G,
    equivalents: ['HBC91'],
    confidence: 'from memory',
    source: MEMORY,
  },
  '50C5': {
    description: 'beam power output valve for series strings',
    heaterVolts: 50,
    heaterAmps: 0.15,
    base: B7G,
    equivalents: ['HL92'],
    maxAnodeWatts: 5.5,
    confidence: 'from memory',
    source: MEMORY,
  },
  '35W4': {
    description: 'half-wave rectifier for series strings, tapped heater for a dial lamp',
    heaterVolts: 35,
    heaterAmps: 0.15,
    base: B7G,
    equivalents: ['HY90'],
    maxDcAmps: 0.1,
    confidence: 'from memory',
    source: MEMORY,
  },
  '35Z5': {
    description: 'half-wave rectifier for series strings (octal)',
    heaterVolts: 35,
    heaterAmps: 0.15,
    base: OCTAL,
    equivalents: [],
    maxDcAmps: 0.1,
    confidence: 'from memory',
    source: MEMORY,
  },
  '50L6': {
    description: 'beam power output valve for series strings (octal)',
    heaterVolts: 50,
    heaterAmps: 0.15,
    base: OCTAL,
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  '6AQ8': {
    description: 'VHF double triode',
    heaterVolts: 6.3,
    heaterAmps: 0.435,
    base: NOVAL,
    equivalents: ['ECC85'],
    confidence: 'from memory',
    source: MEMORY,
  },
  '6AJ8': {
    description: 'triode-heptode frequency changer',
    heaterVolts: 6.3,
    heaterAmps: 0.3,
    base: NOVAL,
    equivalents: ['ECH81'],
    confidence: 'mixed',
    source: 'equivalence from a valve data site; heater from memory',
  },
  '6AK8': {
    description: 'triple diode and triode',
    heaterVolts: 6.3,
    heaterAmps: 0.45,
    base: NOVAL,
    equivalents: ['EABC80'],
    confidence: 'from memory',
    source: MEMORY,
  },
  '6V4': {
    description: 'full-wave rectifier',
    heaterVolts: 6.3,
    heaterAmps: 0.6,
    base: NOVAL,
    equivalents: ['EZ80'],
    confidence: 'mixed',
    source: 'equivalence from a valve data site; heater from memory',
  },
};

/** Heater voltage named by an American type's leading number: 6 → 6.3 V, 12 → 12.6 V, 7 and 14 (loctal) → 6.3 and 12.6 V. */
export function americanHeaterVolts(leading: number): number | undefined {
  const table: Record<number, number> = { 1: 1.4, 2: 2.5, 3: 3.15, 5: 5, 6: 6.3, 7: 6.3, 12: 12.6, 14: 12.6 };
  if (leading === 0) return undefined; // cold cathode: no heater
  return table[leading] ?? leading;
}

/** Bulb and construction said by a suffix: G glass ST bulb, GT glass T-9 bulb, A/B/C an improved version, W ruggedised. */
export function americanSuffixWords(suffix: string): string[] {
  const words: string[] = [];
  if (suffix.startsWith('GT')) words.push('glass T-9 bulb (GT)');
  else if (suffix.startsWith('G')) words.push('glass ST bulb (G)');
  if (/[ABC]$/.test(suffix)) words.push(`improved version (${suffix.slice(-1)})`);
  if (suffix.includes('W')) words.push('ruggedised (W)');
  return words;
}

/** Splits an American type number: "6V6GT" → { leading 6, core "6V6", suffix "GT" }; undefined when it is not one. */
export function splitAmericanName(text: string): { leading: number; core: string; suffix: string } | undefined {
  const match = /^(\d{1,3})([A-Z]{1,3})(\d{1,2})((?:GT|G)?(?:[ABC])?W?)$/.exec(text);
  if (match === null) return undefined;
  const [, leading = '', letters = '', digits = '', suffix = ''] = match;
  return { leading: Number(leading), core: `${leading}${letters}${digits}`, suffix };
}
