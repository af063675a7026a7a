import type { Pt } from './svg-kit';

/**
 * Where everything sits on the top view, in picture pixels (2400 × 1600). The
 * drawing and the landmarks both read these numbers, so pins land exactly.
 * Scale: about 5.3 px per millimetre; the rear apron is at the top of the picture.
 */

export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

export const CHASSIS: Box = { x: 150, y: 190, w: 2100, h: 1200 };

export type ValveRef = 'V1' | 'V2' | 'V3' | 'V4' | 'V5' | 'V6' | 'V7';

export interface ValvePlace {
  ref: ValveRef;
  type: string;
  role: string;
  /** Centre as seen from above. */
  at: Pt;
  /** Which way the printing faces, degrees. */
  turn: number;
  /** Direction of the socket's fixing plate, degrees (default: across the printing). */
  plate?: number;
}

/** Glass radius of a noval valve (22 mm across). */
export const VALVE_R = 57;

export const VALVES: readonly ValvePlace[] = [
  { ref: 'V1', type: 'ECC81', role: 'FM RF amplifier and mixer', at: [470, 620], turn: -12 },
  { ref: 'V2', type: 'ECF80', role: 'frequency changer (triode oscillator, pentode mixer)', at: [900, 1050], turn: 8 },
  { ref: 'V3', type: 'EBF89', role: 'IF amplifier and AVC diodes', at: [1340, 1050], turn: -25 },
  { ref: 'V4', type: 'EABC80', role: 'detectors and AF amplifier', at: [1790, 1080], turn: 15 },
  { ref: 'V5', type: 'EL84', role: 'output pentode', at: [1130, 460], turn: -6 },
  { ref: 'V6', type: 'EM84', role: 'tuning indicator', at: [1300, 1290], turn: 20, plate: 0 },
  { ref: 'V7', type: 'EZ81', role: 'HT rectifier', at: [1470, 400], turn: 4 },
];

export function valve(ref: ValveRef): ValvePlace {
  const v = VALVES.find((x) => x.ref === ref);
  if (!v) throw new Error(`no valve ${ref}`);
  return v;
}

export const TOP = {
  mainsTransformer: { cx: 1990, cy: 500, w: 400, h: 330 },
  outputTransformer: { cx: 820, cy: 470, w: 250, h: 190 },
  canCapacitor: { at: [1490, 720] as Pt, r: 90 },
  ifCans: [
    { ref: 'IF1', at: [1120, 1050] as Pt, size: 140 },
    { ref: 'IF2', at: [1560, 1050] as Pt, size: 140 },
  ],
  gang: { x: 340, y: 885, w: 420, h: 280 },
  drum: { x: 250, y: 935, w: 60, h: 180 },
  dialPulley: { at: [258, 1312] as Pt, r: 36 },
  ferriteRod: { x1: 240, x2: 600, y: 290 },
  voltageSelector: { at: [2060, 880] as Pt, r: 68 },
  /** A bare patch of chassis, kept clear of parts and wires. */
  plainSpot: [1030, 760] as Pt,
} as const;
