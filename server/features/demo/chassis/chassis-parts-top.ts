import { nut, polyD, rivet, screwHead } from './chassis-parts';
import type { Drawn, ShadowShape } from './chassis-parts';
import { f, place, text } from './svg-kit';
import type { Pt } from './svg-kit';

/** How far tall parts throw their shadow (pixels, down-right from the lamp). */
export const TALL_OFFSET: Pt = [26, 32];

/** The ground silhouette of a tall round part: a disc swept along the light. */
function discSweep(c: Pt, r: number): ShadowShape[] {
  return [{ d: `M${f(c[0] - TALL_OFFSET[0])} ${f(c[1] - TALL_OFFSET[1])} L${f(c[0])} ${f(c[1])}`, width: 2 * r }];
}

function boxSweep(x: number, y: number, w: number, h: number): ShadowShape[] {
  const [ox, oy] = TALL_OFFSET;
  const p: Pt[] = [
    [x - ox, y - oy],
    [x + w - ox, y - oy],
    [x + w, y],
    [x + w, y + h],
    [x, y + h],
    [x - ox, y + h - oy],
  ];
  return [{ d: polyD(p) }];
}

export interface ValveTopSpec {
  at: Pt;
  r: number;
  type: string;
  turn: number;
  plate?: number;
}

/** A noval valve seen from straight above: getter-silvered dome, printed type, exhaust pip. */
export function valveTop(v: ValveTopSpec): Drawn {
  const r = v.r;
  const g = r * 0.84;
  // Where the getter flash thins out, the cage and mica show through as a dark crescent.
  const thin = `M${f(g * 0.2)} ${f(g * 0.98)} A${f(g)} ${f(g)} 0 0 0 ${f(g * 0.98)} ${f(g * 0.2)} A${f(g * 1.1)} ${f(g * 1.1)} 0 0 1 ${f(g * 0.2)} ${f(g * 0.98)} Z`;
  const body =
    `<g transform="${place(v.at[0], v.at[1])}">` +
    `<g transform="rotate(${v.plate ?? v.turn + 90})"><rect x="${f(-r * 1.75)}" y="${f(-r * 0.55)}" width="${f(r * 3.5)}" height="${f(r * 1.1)}" rx="${f(r * 0.55)}" fill="url(#steel)" stroke="#4d4f4c" stroke-width="1.5"/>` +
    `<circle cx="${f(-r * 1.42)}" r="${f(r * 0.14)}" fill="url(#aluTop)" stroke="#555" stroke-width="1"/><circle cx="${f(r * 1.42)}" r="${f(r * 0.14)}" fill="url(#aluTop)" stroke="#555" stroke-width="1"/></g>` +
    `<circle r="${f(r * 1.16)}" fill="url(#bakelite)" stroke="#120b06" stroke-width="2"/>` +
    `<circle r="${f(r)}" fill="#2b3331"/>` +
    `<circle r="${f(g)}" fill="url(#getter)"/>` +
    `<g transform="rotate(${v.turn + 120})"><path d="${thin}" fill="#3a3226" fill-opacity="0.75"/></g>` +
    `<path d="M${f(-g * 0.95)} ${f(g * 0.1)} Q0 ${f(-g * 0.25)} ${f(g * 0.95)} ${f(-g * 0.05)}" stroke="#ffffff" stroke-opacity="0.35" stroke-width="${f(r * 0.16)}" fill="none"/>` +
    `<circle r="${f(r)}" fill="url(#glass)" stroke="#141a19" stroke-width="2"/>` +
    `<g transform="rotate(${v.turn})">` +
    text(0, -r * 0.14, v.type, {
      size: r * 0.33 * Math.min(1, 4.8 / v.type.length),
      fill: '#c8321c',
      weight: 'bold',
      opacity: 0.95,
    }) +
    text(0, r * 0.44, '54·B', { size: r * 0.16, fill: '#c8321c', opacity: 0.9 }) +
    '</g>' +
    `<circle r="${f(r * 0.075)}" fill="#d7e0de" stroke="#394542" stroke-width="1.2"/>` +
    `<path d="M${f(-r * 0.8)} ${f(-r * 0.28)} A${f(r * 0.85)} ${f(r * 0.85)} 0 0 1 ${f(-r * 0.22)} ${f(-r * 0.8)}" stroke="#fff" stroke-opacity="0.85" stroke-width="${f(r * 0.08)}" stroke-linecap="round" fill="none"/>` +
    `<circle cx="${f(-r * 0.46)}" cy="${f(-r * 0.5)}" r="${f(r * 0.06)}" fill="#fff"/></g>`;
  return { body, shadow: discSweep(v.at, r), tall: true };
}

export interface TransformerSpec {
  cx: number;
  cy: number;
  w: number;
  h: number;
  plate: readonly string[];
}

/** A frame transformer from above: lamination stack, clamp straps, coil ends, label plate. */
export function transformerTop(t: TransformerSpec): Drawn {
  const { cx, cy, w, h } = t;
  const x = cx - w / 2;
  const y = cy - h / 2;
  const coreH = h * 0.6;
  const coreY = cy - coreH / 2;
  let lams = '';
  for (let ly = coreY + 4; ly < coreY + coreH - 2; ly += 4) {
    lams += `<line x1="${f(x + 3)}" y1="${f(ly)}" x2="${f(x + w - 3)}" y2="${f(ly)}" stroke="${Math.round(ly) % 3 === 0 ? '#4d5054' : '#121314'}" stroke-width="1.3" fill-opacity="0.8" stroke-opacity="0.8"/>`;
  }
  const coil = (cy0: number): string =>
    `<rect x="${f(cx - w * 0.3)}" y="${f(cy0)}" width="${f(w * 0.6)}" height="${f(h * 0.2 + 8)}" rx="14" fill="url(#coil)" stroke="#4e3a1c" stroke-width="2"/>` +
    `<rect x="${f(cx - w * 0.3 + 8)}" y="${f(cy0 + 6)}" width="${f(w * 0.6 - 16)}" height="${f(h * 0.2 - 4)}" rx="10" fill="none" stroke="#e3c993" stroke-width="1.5" stroke-opacity="0.6"/>` +
    [0.3, 0.5, 0.7]
      .map(
        (k) =>
          `<line x1="${f(cx - w * 0.3 + 4)}" y1="${f(cy0 + (h * 0.2 + 8) * k)}" x2="${f(cx + w * 0.3 - 4)}" y2="${f(cy0 + (h * 0.2 + 8) * k)}" stroke="#6f522a" stroke-opacity="0.35" stroke-width="1.5"/>`,
      )
      .join('');
  const strap = (sy: number): string =>
    `<rect x="${f(x - 14)}" y="${f(sy)}" width="${f(w + 28)}" height="${f(h * 0.1)}" fill="url(#aluBar)" stroke="#3f4244" stroke-width="1.5"/>`;
  const pw = w * 0.6;
  const ph = coreH * 0.62;
  const lines = t.plate
    .map((line, i) =>
      text(cx, cy - ph / 2 + 24 + i * ((ph - 30) / Math.max(1, t.plate.length - 1)), line, {
        size: i === 0 ? 16 : 13.5,
        fill: '#1d2430',
        weight: i === 0 ? 'bold' : 'normal',
        family: 'condensed',
      }),
    )
    .join('');
  const body =
    coil(y - 4) +
    coil(cy + coreH / 2 - 4) +
    `<rect x="${f(x)}" y="${f(coreY)}" width="${f(w)}" height="${f(coreH)}" fill="url(#lam)" stroke="#0d0e0f" stroke-width="2"/>${lams}` +
    strap(coreY - 4) +
    strap(coreY + coreH - h * 0.1 + 4) +
    nut(x + 6, coreY + h * 0.05 - 4, 12) +
    nut(x + w - 6, coreY + h * 0.05 - 4, 12) +
    nut(x + 6, coreY + coreH - h * 0.05 + 4, 12) +
    nut(x + w - 6, coreY + coreH - h * 0.05 + 4, 12) +
    `<rect x="${f(cx - pw / 2)}" y="${f(cy - ph / 2)}" width="${f(pw)}" height="${f(ph)}" rx="4" fill="url(#alu)" stroke="#55595c" stroke-width="1.5"/>` +
    rivet(cx - pw / 2 + 9, cy) +
    rivet(cx + pw / 2 - 9, cy) +
    lines;
  return { body, shadow: boxSweep(x - 14, y, w + 28, h), tall: true };
}

/** A multi-section can electrolytic from above, its value printed on the top. */
export function canTop(at: Pt, r: number, lines: readonly [string, string, string]): Drawn {
  let rings = '';
  for (let k = 0.3; k < 0.86; k += 0.07)
    rings += `<circle r="${f(r * k)}" fill="none" stroke="#fff" stroke-opacity="0.12" stroke-width="1.5"/>`;
  const body =
    `<g transform="${place(at[0], at[1])}"><circle r="${f(r)}" fill="url(#aluTop)" stroke="#414547" stroke-width="2"/>` +
    `<circle r="${f(r * 0.92)}" fill="none" stroke="#f7f8f7" stroke-width="3" stroke-opacity="0.7"/>` +
    `<circle r="${f(r * 0.87)}" fill="none" stroke="#5c6063" stroke-width="2" stroke-opacity="0.8"/>${rings}` +
    text(0, -r * 0.1, lines[0], { size: r * 0.25, fill: '#1b2a4a', weight: 'bold', family: 'condensed' }) +
    text(0, r * 0.24, lines[1], { size: r * 0.25, fill: '#1b2a4a', weight: 'bold', family: 'condensed' }) +
    text(0, r * 0.52, lines[2], { size: r * 0.13, fill: '#1b2a4a', family: 'condensed' }) +
    `<circle cx="${f(-r * 0.45)}" cy="${f(-r * 0.5)}" r="${f(r * 0.2)}" fill="#fff" fill-opacity="0.25"/></g>`;
  return { body, shadow: discSweep(at, r), tall: true };
}

/** A square aluminium IF can: core slug in the top hole, sealed with a dab of wax. */
export function ifCanTop(at: Pt, size: number, label: readonly [string, string]): Drawn {
  const s = size / 2;
  const body =
    `<g transform="${place(at[0], at[1])}"><rect x="${f(-s)}" y="${f(-s)}" width="${f(size)}" height="${f(size)}" rx="12" fill="url(#alu)" stroke="#4a4e51" stroke-width="2"/>` +
    `<rect x="${f(-s + 9)}" y="${f(-s + 9)}" width="${f(size - 18)}" height="${f(size - 18)}" rx="8" fill="none" stroke="#fff" stroke-opacity="0.5" stroke-width="2"/>` +
    `<circle r="${f(size * 0.15)}" fill="#151617"/><circle r="${f(size * 0.11)}" fill="#3a3b3c"/>` +
    `<rect x="${f(-size * 0.1)}" y="-2" width="${f(size * 0.2)}" height="4" fill="#0b0b0b" transform="rotate(35)"/>` +
    `<ellipse cx="${f(size * 0.09)}" cy="${f(size * 0.07)}" rx="${f(size * 0.08)}" ry="${f(size * 0.06)}" fill="#a3241c" fill-opacity="0.9"/>` +
    text(0, -s + 30, label[0], { size: 16, fill: '#262a30', weight: 'bold' }) +
    text(0, s - 17, label[1], { size: 13, fill: '#262a30', family: 'condensed' }) +
    '</g>';
  return { body, shadow: discSweep(at, s * 0.95), tall: true };
}

/** The tuning gang from above: frame, screens between sections, meshed plates, trimmers. */
export function gangTop(x: number, y: number, w: number, h: number): Drawn {
  const sections = [0, 0.3, 0.6, 0.8, 1];
  let inner = `<rect x="${f(x)}" y="${f(y)}" width="${f(w)}" height="${f(h)}" rx="6" fill="#201d17" stroke="#3b3526" stroke-width="3"/>`;
  for (let i = 0; i < sections.length - 1; i++) {
    const x0 = x + w * (sections[i] ?? 0) + 12;
    const x1 = x + w * (sections[i + 1] ?? 1) - 12;
    for (let px = x0 + 4, k = 0; px < x1 - 2; px += 7, k++) {
      const rotor = k % 2 === 0;
      const y0 = rotor ? y + h * 0.16 : y + 16;
      const y1 = rotor ? y + h * 0.84 : y + h * 0.62;
      inner += `<line x1="${f(px)}" y1="${f(y0)}" x2="${f(px)}" y2="${f(y1)}" stroke="${rotor ? '#d8dcdd' : '#9ea3a6'}" stroke-width="3"/>`;
    }
    if (i > 0)
      inner += `<rect x="${f(x + w * (sections[i] ?? 0) - 5)}" y="${f(y + 4)}" width="10" height="${f(h - 8)}" fill="url(#brass)" fill-opacity="0.85"/>`;
    const tx = (x0 + x1) / 2;
    inner +=
      `<rect x="${f(tx - 20)}" y="${f(y + h - 38)}" width="40" height="30" rx="3" fill="#ece6d6" stroke="#8d8676" stroke-width="1.5"/>` +
      screwHead(tx, y + h - 23, 8, 60 + i * 25);
  }
  const frame =
    `<rect x="${f(x - 6)}" y="${f(y - 6)}" width="${f(w + 12)}" height="16" fill="url(#brass)" stroke="#5e4d22" stroke-width="1.5"/>` +
    `<rect x="${f(x - 6)}" y="${f(y + h - 10)}" width="${f(w + 12)}" height="16" fill="url(#brass)" stroke="#5e4d22" stroke-width="1.5"/>` +
    `<rect x="${f(x - 16)}" y="${f(y + h / 2 - 9)}" width="${f(w + 32)}" height="18" fill="url(#aluBar)" stroke="#3f4244" stroke-width="1.2"/>`;
  return { body: inner + frame, shadow: boxSweep(x - 16, y - 6, w + 32, h + 12), tall: true };
}
