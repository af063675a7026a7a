import { circleD, rivet, screwHead, stamp, turnedRectD } from './chassis-parts';
import type { Drawn } from './chassis-parts';
import { f, place } from './svg-kit';
import type { Pt } from './svg-kit';

/** Noval (B9A) socket geometry in picture pixels: nine pins at 36°, one gap. */
export const NOVAL = { body: 60, pinCircle: 32, tagHole: 58, plate: 104 } as const;

/** Angle of a pin (1..9) on a socket whose gap points along `turn` degrees; 0 is the spigot. */
function pinAngle(turn: number, pin: number): number {
  return ((turn + pin * 36) * Math.PI) / 180;
}

/** The hole at the end of a socket's solder tag; pin 0 is the centre spigot's tag. */
export function novalTag(centre: Pt, turn: number, pin: number): Pt {
  if (pin === 0) return [centre[0] + Math.cos(pinAngle(turn, 0)) * 24, centre[1] + Math.sin(pinAngle(turn, 0)) * 24];
  const a = pinAngle(turn, pin);
  return [centre[0] + Math.cos(a) * NOVAL.tagHole, centre[1] + Math.sin(a) * NOVAL.tagHole];
}

/** A noval valve socket from the wiring side, with its reference stamped beside it. */
export function novalSocket(centre: Pt, turn: number, ref: string, labelAt: Pt): Drawn {
  let tags = '';
  for (let pin = 1; pin <= 9; pin++) {
    const deg = turn + pin * 36;
    tags +=
      `<g transform="rotate(${f(deg)})"><circle cx="${NOVAL.pinCircle}" r="7" fill="#120b06"/>` +
      `<path d="M${NOVAL.pinCircle - 4} -6 L${NOVAL.tagHole + 8} -5 Q${NOVAL.tagHole + 12} 0 ${NOVAL.tagHole + 8} 5 L${NOVAL.pinCircle - 4} 6 Z" fill="url(#tinned)" stroke="#5f625d" stroke-width="1"/>` +
      `<circle cx="${NOVAL.tagHole}" cy="0" r="2.8" fill="#2c2a26"/></g>`;
  }
  const plate = NOVAL.plate;
  const body =
    `<g transform="${place(centre[0], centre[1])}">` +
    `<g transform="rotate(${f(turn + 90)})"><rect x="${-plate}" y="-34" width="${2 * plate}" height="68" rx="34" fill="url(#steel)" stroke="#4d4f4c" stroke-width="1.5"/></g>` +
    `<circle r="${NOVAL.body}" fill="url(#bakelite)" stroke="#160d07" stroke-width="2"/>` +
    `<circle r="${NOVAL.body - 6}" fill="none" stroke="#7b5538" stroke-width="1.5" stroke-opacity="0.6"/>${tags}` +
    `<g transform="rotate(${f(turn)})"><path d="M6 -5 L30 -4 Q33 0 30 4 L6 5 Z" fill="url(#tinned)" stroke="#5f625d" stroke-width="1"/><circle cx="24" r="2.4" fill="#2c2a26"/></g>` +
    `<circle r="12" fill="url(#tinned)" stroke="#5f625d" stroke-width="1.2"/><circle r="5.5" fill="#1c1915"/>` +
    `</g>` +
    rivetPair(centre, turn) +
    stamp(labelAt[0], labelAt[1], ref, 28);
  return { body, shadow: [{ d: circleD(centre[0], centre[1], NOVAL.body + 6) }] };
}

function rivetPair(centre: Pt, turn: number): string {
  const a = ((turn + 90) * Math.PI) / 180;
  const d = NOVAL.plate - 20;
  return [1, -1].map((s) => rivet(centre[0] + Math.cos(a) * d * s, centre[1] + Math.sin(a) * d * s, 9)).join('');
}

export interface TagStripSpec {
  start: Pt;
  horizontal: boolean;
  count: number;
  pitch: number;
  /** +1: tags point right/down. */ side: 1 | -1;
}

export function stripTag(s: TagStripSpec, i: number): Pt {
  const along = i * s.pitch;
  return s.horizontal ? [s.start[0] + along, s.start[1] + s.side * 40] : [s.start[0] + s.side * 40, s.start[1] + along];
}

/** A phenolic tag strip on a steel foot, its tinned tags riveted along one edge. */
export function tagStrip(s: TagStripSpec): Drawn {
  const len = (s.count - 1) * s.pitch + 40;
  const turn = s.horizontal ? 0 : 90;
  const side = s.horizontal ? s.side : -s.side;
  let tags = '';
  for (let i = 0; i < s.count; i++) {
    const x = i * s.pitch;
    tags +=
      `<path d="M${f(x - 9)} ${f(side * 6)} L${f(x + 9)} ${f(side * 6)} L${f(x + 6)} ${f(side * 46)} L${f(x - 6)} ${f(side * 46)} Z" fill="url(#tinned)" stroke="#5f625d" stroke-width="1"/>` +
      `<circle cx="${f(x)}" cy="${f(side * 40)}" r="2.6" fill="#2c2a26"/>` +
      rivet(x, side * 8, 4.5);
  }
  const foot = ((s.count - 1) * s.pitch) / 2;
  const body =
    `<g transform="${place(s.start[0], s.start[1], turn)}">` +
    `<rect x="${f(foot - 22)}" y="${side > 0 ? -44 : 10}" width="44" height="34" rx="4" fill="url(#steel)" stroke="#4d4f4c" stroke-width="1.2"/>` +
    `<rect x="-20" y="-17" width="${f(len)}" height="34" rx="3" fill="url(#phenolic)" stroke="#3c2410" stroke-width="1.5"/>` +
    `<rect x="-16" y="-14" width="${f(len - 8)}" height="5" fill="#fff" fill-opacity="0.12"/>${tags}</g>` +
    screwHead(
      s.horizontal ? s.start[0] + foot : s.start[0] - s.side * 27,
      s.horizontal ? s.start[1] - s.side * 27 : s.start[1] + foot,
      9,
      20,
    );
  const mid: Pt = s.horizontal ? [s.start[0] + len / 2 - 20, s.start[1]] : [s.start[0], s.start[1] + len / 2 - 20];
  return { body, shadow: [{ d: turnedRectD(mid, turn, len, 34) }] };
}

/** A glossy smear of wax that has run off a warm capacitor and set on the steel below it. */
export function waxStain(at: Pt, rx: number, ry: number, turn = 0): string {
  return (
    `<g transform="${place(at[0], at[1], turn)}"><ellipse rx="${f(rx * 1.2)}" ry="${f(ry * 1.3)}" fill="#6b4a1c" fill-opacity="0.18"/>` +
    `<ellipse cx="${f(rx * 0.15)}" cy="${f(ry * 0.2)}" rx="${f(rx * 0.7)}" ry="${f(ry * 0.6)}" fill="#b68a3e" fill-opacity="0.45"/>` +
    `<ellipse cx="${f(-rx * 0.1)}" cy="${f(-ry * 0.1)}" rx="${f(rx * 0.25)}" ry="${f(ry * 0.15)}" fill="#fff" fill-opacity="0.3"/></g>`
  );
}
