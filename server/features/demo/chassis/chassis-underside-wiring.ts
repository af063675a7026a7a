import { CRACKED_LEAD, ELECTROLYTICS, GANG_TAGS, LUGS } from './chassis-layout-components';
import { UNDER, canTag, ifTag, pin, tag } from './chassis-layout-underside';
import type { Drawn } from './chassis-parts';
import { bareWire, crackedWire, twistedPair, wire } from './chassis-parts-wires';
import { HT_LEAD_ROUTE } from './chassis-restoration';
import type { ChassisState } from './chassis-restoration';
import type { Pt } from './svg-kit';

/** The hook-up wiring under the chassis, in the colours the factory used. */

const RED = '#b8281f';
const PERISHED_RED = '#8c3a2c';
const YELLOW = '#d8b21e';
const BLUE = '#2b55a6';
const GREEN = '#2f7d3c';
const WHITE = '#e6e1d2';
const BLACK = '#262626';
const BROWN = '#6a4125';
const VIOLET = '#6c4a9c';
/** The replacement lead: glossy orange PVC, a colour the period's hook-up wire came in. */
const NEW_PVC_ORANGE = '#d0621c';

const c30Plus: Pt = ELECTROLYTICS.find((e) => e.ref === 'C30')?.b ?? [990, 1250];

function volumeTag(i: 0 | 1 | 2): Pt {
  const [x, y] = UNDER.volume.at;
  const deg = [-150, -90, -30][i] ?? -90;
  return [x + Math.cos((deg * Math.PI) / 180) * 82, y + Math.sin((deg * Math.PI) / 180) * 82];
}

export function switchTags(): [Pt, Pt] {
  const [x, y] = UNDER.volume.at;
  return [
    [x - 92, y - 22],
    [x - 92, y + 24],
  ];
}

export function selectorTag(i: number): Pt {
  const [x, y] = UNDER.voltageSelector.at;
  const a = ((i * 60 + 30) * Math.PI) / 180;
  return [x + Math.cos(a) * 56, y + Math.sin(a) * 56];
}

export { volumeTag };

function coilPin(i: 0 | 1, deg: number): Pt {
  const [x, y] = UNDER.coils[i] ?? [0, 0];
  const a = (deg * Math.PI) / 180;
  return [x + Math.cos(a) * 26 * 1.3, y + Math.sin(a) * 26 * 1.3];
}

/** The lead from the transformer to V7's anode: perished, split rubber as found, new PVC after the work. */
function htLead(state: ChassisState): Drawn {
  return state === 'before'
    ? crackedWire(CRACKED_LEAD.before, CRACKED_LEAD.gap, CRACKED_LEAD.after, {
        colour: PERISHED_RED,
        width: 12,
        matte: true,
      })
    : wire(HT_LEAD_ROUTE, { colour: NEW_PVC_ORANGE, width: 11 });
}

export function undersideWiring(state: ChassisState = 'before'): Drawn[] {
  const g = UNDER.grommets;
  const [sw1, sw2] = switchTags();
  return [
    // Mains flex: in over the rear wall, under the cord grip, down to the selector.
    wire([[280, 0], [280, 205], [283, 268], [296, 340], [322, 480], [330, 640], [322, 790], selectorTag(4)], {
      colour: BROWN,
      width: 12,
    }),
    wire([[300, 0], [300, 205], [302, 268], [314, 340], [340, 480], [348, 640], [342, 790], selectorTag(5)], {
      colour: BROWN,
      width: 12,
    }),
    wire([sw1, [300, 1200], [262, 1030], [280, 930], selectorTag(2)], { colour: BROWN, width: 8 }),
    wire([sw2, [280, 1240], [236, 1040], [252, 930], selectorTag(3)], { colour: BLACK, width: 8 }),
    wire([g.primary, [300, 760], selectorTag(1)], { colour: BLACK, width: 8 }),
    wire([g.primary, [325, 740], selectorTag(0)], { colour: WHITE, width: 8 }),
    // HT: the second anode lead (sound), rectifier cathode to the can, can to the strips.
    wire([g.secondary, [680, 700], [780, 620], [860, 540], [960, 470], pin('V7', 7)], { colour: RED }),
    wire([pin('V7', 8), [1000, 540], [975, 650], canTag('A')], { colour: RED }),
    wire([canTag('B'), [960, 850], [1250, 872], [1580, 830], tag('TS1', 7)], { colour: RED }),
    wire([g.output, [1520, 680], tag('TS1', 7)], { colour: RED, width: 8 }),
    wire([pin('V5', 9), [1400, 470], [1455, 560], tag('TS1', 5)], { colour: RED, width: 8 }),
    wire([c30Plus, [1030, 1165], [1180, 1150], tag('TS2', 0)], { colour: RED, width: 8 }),
    // Output stage: the AF anode's lead over to the coupling capacitor on the output strip.
    wire([pin('V4', 6), [700, 990], [900, 905], [1180, 830], [1330, 790], tag('TS1', 4)], { colour: WHITE, width: 7 }),
    wire([g.output, [1430, 520], [1330, 420], pin('V5', 7)], { colour: BLUE, width: 8 }),
    wire([pin('V5', 3), [1275, 590], [1296, 680], tag('TS1', 3)], { colour: YELLOW, width: 8 }),
    // Signal wiring round the IF cans and the front end.
    wire([ifTag(0, 1), [1380, 1020], pin('V2', 8)], { colour: YELLOW, width: 7 }),
    wire([ifTag(0, 0), [1180, 990], pin('V3', 7)], { colour: BLUE, width: 7 }),
    wire([ifTag(1, 1), [930, 1000], pin('V3', 5)], { colour: YELLOW, width: 7 }),
    wire([ifTag(1, 3), [740, 1100], pin('V4', 1)], { colour: WHITE, width: 7 }),
    wire([pin('V1', 6), [2000, 760], GANG_TAGS[3] ?? [0, 0]], { colour: YELLOW, width: 7 }),
    wire([pin('V1', 7), [1950, 780], GANG_TAGS[2] ?? [0, 0]], { colour: WHITE, width: 7 }),
    wire([pin('V2', 9), [1560, 960], GANG_TAGS[0] ?? [0, 0]], { colour: GREEN, width: 7 }),
    wire([pin('V6', 3), [1200, 1240], tag('TS2', 1)], { colour: VIOLET, width: 7 }),
    wire([coilPin(0, 135), [1710, 1160], tag('TS5', 0)], { colour: YELLOW, width: 7 }),
    wire([coilPin(1, 135), [1900, 1170], tag('TS5', 3)], { colour: WHITE, width: 7 }),
    wire([coilPin(1, 225), [1880, 1000], GANG_TAGS[2] ?? [0, 0]], { colour: GREEN, width: 7 }),
    // Flat FM feeder from the aerial sockets to the RF stage.
    wire([[1668, 262], [1700, 380], [1790, 470], pin('V1', 2)], { colour: '#8a6a48', width: 9 }),
    wire([[1723, 262], [1748, 372], [1826, 456], pin('V1', 1)], { colour: '#8a6a48', width: 9 }),
    // Screened lead from the volume control to the AF grid.
    wire([volumeTag(2), [540, 1190], pin('V4', 5)], { colour: '#8d8f8c', width: 11, braid: true }),
    // Heaters, twisted in pairs from socket to socket.
    ...twistedPair([g.heaters, [720, 310], [850, 300]], pin('V7', 4), pin('V7', 5), { colour: GREEN, width: 7 }),
    ...twistedPair(
      [
        [950, 320],
        [1080, 330],
        [1170, 410],
      ],
      pin('V5', 5),
      pin('V5', 4),
      { colour: GREEN, width: 7 },
    ),
    ...twistedPair(
      [
        [1215, 420],
        [1240, 330],
        [1400, 290],
        [1650, 300],
        [1850, 400],
        [1925, 520],
      ],
      pin('V1', 4),
      pin('V1', 5),
      { colour: GREEN, width: 7 },
    ),
    // The earth bus along the front wall.
    bareWire([LUGS.E4, [720, 1335], [1400, 1342], LUGS.E2]),
    bareWire([tag('TS1', 0), [1090, 770], canTag('common')]),
    htLead(state),
  ];
}
