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
  owner: { name: 'Philippa Quayle', email: 'philippa@example.test' },
} as const;

type DemoRestoration = RestorationInput & { serial: string; members: Partial<Record<keyof typeof demoPeople, Role>> };

export const demoRestorations: DemoRestoration[] = [
  {
    make: 'Ostrander & Vale',
    model: 'Meridian 54',
    year: 1954,
    serial: 'OV-54-20417',
    equipmentKind: 'radio',
    mainsSetting: '220 V tap (household mains is 240 V)',
    symptoms: 'Hums loudly and nothing plays. A burning smell the last time it was switched on, years ago.',
    conditionNotes: 'Walnut cabinet sound, lacquer crazed on top; grille cloth sun-faded; all knobs present. Mains lead rubber perished.',
    workLevel: 'full-restoration',
    hiddenPartsOriginal: true,
    story: "Philippa's grandfather bought it the week the coronation was broadcast and listened to the shipping forecast on it every night.",
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
    mainsSetting: 'AC/DC, dropper tapped for 220–240 V',
    liveChassis: true,
    symptoms: 'Dead. Dial lamp does not light.',
    conditionNotes: 'Brown moulded cabinet with a hairline crack by the dial; back cover missing two screws.',
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
    symptoms: 'Crackles when the volume is turned; one channel fades after ten minutes.',
    conditionNotes: 'Chassis lightly rusted around the output transformers.',
    workLevel: 'refurbish',
    receivedOn: '2026-10-30',
    stage: 'testing',
    members: { technician: 'technician', mentor: 'mentor' },
  },
];
