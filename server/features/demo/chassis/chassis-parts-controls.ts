import { circleD, rectD, screwHead, solder } from './chassis-parts';
import type { Drawn } from './chassis-parts';
import { f, place, text } from './svg-kit';
import type { Pt } from './svg-kit';

const CORD = '#b59a6a';

/** The dial drum on the gang spindle, seen from above (its axis runs left to right). */
export function dialDrum(x: number, y: number, w: number, h: number): Drawn {
  let wraps = '';
  for (let i = 0; i < 4; i++) {
    const yy = y + h * 0.36 + i * 9;
    wraps += `<line x1="${f(x + 6)}" y1="${f(yy)}" x2="${f(x + w - 6)}" y2="${f(yy + 6)}" stroke="${CORD}" stroke-width="3"/>`;
  }
  const body =
    `<rect x="${f(x)}" y="${f(y)}" width="${f(w)}" height="${f(h)}" rx="6" fill="url(#aluBar)" stroke="#44484b" stroke-width="2"/>` +
    `<rect x="${f(x - 4)}" y="${f(y - 4)}" width="9" height="${f(h + 8)}" rx="3" fill="#d4d7d8" stroke="#50545a" stroke-width="1.5"/>` +
    `<rect x="${f(x + w - 5)}" y="${f(y - 4)}" width="9" height="${f(h + 8)}" rx="3" fill="#d4d7d8" stroke="#50545a" stroke-width="1.5"/>` +
    wraps +
    screwHead(x + w / 2, y + 18, 7, 80);
  return { body, shadow: [{ d: rectD(x, y, w, h) }], tall: true };
}

/** A dial-cord idler pulley on its pin, with the cord running round it. */
export function cordPulley(at: Pt, r: number): Drawn {
  const body =
    `<g transform="${place(at[0], at[1])}"><circle r="${f(r)}" fill="url(#aluTop)" stroke="#3e4143" stroke-width="2"/>` +
    `<circle r="${f(r * 0.78)}" fill="none" stroke="#55585b" stroke-width="3"/>` +
    `<path d="M${f(-r * 0.86)} 0 A${f(r * 0.86)} ${f(r * 0.86)} 0 0 1 0 ${f(-r * 0.86)}" fill="none" stroke="${CORD}" stroke-width="4"/>` +
    `<circle r="${f(r * 0.3)}" fill="url(#aluTop)" stroke="#3e4143" stroke-width="1.5"/><circle r="${f(r * 0.1)}" fill="#2c2e30"/></g>`;
  return { body, shadow: [{ d: circleD(at[0], at[1], r) }] };
}

/** Dial cord: a thin waxed cord along straight runs. */
export function cord(points: readonly Pt[]): Drawn {
  const d = points.map(([x, y], i) => `${i ? 'L' : 'M'}${f(x)} ${f(y)}`).join(' ');
  return {
    body: `<path d="${d}" fill="none" stroke="#6d5a37" stroke-width="4.2"/><path d="${d}" fill="none" stroke="${CORD}" stroke-width="2.6"/>`,
    shadow: [{ d, width: 3 }],
  };
}

const TAPS = ['110', '127', '150', '220', '245'];

/** The mains voltage selector: a black disc with the tappings round it, set by a slotted screw. */
export function voltageSelector(at: Pt, r: number, setTo: string): Drawn {
  const marks = TAPS.map((tap, i) => {
    const a = ((-200 + i * 55) * Math.PI) / 180;
    return text(Math.cos(a) * r * 0.68, Math.sin(a) * r * 0.68 + 6, tap, {
      size: 15,
      fill: tap === setTo ? '#fff' : '#d7d2c4',
      weight: 'bold',
      family: 'condensed',
    });
  }).join('');
  const setAngle = -200 + TAPS.indexOf(setTo) * 55;
  const body =
    `<g transform="${place(at[0], at[1])}"><circle r="${f(r)}" fill="url(#blackDisc)" stroke="#000" stroke-width="2"/>` +
    `<circle r="${f(r * 0.92)}" fill="none" stroke="#555" stroke-width="1.5"/>${marks}` +
    `<g transform="rotate(${setAngle})"><circle r="${f(r * 0.3)}" fill="url(#aluTop)" stroke="#222" stroke-width="1.5"/>` +
    `<rect x="${f(-r * 0.26)}" y="-3" width="${f(r * 0.52)}" height="6" fill="#222"/>` +
    `<polygon points="${f(r * 0.34)},-6 ${f(r * 0.48)},0 ${f(r * 0.34)},6" fill="#f1efe6"/></g>` +
    text(0, r + 24, 'MAINS V', { size: 15, fill: '#2d2f30', weight: 'bold', spacing: 1 }) +
    '</g>';
  return { body, shadow: [{ d: circleD(at[0], at[1], r) }] };
}

/** The volume control from behind, with its on/off switch unit clipped to the back. */
export function switchPot(at: Pt, r: number, tags: readonly Pt[], switchTags: readonly Pt[]): Drawn {
  const [cx, cy] = at;
  const tagDraw = (p: Pt): string =>
    `<line x1="${f(cx)}" y1="${f(cy)}" x2="${f(p[0])}" y2="${f(p[1])}" stroke="#c4c6c0" stroke-width="9"/>` +
    solder(p[0], p[1], 7);
  const body =
    tags.map(tagDraw).join('') +
    `<circle cx="${f(cx)}" cy="${f(cy)}" r="${f(r)}" fill="url(#aluTop)" stroke="#383b3d" stroke-width="2.5"/>` +
    `<circle cx="${f(cx)}" cy="${f(cy)}" r="${f(r * 0.9)}" fill="none" stroke="#fff" stroke-opacity="0.4" stroke-width="2"/>` +
    switchTags
      .map(
        (p) =>
          `<line x1="${f(cx)}" y1="${f(cy)}" x2="${f(p[0])}" y2="${f(p[1])}" stroke="#c6a24e" stroke-width="8"/>` +
          solder(p[0], p[1], 7),
      )
      .join('') +
    `<rect x="${f(cx - r * 0.7)}" y="${f(cy - r * 0.55)}" width="${f(r * 1.4)}" height="${f(r * 1.1)}" rx="8" fill="url(#bakelite)" stroke="#120b06" stroke-width="2"/>` +
    text(cx, cy + 4, '250 V~ 2 A', { size: 13, fill: '#cbbfa8', family: 'condensed' }) +
    text(cx, cy + 22, '1 MΩ log', { size: 13, fill: '#cbbfa8', family: 'condensed' });
  return { body, shadow: [{ d: circleD(cx, cy, r) }], tall: true };
}

/** Where the mains flex comes through the back: a grommet and a two-screw cord grip. */
export function cordGrip(at: Pt, width: number): Drawn {
  const [x, y] = at;
  const body =
    `<rect x="${f(x - width / 2)}" y="${f(y - 14)}" width="${f(width)}" height="28" rx="6" fill="url(#aluBar)" stroke="#3a3d3f" stroke-width="2"/>` +
    `<rect x="${f(x - width * 0.2)}" y="${f(y - 10)}" width="${f(width * 0.4)}" height="20" fill="#000" fill-opacity="0.15"/>` +
    screwHead(x - width / 2 + 16, y, 10, 20) +
    screwHead(x + width / 2 - 16, y, 10, 75);
  return { body, shadow: [{ d: rectD(x - width / 2, y - 14, width, 28) }] };
}

/** The AM ferrite-rod aerial on its two plastic clips, with its coils wound on paper formers. */
export function ferriteRod(x1: number, x2: number, y: number): Drawn {
  const d = 44;
  const coil = (cx: number, w: number): string => {
    let turns = '';
    for (let x = cx - w / 2 + 4; x < cx + w / 2 - 2; x += 3.2)
      turns += `<line x1="${f(x)}" y1="${f(y - d / 2 - 3)}" x2="${f(x + 1.5)}" y2="${f(y + d / 2 + 3)}" stroke="#9a5324" stroke-width="1.6"/>`;
    return (
      `<rect x="${f(cx - w / 2)}" y="${f(y - d / 2 - 6)}" width="${f(w)}" height="${f(d + 12)}" rx="4" fill="#d9c79a" stroke="#7d6a44" stroke-width="1.2"/>` +
      `<rect x="${f(cx - w / 2 + 3)}" y="${f(y - d / 2 - 3)}" width="${f(w - 6)}" height="${f(d + 6)}" fill="#c97a3c"/>` +
      turns +
      `<rect x="${f(cx - w / 2)}" y="${f(y - d / 2 - 6)}" width="${f(w)}" height="${f(d + 12)}" rx="4" fill="url(#cyl)"/>`
    );
  };
  const clip = (cx: number): string =>
    `<rect x="${f(cx - 16)}" y="${f(y - d / 2 - 12)}" width="32" height="${f(d + 24)}" rx="6" fill="#ece8dc" stroke="#9d978a" stroke-width="1.5"/>` +
    screwHead(cx, y + d / 2 + 20, 8, 15);
  const len = x2 - x1;
  const body =
    `<rect x="${f(x1)}" y="${f(y - d / 2)}" width="${f(len)}" height="${f(d)}" rx="6" fill="#3a3b3d"/>` +
    `<rect x="${f(x1)}" y="${f(y - d / 2)}" width="${f(len)}" height="${f(d)}" rx="6" fill="url(#cyl)"/>` +
    coil(x1 + len * 0.3, len * 0.2) +
    coil(x1 + len * 0.68, len * 0.12) +
    clip(x1 + 30) +
    clip(x2 - 30);
  return { body, shadow: [{ d: rectD(x1, y - d / 2 - 12, len, d + 24) }], tall: true };
}
