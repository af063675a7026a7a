import { CERAMICS, CRACKED_LEAD, GANG_TAGS, LUGS, MICAS } from './chassis-layout-components';
import { SOCKETS, STRIPS, UNDER, UNDER_CHASSIS, canTag, ifTag } from './chassis-layout-underside';
import { combine, grommet, nut, pencil, rectD, solder, stamp } from './chassis-parts';
import type { Drawn } from './chassis-parts';
import { canBase, coilFormer, earthLug, gangUnder, ifBase, rearPanel, selectorBack } from './chassis-parts-bases';
import { cordGrip, switchPot } from './chassis-parts-controls';
import { novalSocket, tagStrip, waxStain } from './chassis-parts-sockets';
import { filmCap, modernElectrolytic } from './chassis-parts-replacements';
import { bodyCentre, ceramicDisc, micaCap, resistor, tubularElectrolytic, waxCap } from './chassis-parts-underside';
import { freshJoints, undersideParts } from './chassis-restoration';
import type { ChassisState, UndersideParts } from './chassis-restoration';
import { selectorTag, switchTags, undersideWiring, volumeTag } from './chassis-underside-wiring';
import { benchBackground, grime, photoFinish, shadowLayer, sharedDefs, steelSurface } from './chassis-defs';
import { angleOf, svgDocument } from './svg-kit';
import type { Pt } from './svg-kit';

/** The Meridian 54 radiogram's chassis turned over: sockets, tag strips, the small parts, and the faults or the work done on them. */

const { x: cx, y: cy, w: cw, h: ch } = UNDER_CHASSIS;

/** Inside of the tray: the base plate framed by the four bent-up side walls. */
function tray(state: ChassisState): string {
  const wall = 34;
  const outer = rectD(cx, cy, cw, ch);
  const inner = rectD(cx + wall, cy + wall, cw - 2 * wall, ch - 2 * wall);
  return (
    steelSurface(outer, 'under-walls', '#8d8f8a') +
    steelSurface(inner, 'under-base') +
    grime(33, cx + wall, cy + wall, cw - 2 * wall, ch - 2 * wall, state === 'after') +
    `<path d="${inner}" fill="none" stroke="#000" stroke-opacity="0.35" stroke-width="8"/>` +
    `<path d="${outer}" fill="none" stroke="#e8e9e4" stroke-opacity="0.6" stroke-width="3"/>` +
    stamp(1850, 1300, 'CH. 54/2', 22)
  );
}

/** Nuts of the parts bolted on top, and the grommets their leads come through. */
function fixings(): string {
  const mt = UNDER.mainsTransformer;
  const ot = UNDER.outputTransformer;
  const nuts = [
    [mt.cx - mt.w / 2 + 6, mt.cy - 86],
    [mt.cx + mt.w / 2 - 6, mt.cy - 86],
    [mt.cx - mt.w / 2 + 6, mt.cy + 86],
    [mt.cx + mt.w / 2 - 6, mt.cy + 86],
    [ot.cx - ot.w / 2 + 6, ot.cy - 50],
    [ot.cx + ot.w / 2 - 6, ot.cy - 50],
    [ot.cx - ot.w / 2 + 6, ot.cy + 50],
    [ot.cx + ot.w / 2 - 6, ot.cy + 50],
  ]
    .map(([x, y]) => nut(x ?? 0, y ?? 0, 13))
    .join('');
  const g = UNDER.grommets;
  return (
    nuts +
    [g.secondary, g.heaters, g.primary, g.output].map(([x, y]) => grommet(x, y, 19)).join('') +
    grommet(UNDER.mainsEntry.at[0], UNDER.mainsEntry.at[1], 24) +
    Object.entries(LUGS)
      .map(([, at], i) => earthLug(at, [200, 160, 270, 180][i] ?? 0))
      .join('')
  );
}

/** The small parts; each referenced one is grouped under `part-<ref>` so it can be found in the drawing. */
function components(p: UndersideParts): Drawn[] {
  const tagged = <T extends { ref: string }>(list: readonly T[], draw: (x: T) => Drawn): Drawn[] =>
    list.map((x) => {
      const d = draw(x);
      return { ...d, body: `<g id="part-${x.ref}">${d.body}</g>` };
    });
  return [
    ...tagged(p.resistors, resistor),
    ...tagged(p.waxCaps, waxCap),
    ...tagged(p.films, filmCap),
    ...tagged(p.electrolytics, tubularElectrolytic),
    ...tagged(p.newElectrolytics, modernElectrolytic),
    ...MICAS.map((m) => micaCap(m.a, m.b, m.print)),
    ...CERAMICS.map((c) => ceramicDisc(c.a, c.b, c.print, c.lift)),
  ];
}

/** Solder on every point a lead ends at; where the iron has been lately, it is bright. */
function joints(p: UndersideParts, state: ChassisState): string {
  const ends: Pt[] = [
    ...p.resistors.flatMap((r) => [r.a, r.b]),
    ...p.waxCaps.flatMap((c) => [c.a, c.b]),
    ...p.films.flatMap((c) => [c.a, c.b]),
    ...p.electrolytics.flatMap((e) => [e.a, e.b]),
    ...p.newElectrolytics.flatMap((e) => [e.a, e.b]),
    ...MICAS.flatMap((m) => [m.a, m.b]),
    ...CERAMICS.flatMap((c) => [c.a, c.b]),
  ];
  const key = ([x, y]: Pt): string => `${x.toFixed(1)},${y.toFixed(1)}`;
  const fresh = new Map(freshJoints(state).map((pt) => [key(pt), pt]));
  const old = ends
    .filter((e) => !fresh.has(key(e)))
    .map(([x, y]) => solder(x, y, 7))
    .join('');
  return old + [...fresh.values()].map(([x, y]) => solder(x, y, 7, true)).join('');
}

const TICK = '✓';

/** The restorer's pencil marks: references beside the parts that matter, ticked once the work is done. */
function pencilMarks(p: UndersideParts, state: ChassisState): string {
  const at = (ref: string, dx: number, dy: number): Pt => {
    const r = [...p.resistors, ...p.electrolytics, ...p.newElectrolytics, ...p.waxCaps, ...p.films].find(
      (x) => x.ref === ref,
    );
    const c = r ? bodyCentre(r.a, r.b, r.lift) : [0, 0];
    return [c[0] + dx, c[1] + dy];
  };
  const done = state === 'after';
  // A ticked note is wider; it grows to the right so it stays clear of what is on its left.
  const mark = (ref: string, dx: number, dy: number, turn = -4): string => {
    const [x, y] = at(ref, dx + (done ? 14 : 0), dy);
    return pencil(x, y, done ? `${TICK} ${ref}` : ref, turn);
  };
  const crack = CRACKED_LEAD.gap[0];
  const [vx, vy] = UNDER.volume.at;
  if (!done) {
    return (
      mark('C27', -185, -95, -3) +
      mark('R28', 178, 30, -6) +
      mark('C14', 52, 30, -8) +
      pencil(crack[0] - 170, crack[1] - 66, 'perished', -8, 26) +
      pencil(vx + 150, vy + 14, 'crackles', -4, 24)
    );
  }
  return (
    mark('C27', -185, -95, -3) +
    mark('R28', 178, 30, -6) +
    mark('C14', 52, 30, -8) +
    pencil(crack[0] - 160, crack[1] - 66, `${TICK} new lead`, -8, 26) +
    pencil(vx + 160, vy + 14, `${TICK} cleaned`, -4, 24)
  );
}

export function undersideSvg(state: ChassisState = 'before'): string {
  const p = undersideParts(state);
  const c27 = p.waxCaps.find((c) => c.ref === 'C27');
  // Only the leaky capacitor as found has shed wax onto the steel; after the work it has been cleaned off.
  const stains = c27 ? waxStain(bodyCentre(c27.a, c27.b, c27.lift), 95, 40, angleOf(c27.a, c27.b)) : '';
  const parts: Drawn[] = [
    canBase(UNDER.canCapacitor.at, UNDER.canCapacitor.r, [canTag('A'), canTag('B'), canTag('common')]),
    ...UNDER.ifCans.map((c, i) =>
      ifBase(
        c.at,
        [0, 1, 2, 3].map((n) => ifTag(i as 0 | 1, n as 0 | 1 | 2 | 3)),
      ),
    ),
    gangUnder(GANG_TAGS, [
      [1660, 1010],
      [2040, 1010],
      [1850, 1150],
    ]),
    selectorBack(UNDER.voltageSelector.at, UNDER.voltageSelector.r, [0, 1, 2, 3, 4, 5].map(selectorTag)),
    switchPot(UNDER.volume.at, UNDER.volume.r, [volumeTag(0), volumeTag(1), volumeTag(2)], switchTags()),
    ...SOCKETS.map((s) => novalSocket(s.at, s.turn, s.ref, s.label)),
    ...Object.values(STRIPS).map((s) => tagStrip(s)),
    ...undersideWiring(state),
    cordGrip(UNDER.cordGrip.at, UNDER.cordGrip.width),
    rearPanel(UNDER.rearPanel.x, UNDER.rearPanel.y, UNDER.rearPanel.w, UNDER.rearPanel.h, [
      'FM',
      'FM',
      'A',
      'E',
      'LS',
      'LS',
    ]),
    ...UNDER.coils.map((c) => coilFormer(c, 26)),
  ];
  const fixed = combine(parts);
  const small = combine(components(p));
  const body =
    benchBackground() +
    shadowLayer([{ d: rectD(cx, cy, cw, ch) }], [22, 28], 0.75, 1.2) +
    tray(state) +
    fixings() +
    stains +
    pencilMarks(p, state) +
    shadowLayer([...fixed.low, ...fixed.tall], [5, 7], 0.45) +
    fixed.body +
    shadowLayer([...small.low, ...small.tall], [9, 12], 0.5, 0.6) +
    small.body +
    joints(p, state) +
    photoFinish();
  return svgDocument(sharedDefs(), body);
}
