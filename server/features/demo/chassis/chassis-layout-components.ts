import { ifTag, pin, tag } from './chassis-layout-underside';
import type { ElectrolyticSpec, ResistorSpec, WaxCapSpec } from './chassis-parts-underside';
import type { Pt } from './svg-kit';

/**
 * The small parts under the chassis, each between two solder points. These specs
 * are the single source for both the drawing and the landmarks.
 */

/** Solder lugs riveted to the chassis, used as earth points. */
export const LUGS: Record<'E1' | 'E2' | 'E3' | 'E4', Pt> = {
  E1: [262, 1112],
  E2: [1900, 1330],
  E3: [760, 1196],
  E4: [680, 1250],
};

/** Stator tags of the tuning gang, poking through the chassis. */
export const GANG_TAGS: readonly Pt[] = [
  [1700, 915],
  [1820, 915],
  [1940, 915],
  [2030, 915],
];

export type Ref = { ref: string; note?: string };

export const RESISTORS: readonly (ResistorSpec & Ref)[] = [
  { ref: 'R29', note: 'EL84 cathode, 150 Ω 1 W', ohms: 150, watts: 1, a: tag('TS1', 0), b: tag('TS1', 3), lift: -62 },
  { ref: 'R28', note: 'EL84 grid leak, 470 kΩ, drifted high', ohms: 470e3, a: pin('V5', 2), b: tag('TS1', 6) },
  { ref: 'R8', note: 'EBF89 screen feed', ohms: 47e3, a: pin('V3', 6), b: tag('TS1', 1) },
  { ref: 'R12', note: 'EABC80 anode load', ohms: 220e3, a: tag('TS3', 1), b: pin('V4', 6) },
  { ref: 'R13', note: 'EABC80 grid leak', ohms: 1e6, a: tag('TS3', 4), b: LUGS.E3 },
  { ref: 'R6', note: 'ECF80 pentode anode decoupling', ohms: 2.2e3, a: tag('TS2', 0), b: tag('TS2', 2), lift: -55 },
  { ref: 'R1', note: 'ECF80 pentode grid leak', ohms: 1e6, a: pin('V2', 3), b: tag('TS2', 4) },
  { ref: 'R15', note: 'ECC81 anode load', ohms: 10e3, a: tag('TS4', 0), b: pin('V1', 3) },
  { ref: 'R16', note: 'ECC81 grid leak', ohms: 470e3, a: tag('TS4', 3), b: pin('V1', 8), tolerance: 0.1 },
  { ref: 'R18', note: 'oscillator grid', ohms: 100e3, a: tag('TS5', 0), b: tag('TS5', 2), lift: -52 },
  { ref: 'R19', note: 'oscillator anode feed', ohms: 4.7e3, a: tag('TS5', 3), b: tag('TS5', 5), lift: -52 },
];

export const WAX_CAPS: readonly (WaxCapSpec & Ref)[] = [
  {
    ref: 'C27',
    note: 'EABC80 anode to EL84 grid coupling, 0,022 µF 350 V, leaky',
    print: '0,022µ 350V',
    a: tag('TS1', 4),
    b: pin('V5', 2),
    len: 140,
    weeping: true,
  },
  { ref: 'C14', print: '0,05µF 500V', a: tag('TS1', 7), b: pin('V2', 1) },
  { ref: 'C12', print: '0,01µF 750V', a: LUGS.E1, b: tag('TS3', 0), colour: '#c9a15a' },
  { ref: 'C23', print: '0,1µF 350V', a: tag('TS4', 4), b: GANG_TAGS[3] ?? [0, 0], colour: '#b98e4e', len: 140 },
];

export const MICAS: readonly (Ref & { a: Pt; b: Pt; print: string })[] = [
  { ref: 'C9', print: '100 pF', a: pin('V2', 6), b: tag('TS2', 3) },
  { ref: 'C17', print: '220 pF', a: ifTag(0, 3), b: pin('V3', 9) },
];

export const CERAMICS: readonly (Ref & { a: Pt; b: Pt; print: string; lift?: number })[] = [
  { ref: 'C22', print: '47p', a: tag('TS4', 2), b: pin('V1', 9) },
  { ref: 'C25', print: '4n7', a: tag('TS5', 1), b: tag('TS5', 4), lift: -112 },
];

/** C26, the EL84's cathode bypass, and C30, the HT filter: both test sound. */
export const ELECTROLYTICS: readonly (ElectrolyticSpec & Ref)[] = [
  {
    ref: 'C26',
    note: 'EL84 cathode bypass 25 µF 25 V',
    lines: ['25µF', '25V'],
    len: 84,
    dia: 32,
    a: tag('TS1', 0),
    b: tag('TS1', 3),
    lift: -135,
    sleeve: '#6b2a1e',
  },
  {
    ref: 'C30',
    note: '32 µF 350 V HT filter',
    lines: ['32µF', '350V ~ +70°C'],
    len: 210,
    dia: 64,
    a: LUGS.E4,
    b: [990, 1250],
    clip: true,
  },
];

/** A rubber-insulated lead from the mains transformer to the rectifier, perished and split open. */
export const CRACKED_LEAD = {
  before: [
    [605, 740],
    [636, 690],
    [672, 630],
  ] as Pt[],
  gap: [
    [690, 598],
    [724, 541],
  ] as [Pt, Pt],
  after: [
    [744, 506],
    [800, 466],
    [888, 440],
  ] as Pt[],
};
