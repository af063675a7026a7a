import { CRACKED_LEAD, ELECTROLYTICS, RESISTORS, WAX_CAPS } from './chassis-layout-components';
import type { Ref } from './chassis-layout-components';
import type { FilmCapSpec, ModernElectrolyticSpec } from './chassis-parts-replacements';
import type { ElectrolyticSpec, ResistorSpec, WaxCapSpec } from './chassis-parts-underside';
import { midpoint } from './svg-kit';
import type { Pt } from './svg-kit';

/**
 * The Meridian 54 radiogram as found ('before') and after the work ('after'). Every part of
 * the after state is soldered to the same points as the one it replaces: a refit
 * may change only how a part looks, so the landmarks hold for both pictures.
 */

export type ChassisState = 'before' | 'after';

/** What a refit may change: anything but where the part is soldered. */
type Refit<T> = Partial<Omit<T, 'a' | 'b' | 'lift'>>;

/** R28, the output grid leak that had drifted high, gets a new 470 kΩ metal-film part. */
const RESISTOR_REFITS: Readonly<Record<string, Refit<ResistorSpec>>> = {
  R28: { fresh: true, body: '#a9c4d6' },
};

/** Wax tubulars swapped for film at no lower a voltage, the one from the mains to chassis for a Y2 safety part; the rest are restuffed and resealed. */
const FILM_REFITS: Readonly<Record<string, Omit<FilmCapSpec, 'a' | 'b' | 'lift'>>> = {
  C27: { print: ['22nJ', '630V'], len: 100, dia: 26, colour: '#d94a2a' },
  C14: { print: ['47nJ', '630V'] },
  C12: { print: ['10n Y2', '300V~'], len: 100, dia: 28, colour: '#79a9dc' },
};

/** The electrolytics tested sound and stay as they are. */
const ELECTROLYTIC_REFITS: Readonly<Record<string, Refit<ElectrolyticSpec>>> = {};
const NEW_ELECTROLYTICS: Readonly<Record<string, Omit<ModernElectrolyticSpec, 'a' | 'b' | 'lift' | 'len' | 'dia'>>> =
  {};

export interface UndersideParts {
  resistors: readonly (ResistorSpec & Ref)[];
  waxCaps: readonly (WaxCapSpec & Ref)[];
  films: readonly (FilmCapSpec & Ref)[];
  electrolytics: readonly (ElectrolyticSpec & Ref)[];
  newElectrolytics: readonly (ModernElectrolyticSpec & Ref)[];
}

interface Placed extends Ref {
  a: Pt;
  b: Pt;
  lift?: number;
}

/** The solder points of a part as laid out, with its reference. */
function spot(p: Placed): Placed {
  return { ref: p.ref, note: p.note, a: p.a, b: p.b, lift: p.lift };
}

/** The small parts under the chassis in a given state. */
export function undersideParts(state: ChassisState): UndersideParts {
  if (state === 'before') {
    return { resistors: RESISTORS, waxCaps: WAX_CAPS, films: [], electrolytics: ELECTROLYTICS, newElectrolytics: [] };
  }
  const films = WAX_CAPS.flatMap((c) => {
    const refit = FILM_REFITS[c.ref];
    return refit ? [{ ...refit, ...spot(c) }] : [];
  });
  const newElectrolytics = ELECTROLYTICS.flatMap((e) => {
    const refit = NEW_ELECTROLYTICS[e.ref];
    return refit ? [{ ...refit, len: e.len, dia: e.dia, ...spot(e) }] : [];
  });
  return {
    resistors: RESISTORS.map((r) => ({ ...r, ...RESISTOR_REFITS[r.ref], ...spot(r) })),
    waxCaps: WAX_CAPS.filter((c) => !FILM_REFITS[c.ref]).map((c) => ({ ...c, resealed: true })),
    films,
    electrolytics: ELECTROLYTICS.filter((e) => !NEW_ELECTROLYTICS[e.ref]).map((e) => ({
      ...e,
      ...ELECTROLYTIC_REFITS[e.ref],
      ...spot(e),
    })),
    newElectrolytics,
  };
}

/**
 * The new PVC lead along the perished one's route, grommet to V7, dressed in one easy
 * curve: through the middle of the old split (the landmark) and on to the same tag.
 */
export const HT_LEAD_ROUTE: readonly Pt[] = [
  CRACKED_LEAD.before[0] ?? [605, 740],
  CRACKED_LEAD.before[2] ?? [672, 630],
  midpoint(...CRACKED_LEAD.gap),
  CRACKED_LEAD.after[1] ?? [800, 466],
  CRACKED_LEAD.after[2] ?? [888, 440],
];

/** Where the restorer's iron has been: every solder point of a refitted part, and the new lead's end. */
export function freshJoints(state: ChassisState): Pt[] {
  if (state === 'before') return [];
  const p = undersideParts('after');
  const refitted = [
    ...p.resistors.filter((r) => r.fresh),
    ...p.waxCaps.filter((c) => c.resealed),
    ...p.films,
    ...p.electrolytics.filter((e) => e.restuffed),
    ...p.newElectrolytics,
  ];
  const leadEnd = HT_LEAD_ROUTE[HT_LEAD_ROUTE.length - 1];
  return [...refitted.flatMap((x) => [x.a, x.b]), ...(leadEnd ? [leadEnd] : [])];
}
