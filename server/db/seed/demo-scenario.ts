import type { Role } from '../../../shared/permissions';
import type { RestorationInput } from '../../../shared/schemas/restorations';

/**
 * The demo: an invented workshop, invented people, invented sets. Every name here is fictional.
 * Sign-in passwords are documented in the README; they are for the local demo only.
 */
export const DEMO_PASSWORD = 'valve-bench-demo';

export const demoPeople = {
  technician: { name: 'Mara Ellingsworth', email: 'mara@cobbold-lane.test' },
  mentor: { name: 'Teodor Brask', email: 'teodor@cobbold-lane.test' },
  owner: { name: 'Imogen Tarrant', email: 'imogen@example.test' },
} as const;

type DemoRestoration = RestorationInput & { serial: string; members: Partial<Record<keyof typeof demoPeople, Role>> };

export const demoRestorations: DemoRestoration[] = [
  {
    make: 'Ostrander & Vale',
    model: 'Meridian 54',
    year: 1954,
    serial: 'OV-54-20417',
    equipmentKind: 'radiogram',
    mainsSetting: '245 V tap (mains measured 236 V at the bench)',
    symptoms:
      'Plays for a few minutes, then distorts and fades away. A red glow inside one of the valves; the volume control crackles when turned.',
    conditionNotes:
      'Oak cabinet with a lift-up lid over the record deck; veneer lifting at the back left corner. Speaker cloth intact; one knob is a later replacement. Rubber-covered wiring stiff and cracking where it bends.',
    workLevel: 'full-restoration',
    hiddenPartsOriginal: true,
    story:
      "Imogen's parents were given it as a wedding present and played dance records on it every Saturday night until it went up to the loft.",
    receivedOn: '2026-11-12',
    stage: 'repair',
    members: { technician: 'technician', mentor: 'mentor', owner: 'owner' },
  },
  {
    make: 'Kestrel Wireless Co.',
    model: 'Wren AC/DC',
    year: 1949,
    serial: 'KW-3381',
    equipmentKind: 'radio',
    mainsSetting: 'AC/DC, dropper clip on the 230–250 V section',
    liveChassis: true,
    symptoms: 'Dead: no dial lamp, and none of the valves warms up.',
    conditionNotes:
      'Cream moulded cabinet with one chipped corner; back cover and its warning label present. Unplugged check: the heater chain is open at the dropper, whose second section reads open circuit with a burnt gap in the winding.',
    workLevel: 'make-it-play',
    receivedOn: '2026-11-26',
    stage: 'assessment',
    members: { technician: 'technician', mentor: 'mentor' },
  },
  {
    make: 'Halverson',
    model: 'Tonecraft 12',
    year: 1961,
    serial: 'HT12-0988',
    equipmentKind: 'amplifier',
    mainsSetting: '230 V',
    symptoms: 'Loud hum from both speakers even with the volume at zero, getting worse as it warms up.',
    conditionNotes:
      'Chassis lightly rusted around the output transformers. The reservoir can is dry: its seal has shrunk and it reads a fraction of its marked value.',
    workLevel: 'refurbish',
    receivedOn: '2026-10-30',
    stage: 'testing',
    members: { technician: 'technician', mentor: 'mentor' },
  },
];
