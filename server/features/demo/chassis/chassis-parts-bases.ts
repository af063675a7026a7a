import { circleD, rectD, rivet, screwHead } from './chassis-parts';
import type { Drawn } from './chassis-parts';
import { f, place, text } from './svg-kit';
import type { Pt } from './svg-kit';

/** What the top-side parts show through the chassis: bases, tags, mounting lugs. */

function tagTo(from: Pt, to: Pt, width = 10, colour = '#c4c6c0'): string {
  return (
    `<line x1="${f(from[0])}" y1="${f(from[1])}" x2="${f(to[0])}" y2="${f(to[1])}" stroke="#5f625d" stroke-width="${width + 2}" stroke-linecap="round"/>` +
    `<line x1="${f(from[0])}" y1="${f(from[1])}" x2="${f(to[0])}" y2="${f(to[1])}" stroke="${colour}" stroke-width="${width}" stroke-linecap="round"/>`
  );
}

/** The can electrolytic's phenolic base: twisted mounting lugs and its solder tags. */
export function canBase(at: Pt, r: number, tags: readonly Pt[]): Drawn {
  let lugs = '';
  for (const deg of [45, 135, 225, 315]) {
    lugs += `<g transform="${place(at[0], at[1], deg)}"><rect x="${f(r * 0.78)}" y="-9" width="26" height="18" rx="3" fill="url(#aluBar)" stroke="#3e4143" stroke-width="1.2" transform="rotate(25 ${f(r * 0.78 + 13)} 0)"/></g>`;
  }
  const body =
    `<circle cx="${f(at[0])}" cy="${f(at[1])}" r="${f(r * 0.95)}" fill="url(#phenolic)" stroke="#3b220e" stroke-width="2"/>` +
    `<circle cx="${f(at[0])}" cy="${f(at[1])}" r="${f(r * 0.8)}" fill="none" stroke="#e0b07a" stroke-opacity="0.35" stroke-width="2"/>` +
    lugs +
    tags
      .map(
        (t) =>
          `<circle cx="${f(at[0] + (t[0] - at[0]) * 0.5)}" cy="${f(at[1] + (t[1] - at[1]) * 0.5)}" r="8" fill="#1e130a"/>` +
          tagTo([at[0] + (t[0] - at[0]) * 0.5, at[1] + (t[1] - at[1]) * 0.5], t, 12),
      )
      .join('') +
    `<circle cx="${f(at[0])}" cy="${f(at[1])}" r="16" fill="url(#aluTop)" stroke="#3e4143" stroke-width="1.5"/>` +
    [
      ['▲', 0],
      ['■', 1],
    ]
      .map(([mark, i]) => {
        const t = tags[Number(i)];
        return t
          ? text((at[0] * 2 + t[0]) / 3, (at[1] * 2 + t[1]) / 3 + 18, String(mark), { size: 14, fill: '#f1e3c8' })
          : '';
      })
      .join('');
  return { body, shadow: [{ d: circleD(at[0], at[1], r * 0.95) }] };
}

/** An IF can's base: four pins through a square hole and two twisted tabs. */
export function ifBase(at: Pt, tags: readonly Pt[]): Drawn {
  const [x, y] = at;
  const body =
    `<rect x="${f(x - 44)}" y="${f(y - 44)}" width="88" height="88" rx="6" fill="#1b1712" stroke="#d8dad5" stroke-width="2"/>` +
    `<rect x="${f(x - 34)}" y="${f(y - 34)}" width="68" height="68" rx="4" fill="url(#phenolic)" stroke="#3b220e" stroke-width="1.5"/>` +
    tags
      .map(
        (t) => `<circle cx="${f(t[0])}" cy="${f(t[1])}" r="6" fill="url(#tinned)" stroke="#5f625d" stroke-width="1"/>`,
      )
      .join('') +
    [
      [-62, -62],
      [62, 62],
    ]
      .map(
        ([dx, dy]) =>
          `<rect x="${f(x + (dx ?? 0) - 12)}" y="${f(y + (dy ?? 0) - 5)}" width="24" height="10" rx="2" fill="url(#aluBar)" stroke="#3e4143" stroke-width="1" transform="rotate(-30 ${f(x + (dx ?? 0))} ${f(y + (dy ?? 0))})"/>`,
      )
      .join('');
  return { body, shadow: [{ d: rectD(x - 44, y - 44, 88, 88) }] };
}

/** Back of the mains voltage selector: a phenolic wafer with its tappings. */
export function selectorBack(at: Pt, r: number, tags: readonly Pt[]): Drawn {
  const body =
    `<circle cx="${f(at[0])}" cy="${f(at[1])}" r="${f(r)}" fill="url(#phenolic)" stroke="#3b220e" stroke-width="2"/>` +
    tags.map((t) => tagTo(at, t, 11)).join('') +
    `<circle cx="${f(at[0])}" cy="${f(at[1])}" r="${f(r * 0.55)}" fill="url(#phenolic)" stroke="#3b220e" stroke-width="1.5"/>` +
    rivet(at[0], at[1], 9) +
    text(at[0], at[1] + r + 28, '110–245 V', { size: 17, fill: '#2d2f30', weight: 'bold' });
  return { body, shadow: [{ d: circleD(at[0], at[1], r) }] };
}

/** The gang seen from below: rubber-mounted screws and stator tags through slots. */
export function gangUnder(tags: readonly Pt[], screws: readonly Pt[]): Drawn {
  const body =
    tags
      .map(
        (t) =>
          `<rect x="${f(t[0] - 16)}" y="${f(t[1] - 22)}" width="32" height="44" rx="6" fill="#1b1712" stroke="#d8dad5" stroke-width="1.5"/>` +
          `<rect x="${f(t[0] - 6)}" y="${f(t[1] - 18)}" width="12" height="30" fill="url(#tinned)" stroke="#5f625d" stroke-width="1"/>`,
      )
      .join('') +
    screws
      .map(
        (s) =>
          `<circle cx="${f(s[0])}" cy="${f(s[1])}" r="22" fill="url(#blackDisc)"/>` + screwHead(s[0], s[1], 11, 40),
      )
      .join('');
  return { body, shadow: [] };
}

/** A solder lug under a screw: an earth point. */
export function earthLug(at: Pt, turn = 0): string {
  return (
    `<g transform="${place(at[0], at[1], turn)}"><path d="M-16 -12 L10 -7 Q16 0 10 7 L-16 12 Z" fill="url(#tinned)" stroke="#5f625d" stroke-width="1"/></g>` +
    screwHead(
      at[0] - Math.cos((turn * Math.PI) / 180) * 14,
      at[1] - Math.sin((turn * Math.PI) / 180) * 14,
      10,
      50 + turn,
    )
  );
}

/** The rear wall's socket panel: aerial, earth and loudspeaker, lettered in white. */
export function rearPanel(x: number, y: number, w: number, h: number, labels: readonly string[]): Drawn {
  const step = w / labels.length;
  const sockets = labels
    .map((label, i) => {
      const sx = x + step * (i + 0.5);
      return (
        `<circle cx="${f(sx)}" cy="${f(y + h * 0.42)}" r="11" fill="#111" stroke="#c4c6c0" stroke-width="3"/>` +
        text(sx, y + h - 6, label, { size: 13, fill: '#f0eadb', weight: 'bold' })
      );
    })
    .join('');
  const body =
    `<rect x="${f(x)}" y="${f(y)}" width="${f(w)}" height="${f(h)}" rx="4" fill="url(#bakelite)" stroke="#120b06" stroke-width="2"/>` +
    sockets +
    rivet(x + 10, y + h / 2, 5) +
    rivet(x + w - 10, y + h / 2, 5);
  return { body, shadow: [{ d: rectD(x, y, w, h) }] };
}

/** A coil on a slotted former, seen end on: winding, dust-iron core, four pins. */
export function coilFormer(at: Pt, r: number): Drawn {
  const [x, y] = at;
  const pins = [45, 135, 225, 315]
    .map((deg) => {
      const a = (deg * Math.PI) / 180;
      return `<circle cx="${f(x + Math.cos(a) * r * 1.3)}" cy="${f(y + Math.sin(a) * r * 1.3)}" r="5" fill="url(#tinned)" stroke="#5f625d" stroke-width="1"/>`;
    })
    .join('');
  const body =
    `<rect x="${f(x - r * 1.5)}" y="${f(y - r * 1.5)}" width="${f(r * 3)}" height="${f(r * 3)}" rx="6" fill="url(#phenolic)" stroke="#3b220e" stroke-width="1.5"/>` +
    pins +
    `<circle cx="${f(x)}" cy="${f(y)}" r="${f(r)}" fill="#c2702f" stroke="#6b3612" stroke-width="2"/>` +
    `<circle cx="${f(x)}" cy="${f(y)}" r="${f(r * 0.75)}" fill="none" stroke="#f0b07a" stroke-opacity="0.6" stroke-width="2"/>` +
    `<circle cx="${f(x)}" cy="${f(y)}" r="${f(r * 0.45)}" fill="#2a2a2a" stroke="#000" stroke-width="1.5"/>` +
    `<rect x="${f(x - r * 0.35)}" y="${f(y - 2)}" width="${f(r * 0.7)}" height="4" fill="#555"/>`;
  return { body, shadow: [{ d: rectD(x - r * 1.5, y - r * 1.5, r * 3, r * 3) }] };
}
