import { CRACKED_LEAD, ELECTROLYTICS, RESISTORS, WAX_CAPS } from './chassis-layout-components';
import { TOP, VALVES, VALVE_R } from './chassis-layout-top';
import { SOCKETS, UNDER } from './chassis-layout-underside';
import { NOVAL } from './chassis-parts-sockets';
import { bodyCentre } from './chassis-parts-underside';
import { HEIGHT, WIDTH, midpoint } from './svg-kit';
import type { Pt } from './svg-kit';

export type ChassisView = 'top' | 'underside';

/**
 * A notable part on a picture: centre as a fraction of width (x) and height (y),
 * radius as a fraction of width, so a finding can be pinned exactly on it.
 */
export interface Landmark {
  x: number;
  y: number;
  r: number;
  label: string;
}

function mark(at: Pt, radiusPx: number, label: string): Landmark {
  return { x: at[0] / WIDTH, y: at[1] / HEIGHT, r: radiusPx / WIDTH, label };
}

function topLandmarks(): Record<string, Landmark> {
  const { mainsTransformer: mt, outputTransformer: ot, gang } = TOP;
  const out: Record<string, Landmark> = {
    mainsTransformer: mark([mt.cx, mt.cy], Math.hypot(mt.w, mt.h) / 2, 'Mains transformer 54-T1'),
    outputTransformer: mark([ot.cx, ot.cy], Math.hypot(ot.w, ot.h) / 2, 'Output transformer 54-T3'),
    canCapacitor: mark(TOP.canCapacitor.at, TOP.canCapacitor.r, 'Can electrolytic 32+32 µF 350 V'),
    tuningGang: mark([gang.x + gang.w / 2, gang.y + gang.h / 2], Math.hypot(gang.w, gang.h) / 2, 'Tuning gang'),
    dialPulley: mark(TOP.dialPulley.at, TOP.dialPulley.r, 'Dial-cord pulley'),
    voltageSelector: mark(TOP.voltageSelector.at, TOP.voltageSelector.r, 'Mains voltage selector, set to 245 V'),
  };
  for (const can of TOP.ifCans) out[can.ref] = mark(can.at, (can.size / 2) * Math.SQRT2, `${can.ref} IF transformer`);
  for (const v of VALVES) out[v.ref] = mark(v.at, VALVE_R, `${v.ref} ${v.type}, ${v.role}`);
  return out;
}

function undersideLandmarks(): Record<string, Landmark> {
  const out: Record<string, Landmark> = {
    crackedLead: mark(
      midpoint(...CRACKED_LEAD.gap),
      40,
      'Rubber-insulated lead, transformer to V7 anode, perished and split to the copper',
    ),
    volumeControl: mark(UNDER.volume.at, UNDER.volume.r + 30, 'Volume control R20 with mains switch'),
    mainsEntry: mark(UNDER.cordGrip.at, UNDER.cordGrip.width / 2 + 10, 'Mains lead entry and cord grip'),
    voltageSelector: mark(UNDER.voltageSelector.at, UNDER.voltageSelector.r, 'Mains voltage selector, wiring side'),
    canCapacitor: mark(UNDER.canCapacitor.at, UNDER.canCapacitor.r, 'Can electrolytic base and tags'),
  };
  for (const s of SOCKETS) out[`${s.ref}socket`] = mark(s.at, NOVAL.body + 16, `${s.ref} socket`);
  for (const r of RESISTORS)
    out[r.ref] = mark(bodyCentre(r.a, r.b, r.lift), r.watts === 1 ? 62 : 52, `${r.ref} ${r.note ?? ''}`.trim());
  for (const c of ELECTROLYTICS)
    out[c.ref] = mark(bodyCentre(c.a, c.b, c.lift), c.len / 2 + 14, `${c.ref} ${c.note ?? c.lines.join(' ')}`);
  for (const c of WAX_CAPS)
    out[c.ref] = mark(bodyCentre(c.a, c.b, c.lift), (c.len ?? 150) / 2, `${c.ref} ${c.note ?? c.print}`);
  return out;
}

/** Notable parts of a view, keyed by name (`C27`, `R28`, `crackedLead`, `volumeControl`, `V5socket`, `V5`, …). */
export function chassisLandmarks(view: ChassisView): Record<string, Landmark> {
  return view === 'top' ? topLandmarks() : undersideLandmarks();
}

/** A patch of bare chassis on each view, for comparing against (normalised like a landmark). */
export function plainChassisSpot(view: ChassisView): { x: number; y: number } {
  const at = view === 'top' ? TOP.plainSpot : UNDER.plainSpot;
  return { x: at[0] / WIDTH, y: at[1] / HEIGHT };
}
