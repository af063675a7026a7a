import type { Drawn } from './chassis-parts';
import { distance, f, shade, smoothPath } from './svg-kit';
import type { Pt } from './svg-kit';

/** Hook-up wire: PVC or rubber insulation, bare tinned links, twisted heater pairs. */

export interface WireStyle {
  colour: string;
  width?: number;
  /** Perished rubber is dull and lighter at the edges. */
  matte?: boolean;
  /** Screened cable: a tinned-copper braid over the insulation. */
  braid?: boolean;
}

function insulation(d: string, s: WireStyle): string {
  const w = s.width ?? 9;
  const hi = s.matte ? 0.18 : 0.38;
  const braid = s.braid
    ? `<path d="${d}" fill="none" stroke="#eef0ea" stroke-opacity="0.75" stroke-width="${f(w * 0.8)}" stroke-dasharray="1.6 2.4"/>` +
      `<path d="${d}" fill="none" stroke="#55584f" stroke-opacity="0.6" stroke-width="${f(w * 0.5)}" stroke-dasharray="1.2 2.8" stroke-dashoffset="2"/>`
    : '';
  return (
    `<path d="${d}" fill="none" stroke="${shade(s.colour, 0.45)}" stroke-width="${f(w + 2.6)}" stroke-linecap="round" stroke-linejoin="round"/>` +
    `<path d="${d}" fill="none" stroke="${s.colour}" stroke-width="${f(w)}" stroke-linecap="round" stroke-linejoin="round"/>${braid}` +
    `<path d="${d}" fill="none" stroke="#fff" stroke-opacity="${hi}" stroke-width="${f(w * 0.28)}" stroke-linecap="round" transform="translate(${f(-w * 0.14)} ${f(-w * 0.2)})"/>`
  );
}

/** A hook-up wire along a smooth curve through the points. */
export function wire(points: readonly Pt[], s: WireStyle): Drawn {
  const d = smoothPath(points);
  return { body: insulation(d, s), shadow: [{ d, width: s.width ?? 9 }] };
}

/** A bare tinned wire, as used for the earth bus and short links. */
export function bareWire(points: readonly Pt[], width = 3.5): Drawn {
  const d = smoothPath(points);
  return {
    body:
      `<path d="${d}" fill="none" stroke="#5d605c" stroke-width="${f(width + 1.4)}" stroke-linecap="round"/>` +
      `<path d="${d}" fill="none" stroke="#d9dbd6" stroke-width="${f(width)}" stroke-linecap="round"/>`,
    shadow: [{ d, width }],
  };
}

/**
 * A lead whose perished rubber has split and fallen away between `gap[0]` and
 * `gap[1]`, leaving the stranded copper bare, with hairline cracks either side.
 */
export function crackedWire(before: readonly Pt[], gap: readonly [Pt, Pt], after: readonly Pt[], s: WireStyle): Drawn {
  const [a, b] = gap;
  const w = s.width ?? 9;
  const len = distance(a, b) || 1;
  const ux = (b[0] - a[0]) / len;
  const uy = (b[1] - a[1]) / len;
  const across = (p: Pt, k: number, half: number, tilt: number): string =>
    `M${f(p[0] + ux * k - uy * half + ux * tilt)} ${f(p[1] + uy * k + ux * half + uy * tilt)} L${f(p[0] + ux * k + uy * half - ux * tilt)} ${f(p[1] + uy * k - ux * half - uy * tilt)}`;
  // Local frame along the gap: u runs a→b, n across it.
  const at = (p: Pt, k: number, side: number): string =>
    `${f(p[0] + ux * k - uy * side)} ${f(p[1] + uy * k + ux * side)}`;
  let strands = '';
  for (let i = -3; i <= 3; i++) {
    const o = i * w * 0.1;
    const bow = i % 2 ? 1.5 : -1.5;
    strands += `<path d="M${at(a, -2, o)} Q${at(a, len / 2, o + bow)} ${at(b, 2, o)}" fill="none" stroke="${i % 2 ? '#f0b07a' : '#b8642c'}" stroke-width="${f(w * 0.12)}"/>`;
  }
  // Ragged lips of rubber where the insulation broke away.
  const lip = (p: Pt, dir: number): string => {
    const h = w / 2 + 0.8;
    const teeth = [h, h * 0.55, h * 0.1, -h * 0.4, -h].map((side, i) => at(p, dir * (i % 2 ? 11 : 3), side));
    return `<path d="M${at(p, -dir * 3, h)} L${teeth.join(' L')} L${at(p, -dir * 3, -h)} Z" fill="${s.colour}" stroke="${shade(s.colour, 0.45)}" stroke-width="1.2"/>`;
  };
  const cracks = [-9, -19, -31, -44, -60, -78]
    .map((k, i) => across(a, k, w * 0.62, i % 2 ? 3 : -2))
    .concat([9, 20, 33, 49, 66].map((k, i) => across(b, k, w * 0.62, i % 2 ? -3 : 2)))
    .map((d) => `<path d="${d}" stroke="#1a0e0a" stroke-width="2.2" stroke-linecap="round"/>`)
    .join('');
  const chalk = [-26, -52, 15, 40]
    .map((k) => {
      const p = k < 0 ? a : b;
      return `<circle cx="${f(p[0] + ux * k)}" cy="${f(p[1] + uy * k)}" r="${f(w * 0.3)}" fill="#e8c8b0" fill-opacity="0.35"/>`;
    })
    .join('');
  const body =
    `<path d="M${at(a, 0, 0)} L${at(b, 0, 0)}" stroke="#3b1d0c" stroke-width="${f(w * 0.86)}"/>` +
    `<path d="M${at(a, 0, 0)} L${at(b, 0, 0)}" stroke="#c8743a" stroke-width="${f(w * 0.74)}"/>${strands}` +
    `<path d="M${at(a, len * 0.55, w * 0.3)} q6 -4 12 -12 M${at(a, len * 0.4, -w * 0.3)} q5 5 9 13" stroke="#e8a070" stroke-width="1.6" fill="none"/>` +
    insulation(smoothPath([...before, a]), s).replace(/stroke-linecap="round"/g, 'stroke-linecap="butt"') +
    insulation(smoothPath([b, ...after]), s).replace(/stroke-linecap="round"/g, 'stroke-linecap="butt"') +
    lip(a, 1) +
    lip(b, -1) +
    chalk +
    cracks;
  const shadow = [{ d: smoothPath([...before, a, b, ...after]), width: w }];
  return { body, shadow };
}

/**
 * A twisted heater pair along `path`, the two wires parting at the end to their
 * own tags. The twist is drawn as two wires weaving across the centre line.
 */
export function twistedPair(path: readonly Pt[], endA: Pt, endB: Pt, s: WireStyle, pitch = 26): Drawn[] {
  const w = s.width ?? 7;
  const dense: Pt[] = [];
  for (let i = 0; i < path.length - 1; i++) {
    const p = path[i];
    const q = path[i + 1];
    if (!p || !q) continue;
    const steps = Math.max(1, Math.round(distance(p, q) / 6));
    for (let k = 0; k < steps; k++)
      dense.push([p[0] + ((q[0] - p[0]) * k) / steps, p[1] + ((q[1] - p[1]) * k) / steps]);
  }
  const last = path[path.length - 1];
  if (last) dense.push(last);
  const weave = (sign: number): Pt[] => {
    let run = 0;
    return dense.map((p, i) => {
      const prev = dense[Math.max(0, i - 1)] ?? p;
      const next = dense[Math.min(dense.length - 1, i + 1)] ?? p;
      run += i ? distance(prev, p) : 0;
      const len = distance(prev, next) || 1;
      const off = sign * Math.sin((run / pitch) * Math.PI) * w * 0.55;
      return [p[0] - ((next[1] - prev[1]) / len) * off, p[1] + ((next[0] - prev[0]) / len) * off];
    });
  };
  const a = weave(1);
  const b = weave(-1);
  return [wire([...b, endB], s), wire([...a, endA], s)];
}
