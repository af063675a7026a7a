import { CHASSIS, TOP, VALVES } from './chassis-layout-top';
import type { ValveRef } from './chassis-layout-top';
import { novalTag, stripTag } from './chassis-parts-sockets';
import type { TagStripSpec } from './chassis-parts-sockets';
import { WIDTH } from './svg-kit';
import type { Pt } from './svg-kit';

/**
 * The underside view in picture pixels. The chassis is turned over about its
 * front-to-back axis, so every part sits at the mirror image of its top-view
 * position: a socket lies exactly under its valve.
 */

export const flipX = (p: Pt): Pt => [WIDTH - p[0], p[1]];

export const UNDER_CHASSIS = { ...CHASSIS, x: WIDTH - CHASSIS.x - CHASSIS.w };

/** Which way each socket's pin gap points (degrees), chosen so the wiring runs short. */
const SOCKET_TURN: Record<ValveRef, number> = { V1: 150, V2: 250, V3: 40, V4: 300, V5: 12, V6: 290, V7: 100 };

/** Where the maker stamped each socket's reference, clear of the wiring. */
const SOCKET_LABEL: Record<ValveRef, Pt> = {
  V1: [2030, 735],
  V2: [1440, 960],
  V3: [975, 1005],
  V4: [680, 1190],
  V5: [1370, 420],
  V6: [1195, 1215],
  V7: [1075, 450],
};

export const SOCKETS = VALVES.map((v) => ({
  ref: v.ref,
  at: flipX(v.at),
  turn: SOCKET_TURN[v.ref],
  label: SOCKET_LABEL[v.ref],
}));

export function socket(ref: ValveRef): { ref: ValveRef; at: Pt; turn: number } {
  const s = SOCKETS.find((x) => x.ref === ref);
  if (!s) throw new Error(`no socket ${ref}`);
  return s;
}

/** The end of a socket's solder tag: `pin('V5', 3)` is the EL84's cathode. */
export function pin(ref: ValveRef, n: number): Pt {
  const s = socket(ref);
  return novalTag(s.at, s.turn, n);
}

export const STRIPS = {
  TS1: { start: [1130, 780], horizontal: true, count: 8, pitch: 62, side: -1 },
  TS2: { start: [1320, 1262], horizontal: true, count: 5, pitch: 62, side: -1 },
  TS3: { start: [470, 940], horizontal: true, count: 5, pitch: 62, side: 1 },
  TS4: { start: [1745, 540], horizontal: false, count: 5, pitch: 62, side: 1 },
  TS5: { start: [1690, 1290], horizontal: true, count: 6, pitch: 62, side: -1 },
} as const satisfies Record<string, TagStripSpec>;

export function tag(strip: keyof typeof STRIPS, i: number): Pt {
  return stripTag(STRIPS[strip], i);
}

/** Tags of the can electrolytic's base: two sections and the common. */
export function canTag(which: 'A' | 'B' | 'common'): Pt {
  const deg = { A: -30, B: 90, common: 210 }[which];
  const [x, y] = flipX(TOP.canCapacitor.at);
  return [x + Math.cos((deg * Math.PI) / 180) * 45, y + Math.sin((deg * Math.PI) / 180) * 45];
}

/** Tags of an IF can's base, numbered clockwise from top left. */
export function ifTag(index: 0 | 1, n: 0 | 1 | 2 | 3): Pt {
  const can = TOP.ifCans[index];
  if (!can) throw new Error(`no IF can ${index}`);
  const [x, y] = flipX(can.at);
  const d: Pt = (
    [
      [-26, -26],
      [26, -26],
      [26, 26],
      [-26, 26],
    ] as const
  )[n];
  return [x + d[0], y + d[1]];
}

export const UNDER = {
  mainsTransformer: { ...TOP.mainsTransformer, cx: WIDTH - TOP.mainsTransformer.cx },
  outputTransformer: { ...TOP.outputTransformer, cx: WIDTH - TOP.outputTransformer.cx },
  canCapacitor: { at: flipX(TOP.canCapacitor.at), r: TOP.canCapacitor.r },
  ifCans: TOP.ifCans.map((c) => ({ ...c, at: flipX(c.at) })),
  gang: { ...TOP.gang, x: WIDTH - TOP.gang.x - TOP.gang.w },
  voltageSelector: { at: flipX(TOP.voltageSelector.at), r: TOP.voltageSelector.r },
  volume: { at: [430, 1290] as Pt, r: 62 },
  /** Aerial, earth and loudspeaker sockets on the rear wall. */
  rearPanel: { x: 1640, y: 226, w: 330, h: 62 },
  /** FM and AM oscillator coil formers beside the gang. */
  coils: [
    [1760, 1062],
    [1960, 1080],
  ] as Pt[],
  /** The mains flex comes in over the rear wall here and is clamped just inside. */
  mainsEntry: { at: [290, 205] as Pt },
  cordGrip: { at: [292, 268] as Pt, width: 110 },
  /** Grommets where the transformers' leads come through from the top. */
  grommets: {
    secondary: [605, 740] as Pt,
    heaters: [640, 380] as Pt,
    primary: [270, 700] as Pt,
    output: [1480, 608] as Pt,
  },
  /** A bare patch of chassis, kept clear of parts and wires. */
  plainSpot: [2130, 330] as Pt,
} as const;
