import { resistorBands, type BandTolerance } from '../../../../shared/bench';
import { BAND_PAINT } from './band-paint';
import { turnedRectD } from './chassis-parts';
import type { Drawn } from './chassis-parts';
import { angleOf, distance, f, midpoint, place, shade, text } from './svg-kit';
import type { Pt } from './svg-kit';

/** Where an axial part's body sits: between its lead ends, lifted sideways by `lift` px. */
export function bodyCentre(a: Pt, b: Pt, lift = 0): Pt {
  const len = distance(a, b) || 1;
  const m = midpoint(a, b);
  return [m[0] - ((b[1] - a[1]) / len) * lift, m[1] + ((b[0] - a[0]) / len) * lift];
}

/** A tinned lead; a new part's leads are still bright. */
function lead(from: Pt, to: Pt, fresh: boolean): string {
  const d = `M${f(from[0])} ${f(from[1])} L${f(to[0])} ${f(to[1])}`;
  const [edge, core] = fresh ? ['#5f625e', '#eceeec'] : ['#55574f', '#c9cbc4'];
  return `<path d="${d}" stroke="${edge}" stroke-width="4.6" stroke-linecap="round"/><path d="${d}" stroke="${core}" stroke-width="2.8" stroke-linecap="round"/>`;
}

/**
 * An axial part: leads from a and b to the ends of a body of length `len` drawn by
 * `drawBody` along the local x axis, centred on the origin, never upside down.
 */
export function axial(
  a: Pt,
  b: Pt,
  lift: number,
  len: number,
  dia: number,
  drawBody: (len: number) => string,
  fresh = false,
): Drawn {
  const c = bodyCentre(a, b, lift);
  let turn = angleOf(a, b);
  if (turn > 95 || turn < -85) turn += 180;
  const rad = (turn * Math.PI) / 180;
  const endL: Pt = [c[0] - (Math.cos(rad) * len) / 2, c[1] - (Math.sin(rad) * len) / 2];
  const endR: Pt = [c[0] + (Math.cos(rad) * len) / 2, c[1] + (Math.sin(rad) * len) / 2];
  const [nearA, nearB] = distance(a, endL) < distance(a, endR) ? [endL, endR] : [endR, endL];
  const body =
    lead(a, nearA, fresh) + lead(b, nearB, fresh) + `<g transform="${place(c[0], c[1], turn)}">${drawBody(len)}</g>`;
  return { body, shadow: [{ d: turnedRectD(c, turn, len, dia) }] };
}

export function tube(len: number, dia: number, fill: string, rx = dia / 2): string {
  return `<rect x="${f(-len / 2)}" y="${f(-dia / 2)}" width="${f(len)}" height="${f(dia)}" rx="${f(rx)}" fill="${fill}"/>`;
}

export const CYL = (len: number, dia: number, rx = dia / 2): string =>
  `<rect x="${f(-len / 2)}" y="${f(-dia / 2)}" width="${f(len)}" height="${f(dia)}" rx="${f(rx)}" fill="url(#cyl)" stroke="#000" stroke-opacity="0.45" stroke-width="1.2"/>`;

export interface ResistorSpec {
  a: Pt;
  b: Pt;
  lift?: number;
  ohms: number;
  tolerance?: BandTolerance;
  watts?: 0.5 | 1 | 2;
  /** A newly fitted resistor: clean lacquer in `body` colour, bright leads, bands set towards one end. */
  fresh?: boolean;
  body?: string;
}

/** Body length and diameter (px) by rating: a 2 W part is visibly stouter. */
const RESISTOR_SIZE = { 0.5: [84, 25], 1: [104, 30], 2: [124, 36] } as const;

/** A carbon resistor whose bands are worked out from its value. */
export function resistor(r: ResistorSpec): Drawn {
  const [len, dia] = RESISTOR_SIZE[r.watts ?? 0.5];
  const bands = resistorBands(r.ohms, r.tolerance);
  const bodyColour = r.body ?? '#d6bd8c';
  const bw = len * (r.fresh ? 0.075 : 0.085);
  const at = r.fresh ? [0.2, 0.31, 0.42, 0.78] : [0.17, 0.31, 0.45, 0.8];
  const draw = (l: number): string => {
    let s = tube(l, dia, bodyColour, dia * 0.42);
    if (r.fresh) {
      // Moulded end caps swell slightly past the body, as on a modern film resistor.
      s += [-1, 1]
        .map(
          (k) =>
            `<rect x="${f(k < 0 ? -l / 2 - 2 : l / 2 - l * 0.16 + 2)}" y="${f(-dia / 2 - 2)}" width="${f(l * 0.16)}" height="${f(dia + 4)}" rx="${f(dia * 0.45)}" fill="${bodyColour}"/>`,
        )
        .join('');
    }
    bands.forEach((band, i) => {
      s += `<rect x="${f(-l / 2 + l * (at[i] ?? 0) - bw / 2)}" y="${f(-dia / 2 + 0.5)}" width="${f(bw)}" height="${f(dia - 1)}" fill="${BAND_PAINT[band] ?? '#000'}"/>`;
    });
    if (r.fresh)
      s += `<rect x="${f(-l * 0.4)}" y="${f(-dia * 0.36)}" width="${f(l * 0.8)}" height="${f(dia * 0.12)}" rx="2" fill="#fff" fill-opacity="0.55"/>`;
    return s + CYL(l, dia, dia * 0.42);
  };
  return axial(r.a, r.b, r.lift ?? 0, len, dia, draw, r.fresh);
}

export interface WaxCapSpec {
  a: Pt;
  b: Pt;
  lift?: number;
  print: string;
  colour?: string;
  len?: number;
  /** Restuffed: a film capacitor inside, the ends sealed again with fresh wax of matching colour. */
  resealed?: boolean;
  /** Leaky and run warm: wax has softened, run from both ends and dripped, the paper split by the print. */
  weeping?: boolean;
}

/** A wax-dipped paper tubular, its outer-foil end marked with a black ring. */
export function waxCap(c: WaxCapSpec): Drawn {
  const len = c.len ?? 150;
  const dia = 34;
  const wax = c.colour ?? '#d6b86a';
  const end = (x: number): string =>
    c.resealed
      ? `<ellipse cx="${f(x)}" cy="0" rx="11" ry="${f(dia / 2 + 1)}" fill="${shade(wax, 1.12)}" stroke="${shade(wax, 0.75)}" stroke-width="1"/>` +
        `<ellipse cx="${f(x - 2)}" cy="${f(-dia * 0.2)}" rx="5" ry="${f(dia * 0.16)}" fill="#fff" fill-opacity="0.6"/>`
      : `<ellipse cx="${f(x)}" cy="0" rx="12" ry="${f(dia / 2 + 2)}" fill="${shade(wax, 0.8)}"/>`;
  const draw = (l: number): string =>
    tube(l, dia, wax) +
    end(-l / 2 + 8) +
    end(l / 2 - 8) +
    `<rect x="${f(-l / 2 + 24)}" y="${f(-dia / 2)}" width="7" height="${dia}" fill="#1d1a16"/>` +
    text(6, 5, c.print, { size: 15, fill: '#2a2218', family: 'condensed', weight: 'bold' }) +
    CYL(l, dia) +
    (c.weeping ? weep(l, dia, wax) : '');
  return axial(c.a, c.b, c.lift ?? 0, len, dia, draw, c.resealed);
}

/** Softened wax run out of both ends and hanging in drips, a dark stain and a split in the paper. */
function weep(l: number, dia: number, wax: string): string {
  const drip = (x: number, drop: number): string =>
    `<path d="M${f(x - 9)} ${f(dia / 2 - 3)} Q${f(x - 6)} ${f(dia / 2 + drop)} ${f(x)} ${f(dia / 2 + drop + 6)} Q${f(x + 7)} ${f(dia / 2 + drop)} ${f(x + 9)} ${f(dia / 2 - 3)} Z" fill="${shade(wax, 0.72)}" stroke="${shade(wax, 0.5)}" stroke-width="1"/>` +
    `<ellipse cx="${f(x - 2)}" cy="${f(dia / 2 + drop)}" rx="2.5" ry="4" fill="#fff" fill-opacity="0.5"/>`;
  return (
    `<ellipse cx="${f(-l / 2 + 2)}" cy="2" rx="17" ry="${f(dia / 2 + 6)}" fill="${shade(wax, 0.66)}" fill-opacity="0.9"/>` +
    `<ellipse cx="${f(l / 2 - 2)}" cy="2" rx="17" ry="${f(dia / 2 + 6)}" fill="${shade(wax, 0.66)}" fill-opacity="0.9"/>` +
    drip(-l / 2 + 10, 14) +
    drip(l / 2 - 14, 22) +
    drip(l * 0.18, 9) +
    `<rect x="${f(-l / 2 + 32)}" y="${f(-dia / 2)}" width="${f(l * 0.34)}" height="${f(dia)}" fill="#3a2410" fill-opacity="0.35"/>` +
    `<path d="M${f(l * 0.4)} ${f(-dia / 2)} l5 8 l-6 9 l6 8 l-3 ${f(dia / 2 - 12)}" stroke="#2a1a0c" stroke-width="2" fill="none"/>`
  );
}

export interface ElectrolyticSpec {
  a: Pt;
  b: Pt;
  lift?: number;
  lines: readonly [string, string];
  len: number;
  dia: number;
  sleeve?: string;
  clip?: boolean;
  /** Emptied and refilled with a modern part: the old sleeve kept, both ends neatly resealed. */
  restuffed?: boolean;
}

/** A tubular electrolytic in a printed sleeve, optionally held by a clip. */
export function tubularElectrolytic(e: ElectrolyticSpec): Drawn {
  const sleeve = e.sleeve ?? '#264a78';
  const draw = (l: number): string => {
    const d = e.dia;
    let s = '';
    if (e.restuffed) {
      // A neat bead of sealing compound closes each cut end round the new lead.
      s += [-1, 1]
        .map(
          (k) =>
            `<ellipse cx="${f(k * (l / 2 - 1))}" cy="0" rx="7" ry="${f(d * 0.3)}" fill="#4b4236" stroke="#2a241c" stroke-width="1"/>` +
            `<ellipse cx="${f(k * (l / 2 - 1) - 1)}" cy="${f(-d * 0.1)}" rx="3" ry="${f(d * 0.1)}" fill="#fff" fill-opacity="0.45"/>`,
        )
        .join('');
    }
    s +=
      tube(l, d, '#bfc3c5', 8) +
      `<rect x="${f(-l / 2 + 10)}" y="${f(-d / 2)}" width="${f(l - 20)}" height="${f(d)}" fill="${sleeve}"/>` +
      text(-l * 0.08, -2, e.lines[0], { size: d * 0.3, fill: '#f3efe2', weight: 'bold', family: 'condensed' }) +
      text(-l * 0.08, d * 0.3, e.lines[1], { size: d * 0.22, fill: '#f3efe2', family: 'condensed' }) +
      text(l / 2 - 26, 6, '+', { size: d * 0.4, fill: '#f3efe2', weight: 'bold' }) +
      CYL(l, d, 8);
    if (e.clip) {
      s +=
        `<rect x="${f(-l * 0.42)}" y="${f(-d / 2 - 14)}" width="22" height="${f(d + 28)}" rx="3" fill="url(#steel)" stroke="#3d3f41" stroke-width="1.2"/>` +
        `<circle cx="${f(-l * 0.42 + 11)}" cy="${f(-d / 2 - 7)}" r="5" fill="#55585a"/><circle cx="${f(-l * 0.42 + 11)}" cy="${f(d / 2 + 7)}" r="5" fill="#55585a"/>`;
    }
    return s;
  };
  return axial(e.a, e.b, e.lift ?? 0, e.len, e.dia, draw, e.restuffed);
}

/** A small moulded mica, flat and reddish brown, value printed in pF. */
export function micaCap(a: Pt, b: Pt, print: string, lift = 0): Drawn {
  const draw = (l: number): string =>
    `<rect x="${f(-l / 2)}" y="-15" width="${f(l)}" height="30" rx="4" fill="#7e3526" stroke="#3a150e" stroke-width="1.5"/>` +
    `<rect x="${f(-l / 2 + 3)}" y="-12" width="${f(l - 6)}" height="8" rx="3" fill="#fff" fill-opacity="0.18"/>` +
    text(0, 6, print, { size: 13, fill: '#f1dcc8', family: 'condensed', weight: 'bold' });
  return axial(a, b, lift, 50, 30, draw);
}

/** A ceramic disc, standing on its leads. */
export function ceramicDisc(a: Pt, b: Pt, print: string, lift = 0): Drawn {
  const draw = (): string =>
    `<ellipse rx="22" ry="20" fill="#c4773b" stroke="#5a2f12" stroke-width="1.5"/>` +
    `<ellipse cx="-6" cy="-7" rx="9" ry="5" fill="#fff" fill-opacity="0.3"/>` +
    text(0, 5, print, { size: 13, fill: '#2a160a', family: 'condensed', weight: 'bold' });
  return axial(a, b, lift, 44, 40, draw);
}
