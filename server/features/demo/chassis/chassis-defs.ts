import { grainTile, mottleTile, streakTile } from './noise-tiles';
import { HEIGHT, WIDTH, f, seededRandom } from './svg-kit';
import type { Pt } from './svg-kit';
import type { ShadowShape } from './chassis-parts';

/**
 * Shared paints and the photographic finish. Filters in librsvg cost time in
 * proportion to the area they cover, so the only filters are the noise textures,
 * and those live inside small pattern tiles that repeat.
 */

const stop = (offset: number, colour: string, opacity = 1): string =>
  `<stop offset="${offset}" stop-color="${colour}"${opacity === 1 ? '' : ` stop-opacity="${opacity}"`}/>`;

function linear(id: string, stops: string, x2 = 0, y2 = 1): string {
  return `<linearGradient id="${id}" x1="0" y1="0" x2="${x2}" y2="${y2}">${stops}</linearGradient>`;
}

function radial(id: string, stops: string, fx = 0.5, fy = 0.5): string {
  return `<radialGradient id="${id}" cx="0.5" cy="0.5" r="0.5" fx="${fx}" fy="${fy}">${stops}</radialGradient>`;
}

/** A repeating image tile; `scale` enlarges it (the renderer smooths the pixels). */
function imagePattern(id: string, uri: string, tile: number, scale = 1): string {
  const size = tile * scale;
  return (
    `<pattern id="${id}" patternUnits="userSpaceOnUse" width="${size}" height="${size}">` +
    `<image width="${size}" height="${size}" href="${uri}" preserveAspectRatio="none"/></pattern>`
  );
}

let textures: string | undefined;

function noiseTextures(): string {
  textures ??=
    imagePattern('grain', grainTile(3), 256) +
    imagePattern('streaks', streakTile(7), 256) +
    imagePattern('mottle', mottleTile(11), 64, 9);
  return textures;
}

export function sharedDefs(): string {
  return [
    // Metals and materials, lit from the upper left.
    linear('steel', stop(0, '#c9cbc6') + stop(0.45, '#a9aba6') + stop(1, '#7f817c'), 1, 1),
    linear('alu', stop(0, '#f4f5f3') + stop(0.35, '#c9ccce') + stop(0.7, '#9ea2a5') + stop(1, '#d8dadb'), 1, 1),
    linear('aluBar', stop(0, '#eef0f0') + stop(0.5, '#a8acae') + stop(1, '#6f7376')),
    radial('aluTop', stop(0, '#f2f3f2') + stop(0.55, '#c4c7c9') + stop(0.9, '#8f9396') + stop(1, '#5f6366'), 0.35, 0.3),
    radial(
      'getter',
      stop(0, '#ffffff') +
        stop(0.18, '#e6e8ea') +
        stop(0.45, '#7b8086') +
        stop(0.7, '#e1e3e5') +
        stop(0.9, '#575b60') +
        stop(1, '#34383c'),
      0.34,
      0.3,
    ),
    radial(
      'glass',
      stop(0, '#eef4f2', 0) + stop(0.78, '#9fb4b0', 0.08) + stop(0.9, '#51625f', 0.45) + stop(1, '#1e2625', 0.85),
      0.45,
      0.42,
    ),
    radial('bakelite', stop(0, '#5a3a26') + stop(0.7, '#3a2418') + stop(1, '#1f140d'), 0.35, 0.3),
    radial('blackDisc', stop(0, '#3a3a3a') + stop(0.8, '#1c1c1c') + stop(1, '#0c0c0c'), 0.35, 0.3),
    linear('lam', stop(0, '#3d3f42') + stop(0.5, '#26282a') + stop(1, '#17181a'), 1, 1),
    linear('coil', stop(0, '#c8a46a') + stop(0.5, '#a57e45') + stop(1, '#6f522a'), 1, 0),
    linear('phenolic', stop(0, '#b07a45') + stop(0.5, '#8c5a2e') + stop(1, '#5e3a1b')),
    linear('tinned', stop(0, '#f0f0ea') + stop(0.5, '#b7b9b4') + stop(1, '#7d807c')),
    radial(
      'freshSolder',
      stop(0, '#ffffff') + stop(0.45, '#e8ecee') + stop(0.85, '#b4babe') + stop(1, '#8c9296'),
      0.35,
      0.3,
    ),
    linear('copper', stop(0, '#ffd1a1') + stop(0.45, '#d07a3c') + stop(1, '#7a3a14')),
    linear('brass', stop(0, '#f1dc97') + stop(0.5, '#c6a24e') + stop(1, '#7d6222')),
    // Cylinder shading laid over any tubular body drawn along x.
    linear(
      'cyl',
      stop(0, '#000', 0.35) +
        stop(0.18, '#fff', 0.45) +
        stop(0.32, '#fff', 0.1) +
        stop(0.75, '#000', 0.15) +
        stop(1, '#000', 0.55),
    ),
    radial('rust', stop(0, '#7a3b12', 0.55) + stop(0.6, '#8f4a1a', 0.25) + stop(1, '#8f4a1a', 0)),
    noiseTextures(),
    `<radialGradient id="light" gradientUnits="userSpaceOnUse" cx="${WIDTH / 2}" cy="${HEIGHT / 2}" r="${WIDTH * 0.62}" fx="${WIDTH * 0.36}" fy="${HEIGHT * 0.3}">` +
      stop(0, '#fff3dc', 0.2) +
      stop(0.3, '#fff3dc', 0.06) +
      stop(0.55, '#000', 0) +
      stop(0.8, '#000', 0.3) +
      stop(1, '#000', 0.62) +
      '</radialGradient>',
  ].join('');
}

/** The bench under the chassis: dark stained wood with a soft lamp pool. */
export function benchBackground(): string {
  const rnd = seededRandom(54);
  let grain = '';
  for (let i = 0; i < 70; i++) {
    const y = rnd() * HEIGHT;
    const wobble = 6 + rnd() * 20;
    const shade = rnd() < 0.5 ? '#000' : '#a0703f';
    grain +=
      `<path d="M0 ${f(y)} C${f(WIDTH * 0.3)} ${f(y - wobble)} ${f(WIDTH * 0.6)} ${f(y + wobble)} ${WIDTH} ${f(y + rnd() * 10 - 5)}" ` +
      `stroke="${shade}" stroke-width="${f(1 + rnd() * 5)}" stroke-opacity="${f(0.04 + rnd() * 0.1)}" fill="none"/>`;
  }
  return (
    `<rect width="${WIDTH}" height="${HEIGHT}" fill="#3b2a1c"/>` +
    `<rect width="${WIDTH}" height="${HEIGHT}" fill="url(#streaks)" fill-opacity="0.5"/>${grain}`
  );
}

/** Rolled-steel texture over a chassis surface given as an SVG path. */
export function steelSurface(pathD: string, id: string, base = 'url(#steel)'): string {
  return (
    `<clipPath id="surface-${id}"><path d="${pathD}"/></clipPath>` +
    `<g clip-path="url(#surface-${id})"><path d="${pathD}" fill="${base}"/>` +
    `<rect width="${WIDTH}" height="${HEIGHT}" fill="url(#mottle)" fill-opacity="0.07"/>` +
    `<rect width="${WIDTH}" height="${HEIGHT}" fill="url(#streaks)" fill-opacity="0.35"/></g>`
  );
}

/**
 * Seventy years of workshop: dust specks and a few rust freckles, scattered over a
 * box. A `cleaned` chassis keeps one speck in four and only the faintest trace of
 * two freckles; the random sequence is drawn in full either way, so what is left
 * sits exactly where it was.
 */
export function grime(seed: number, x: number, y: number, w: number, h: number, cleaned = false): string {
  const rnd = seededRandom(seed);
  let s = '';
  for (let i = 0; i < 360; i++) {
    const light = rnd() < 0.4;
    const speck = `<circle cx="${f(x + rnd() * w)}" cy="${f(y + rnd() * h)}" r="${f(0.8 + rnd() * 2.2)}" fill="${light ? '#f4efe4' : '#2a2218'}" fill-opacity="${f(0.15 + rnd() * 0.35)}"/>`;
    if (!cleaned || i % 4 === 0) s += speck;
  }
  for (let i = 0; i < 9; i++) {
    const edge = rnd() < 0.5;
    const rx = 14 + rnd() * 40;
    const freckle = `<ellipse cx="${f(edge ? x + 20 + rnd() * 60 : x + rnd() * w)}" cy="${f(edge ? y + rnd() * h : y + h - 20 - rnd() * 60)}" rx="${f(rx)}" ry="${f(rx * (0.5 + rnd() * 0.5))}" fill="url(#rust)"`;
    if (!cleaned) s += `${freckle}/>`;
    else if (i < 2) s += `${freckle} fill-opacity="0.3"/>`;
  }
  return s;
}

/** Everything a camera adds: the lamp's pool of light, falloff at the corners, a warm cast and grain. */
export function photoFinish(): string {
  return (
    `<rect width="${WIDTH}" height="${HEIGHT}" fill="#ffb35c" fill-opacity="0.05"/>` +
    `<rect width="${WIDTH}" height="${HEIGHT}" fill="url(#light)"/>` +
    `<rect width="${WIDTH}" height="${HEIGHT}" fill="url(#grain)" fill-opacity="0.6"/>`
  );
}

/** Spread (px) of each stacked shadow level: together they fake a soft penumbra. */
const PENUMBRA = [0, 5, 10, 16, 23, 31, 40];

/**
 * A soft shadow for a whole layer of parts, cast down-right from the lamp. A
 * blur filter over the picture costs seconds in librsvg, so the penumbra is
 * built from outlines grown step by step, each level a translucent group.
 */
export function shadowLayer(shapes: readonly ShadowShape[], offset: Pt, strength: number, spread = 1): string {
  if (shapes.length === 0) return '';
  const levels = PENUMBRA.map((grow) => {
    const g = grow * spread;
    const paths = shapes
      .map((s) =>
        s.width === undefined
          ? `<path d="${s.d}"/>`
          : `<path d="${s.d}" fill="none" stroke-width="${f(s.width + g)}"/>`,
      )
      .join('');
    return `<g opacity="${(strength / PENUMBRA.length).toFixed(3)}" stroke-width="${f(g)}">${paths}</g>`;
  }).join('');
  return `<g transform="translate(${f(offset[0])} ${f(offset[1])})" fill="#000" stroke="#000" stroke-linejoin="round" stroke-linecap="round">${levels}</g>`;
}
