import { CERAMICS, CRACKED_LEAD, ELECTROLYTICS, GANG_TAGS, LUGS, MICAS, RESISTORS, WAX_CAPS } from './chassis-layout-components';
import { SOCKETS, STRIPS, UNDER, UNDER_CHASSIS, canTag, ifTag } from './chassis-layout-underside';
import { combine, grommet, nut, pencil, rectD, solder, stamp } from './chassis-parts';
import type { Drawn } from './chassis-parts';
import { canBase, coilFormer, earthLug, gangUnder, ifBase, rearPanel, selectorBack } from './chassis-parts-bases';
import { cordGrip, switchPot } from './chassis-parts-controls';
import { novalSocket, scorch, tagStrip } from './chassis-parts-sockets';
import { bodyCentre, ceramicDisc, micaCap, resistor, tubularElectrolytic, waxCap } from './chassis-parts-underside';
import { selectorTag, switchTags, undersideWiring, volumeTag } from './chassis-underside-wiring';
import { benchBackground, grime, photoFinish, shadowLayer, sharedDefs, steelSurface } from './chassis-defs';
import { angleOf, svgDocument } from './svg-kit';
import type { Pt } from './svg-kit';

/** The Meridian 54 turned over: sockets, tag strips, the small parts and the faults. */

const { x: cx, y: cy, w: cw, h: ch } = UNDER_CHASSIS;

/** Inside of the tray: the base plate framed by the four bent-up side walls. */
function tray(): string {
  const wall = 34;
  const outer = rectD(cx, cy, cw, ch);
  const inner = rectD(cx + wall, cy + wall, cw - 2 * wall, ch - 2 * wall);
  return (
    steelSurface(outer, 'under-walls', '#8d8f8a') +
    steelSurface(inner, 'under-base') + grime(33, cx + wall, cy + wall, cw - 2 * wall, ch - 2 * wall) +
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
    [mt.cx - mt.w / 2 + 6, mt.cy - 86], [mt.cx + mt.w / 2 - 6, mt.cy - 86], [mt.cx - mt.w / 2 + 6, mt.cy + 86], [mt.cx + mt.w / 2 - 6, mt.cy + 86],
    [ot.cx - ot.w / 2 + 6, ot.cy - 50], [ot.cx + ot.w / 2 - 6, ot.cy - 50], [ot.cx - ot.w / 2 + 6, ot.cy + 50], [ot.cx + ot.w / 2 - 6, ot.cy + 50],
  ].map(([x, y]) => nut(x ?? 0, y ?? 0, 13)).join('');
  const g = UNDER.grommets;
  return nuts + [g.secondary, g.heaters, g.primary, g.output].map(([x, y]) => grommet(x, y, 19)).join('') +
    grommet(UNDER.mainsEntry.at[0], UNDER.mainsEntry.at[1], 24) +
    Object.entries(LUGS).map(([, at], i) => earthLug(at, [200, 160, 270, 180][i] ?? 0)).join('');
}

function components(): Drawn[] {
  return [
    ...RESISTORS.map((r) => resistor(r)),
    ...WAX_CAPS.map((c) => waxCap(c)),
    ...ELECTROLYTICS.map((e) => tubularElectrolytic(e)),
    ...MICAS.map((m) => micaCap(m.a, m.b, m.print)),
    ...CERAMICS.map((c) => ceramicDisc(c.a, c.b, c.print, c.lift)),
  ];
}

/** Solder on every point a lead ends at. */
function joints(): string {
  const ends: Pt[] = [
    ...RESISTORS.flatMap((r) => [r.a, r.b]), ...WAX_CAPS.flatMap((c) => [c.a, c.b]),
    ...ELECTROLYTICS.flatMap((e) => [e.a, e.b]), ...MICAS.flatMap((m) => [m.a, m.b]), ...CERAMICS.flatMap((c) => [c.a, c.b]),
  ];
  return ends.map(([x, y]) => solder(x, y, 7)).join('');
}

/** The restorer's pencil marks: references beside the parts that matter. */
function pencilMarks(): string {
  const at = (ref: string, dx: number, dy: number): Pt => {
    const r = RESISTORS.find((x) => x.ref === ref) ?? ELECTROLYTICS.find((x) => x.ref === ref) ?? WAX_CAPS.find((x) => x.ref === ref);
    const c = r ? bodyCentre(r.a, r.b, r.lift) : [0, 0];
    return [c[0] + dx, c[1] + dy];
  };
  const mark = (ref: string, dx: number, dy: number, turn = -4): string => {
    const [x, y] = at(ref, dx, dy);
    return pencil(x, y, ref, turn);
  };
  const crack = CRACKED_LEAD.gap[0];
  return mark('R23', -190, 25, -3) + mark('C30', -40, -56, 2) + mark('C31', -95, -62) + mark('C14', 52, 30, -8) +
    pencil(crack[0] - 170, crack[1] - 66, 'perished', -8, 26);
}

export function undersideSvg(): string {
  const r23 = RESISTORS.find((r) => r.ref === 'R23');
  const c31 = ELECTROLYTICS.find((e) => e.ref === 'C31');
  const scorchMarks = [r23, c31].map((p) => (p ? scorch(bodyCentre(p.a, p.b, p.lift), p === r23 ? 140 : 95, p === r23 ? 72 : 48, angleOf(p.a, p.b)) : '')).join('');
  const parts: Drawn[] = [
    canBase(UNDER.canCapacitor.at, UNDER.canCapacitor.r, [canTag('A'), canTag('B'), canTag('common')]),
    ...UNDER.ifCans.map((c, i) => ifBase(c.at, [0, 1, 2, 3].map((n) => ifTag(i as 0 | 1, n as 0 | 1 | 2 | 3)))),
    gangUnder(GANG_TAGS, [[1660, 1010], [2040, 1010], [1850, 1150]]),
    selectorBack(UNDER.voltageSelector.at, UNDER.voltageSelector.r, [0, 1, 2, 3, 4, 5].map(selectorTag)),
    switchPot(UNDER.volume.at, UNDER.volume.r, [volumeTag(0), volumeTag(1), volumeTag(2)], switchTags()),
    ...SOCKETS.map((s) => novalSocket(s.at, s.turn, s.ref, s.label)),
    ...Object.values(STRIPS).map((s) => tagStrip(s)),
    ...undersideWiring(),
    cordGrip(UNDER.cordGrip.at, UNDER.cordGrip.width),
    rearPanel(UNDER.rearPanel.x, UNDER.rearPanel.y, UNDER.rearPanel.w, UNDER.rearPanel.h, ['FM', 'FM', 'A', 'E', 'LS', 'LS']),
    ...UNDER.coils.map((c) => coilFormer(c, 26)),
  ];
  const fixed = combine(parts);
  const small = combine(components());
  const body =
    benchBackground() + shadowLayer([{ d: rectD(cx, cy, cw, ch) }], [22, 28], 0.75, 1.2) + tray() + fixings() +
    scorchMarks + pencilMarks() +
    shadowLayer([...fixed.low, ...fixed.tall], [5, 7], 0.45) + fixed.body +
    shadowLayer([...small.low, ...small.tall], [9, 12], 0.5, 0.6) + small.body + joints() + photoFinish();
  return svgDocument(sharedDefs(), body);
}
