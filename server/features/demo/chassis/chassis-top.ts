import { CHASSIS, TOP, VALVES, VALVE_R } from './chassis-layout-top';
import { combine, grommet, hole, rectD, rivet, stamp } from './chassis-parts';
import { wire } from './chassis-parts-wires';
import type { Drawn } from './chassis-parts';
import { cord, cordPulley, dialDrum, ferriteRod, voltageSelector } from './chassis-parts-controls';
import { TALL_OFFSET, canTop, gangTop, ifCanTop, transformerTop, valveTop } from './chassis-parts-top';
import { benchBackground, grime, photoFinish, shadowLayer, sharedDefs, steelSurface } from './chassis-defs';
import type { ChassisState } from './chassis-restoration';
import { svgDocument, text } from './svg-kit';

/**
 * The Meridian 54 radiogram's chassis from above, as a restorer photographs it before
 * any work and again after it, once the steel is cleaned.
 */

const { x: cx, y: cy, w: cw, h: ch } = CHASSIS;

function plate(state: ChassisState): string {
  const d = `M${cx + 10} ${cy} H${cx + cw - 10} Q${cx + cw} ${cy} ${cx + cw} ${cy + 10} V${cy + ch - 10} Q${cx + cw} ${cy + ch} ${cx + cw - 10} ${cy + ch} H${cx + 10} Q${cx} ${cy + ch} ${cx} ${cy + ch - 10} V${cy + 10} Q${cx} ${cy} ${cx + 10} ${cy} Z`;
  const edges =
    `<path d="M${cx + 4} ${cy + ch - 6} V${cy + 4} H${cx + cw - 6}" stroke="#f4f4ee" stroke-width="5" fill="none" stroke-opacity="0.8"/>` +
    `<path d="M${cx + cw - 3} ${cy + 6} V${cy + ch - 3} H${cx + 6}" stroke="#2d2e2b" stroke-width="6" fill="none" stroke-opacity="0.8"/>`;
  const holes = [
    hole(1700, 1250, 22),
    hole(2180, 1300, 12),
    rivet(180, 220, 6),
    rivet(2220, 220, 6),
    rivet(180, 1360, 6),
    rivet(2220, 1360, 6),
  ].join('');
  const marks =
    stamp(1720, 1345, 'CH. 54/2', 22) +
    `<rect x="1820" y="1218" width="200" height="64" fill="#e9e1c8" stroke="#9a8f70" stroke-width="1" transform="rotate(-3 1920 1250)"/>` +
    text(1920, 1244, 'MERIDIAN 54', { size: 18, fill: '#2b2b35', weight: 'bold', rotate: -3 }) +
    text(1921, 1268, 'No 10417', { size: 16, fill: '#2b2b35', family: 'mono', rotate: -3 });
  const valveMarks = VALVES.map((v) => stamp(v.at[0] - VALVE_R * 1.55, v.at[1] + VALVE_R * 1.5, v.ref, 20)).join('');
  return steelSurface(d, 'top') + grime(21, cx, cy, cw, ch, state === 'after') + edges + holes + marks + valveMarks;
}

function benchShadow(): string {
  return shadowLayer([{ d: rectD(cx, cy, cw, ch) }], [22, 28], 0.75, 1.2);
}

function wiring(): Drawn[] {
  const mt = TOP.mainsTransformer;
  const ot = TOP.outputTransformer;
  return [
    // Primary leads down to the voltage selector underneath; heater leads to their own grommet.
    wire(
      [
        [mt.cx + 150, mt.cy + 150],
        [mt.cx + 150, mt.cy + 190],
        [2128, 690],
      ],
      { colour: '#262626', width: 8 },
    ),
    wire(
      [
        [mt.cx + 125, mt.cy + 152],
        [mt.cx + 128, mt.cy + 200],
        [2120, 700],
      ],
      { colour: '#e6e1d2', width: 8 },
    ),
    wire(
      [
        [mt.cx - 150, mt.cy - 120],
        [mt.cx - 190, mt.cy - 122],
        [1762, 382],
      ],
      { colour: '#2f7d3c', width: 7 },
    ),
    wire(
      [
        [mt.cx - 150, mt.cy - 100],
        [mt.cx - 185, mt.cy - 100],
        [1758, 384],
      ],
      { colour: '#2f7d3c', width: 7 },
    ),
    // Secondary leads dropping through a grommet beside the transformer.
    wire(
      [
        [mt.cx - 120, mt.cy + 150],
        [mt.cx - 150, mt.cy + 200],
        [mt.cx - 190, mt.cy + 230],
      ],
      { colour: '#b32a22' },
    ),
    wire(
      [
        [mt.cx - 90, mt.cy + 152],
        [mt.cx - 140, mt.cy + 210],
        [mt.cx - 186, mt.cy + 236],
      ],
      { colour: '#2d7a3a' },
    ),
    wire(
      [
        [mt.cx - 60, mt.cy + 152],
        [mt.cx - 120, mt.cy + 222],
        [mt.cx - 182, mt.cy + 242],
      ],
      { colour: '#e2ddcc' },
    ),
    // Speaker leads from the output transformer, off over the back edge.
    wire(
      [
        [ot.cx - 60, ot.cy - 90],
        [ot.cx - 80, ot.cy - 160],
        [ot.cx - 70, 150],
        [ot.cx - 80, 0],
      ],
      { colour: '#d9b52a', width: 8 },
    ),
    wire(
      [
        [ot.cx - 35, ot.cy - 90],
        [ot.cx - 55, ot.cy - 160],
        [ot.cx - 48, 150],
        [ot.cx - 58, 0],
      ],
      { colour: '#222222', width: 8 },
    ),
    // Primary leads through a grommet.
    wire(
      [
        [ot.cx + 60, ot.cy + 90],
        [ot.cx + 70, ot.cy + 120],
        [ot.cx + 96, ot.cy + 132],
      ],
      { colour: '#2753a8', width: 8 },
    ),
    wire(
      [
        [ot.cx + 30, ot.cy + 92],
        [ot.cx + 52, ot.cy + 130],
        [ot.cx + 92, ot.cy + 140],
      ],
      { colour: '#b32a22', width: 8 },
    ),
    // Dial lamp leads, off to the left where the dial glass would be.
    wire(
      [
        [200, 560],
        [160, 560],
        [110, 600],
        [0, 610],
      ],
      { colour: '#2d7a3a', width: 7 },
    ),
    wire(
      [
        [200, 575],
        [165, 578],
        [115, 620],
        [0, 630],
      ],
      { colour: '#2d7a3a', width: 7 },
    ),
    // Litz leads from the rod aerial's coils down through the chassis.
    wire(
      [
        [TOP.ferriteRod.x1 + 90, TOP.ferriteRod.y + 30],
        [420, 350],
        [560, 340],
        [630, 304],
      ],
      { colour: '#b58a3a', width: 4 },
    ),
    wire(
      [
        [TOP.ferriteRod.x1 + 250, TOP.ferriteRod.y + 30],
        [560, 350],
        [634, 314],
      ],
      { colour: '#b58a3a', width: 4 },
    ),
  ];
}

function dialCord(): Drawn[] {
  const { drum, dialPulley } = TOP;
  const p = dialPulley.at;
  return [
    cord([
      [drum.x + 30, drum.y + drum.h - 10],
      [p[0] - dialPulley.r + 4, p[1] - 6],
      [p[0] - dialPulley.r, p[1] + 10],
    ]),
    cord([
      [p[0] + dialPulley.r - 2, p[1] + 8],
      [p[0] + 60, 1600],
    ]),
    cord([
      [drum.x + 40, drum.y + 8],
      [drum.x + 40, drum.y - 40],
      [205, 860],
      [205, 1600],
    ]),
  ];
}

export function topSvg(state: ChassisState = 'before'): string {
  const { mainsTransformer: mt, outputTransformer: ot, canCapacitor: can, gang, drum } = TOP;
  const parts: Drawn[] = [
    ...wiring(),
    ...dialCord(),
    transformerTop({
      ...mt,
      plate: [
        'OSTRANDER & VALE',
        'MAINS TRANSFORMER 54-T1',
        'Prim. 110–245 V ~ 50 c/s',
        'Sec. 2×280 V 85 mA',
        '6,3 V 2,5 A',
      ],
    }),
    transformerTop({ ...ot, plate: ['O&V 54-T3', 'OUTPUT 5k5 : 3 Ω', '5 W'] }),
    canTop(can.at, can.r, ['32+32µF', '350V', 'O&V · 54 · +60°C']),
    ...TOP.ifCans.map((c, i) => ifCanTop(c.at, c.size, [c.ref, i === 0 ? '10,7 Mc · 472 kc' : '10,7 / 472 kc'])),
    gangTop(gang.x, gang.y, gang.w, gang.h),
    dialDrum(drum.x, drum.y, drum.w, drum.h),
    cordPulley(TOP.dialPulley.at, TOP.dialPulley.r),
    voltageSelector(TOP.voltageSelector.at, TOP.voltageSelector.r, '245'),
    ...VALVES.map((v) => valveTop({ at: v.at, r: VALVE_R, type: v.type, turn: v.turn, plate: v.plate })),
    ferriteRod(TOP.ferriteRod.x1, TOP.ferriteRod.x2, TOP.ferriteRod.y),
  ];
  const layers = combine(parts);
  const grommets = [
    grommet(mt.cx - 195, mt.cy + 240, 19),
    grommet(ot.cx + 100, ot.cy + 138, 19),
    grommet(2130, 700, 19),
    grommet(1760, 380, 19),
    grommet(640, 306, 16),
    grommet(212, 568, 16),
  ].join('');
  const body =
    benchBackground() +
    benchShadow() +
    plate(state) +
    grommets +
    shadowLayer(layers.low, [5, 7], 0.5) +
    shadowLayer(layers.tall, TALL_OFFSET, 0.55) +
    layers.body +
    photoFinish();
  return svgDocument(sharedDefs(), body);
}
