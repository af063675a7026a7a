import { NO_SOURCE, type Symptom } from './symptom-types';

/** Faults heard in the audio stages. Our own words, from the trade notes (TRADE.md §5, §7). */
export const audioSymptoms: Symptom[] = [
  {
    id: 'silent-valves-light',
    title: 'No sound, but the valves light',
    description: 'Heaters glow and the dial lights, yet the speaker is silent even with the volume up.',
    causes: [
      {
        id: 'ot-primary-open',
        cause: 'Output transformer primary open',
        source: 'S34',
        test: {
          where: 'Output valve anode',
          how: 'Measure the DC voltage at the output valve anode to chassis.',
          expected: 'Close to the HT (the chart figure); near 0 V with HT present means an open primary.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'Output valve anode',
        },
      },
      {
        id: 'tone-cap-short',
        cause: 'Tone capacitor across the primary shorted',
        source: 'S34',
        test: {
          where: 'Across the output transformer primary',
          how: 'Unplugged and discharged, measure resistance across the primary, then with the tone capacitor lifted.',
          expected:
            'A few hundred ohms (from memory) either way; near 0 Ω that rises when the capacitor is lifted condemns it.',
          powered: false,
          quantity: 'resistance',
          location: 'OT primary',
        },
      },
      {
        id: 'no-ht',
        cause: 'No HT reaching the stages (rectifier, smoothing choke or resistor open)',
        source: NO_SOURCE,
        test: {
          where: 'HT after the smoothing choke or resistor',
          how: 'Measure DC voltage to chassis.',
          expected: 'The chart figure, within about 20 %.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'HT after smoothing',
        },
      },
      {
        id: 'speaker-open',
        cause: 'Speaker voice coil or its lead open',
        source: NO_SOURCE,
        test: {
          where: 'Speaker tags, lead unsoldered',
          how: 'Unplugged, measure resistance across the voice coil.',
          expected: 'A few ohms (close to the marked impedance, a little below).',
          powered: false,
          quantity: 'resistance',
          location: 'Speaker coil',
        },
      },
    ],
  },
  {
    id: 'crackle-volume',
    title: 'Crackles when the volume is turned',
    description: 'Scratching or crackling only while a control is being turned.',
    causes: [
      {
        id: 'dirty-pot',
        cause: 'Dirty or worn track in the potentiometer',
        source: 'S12c',
        test: {
          where: 'Volume control wiper',
          how: 'Unplugged, measure wiper to one end while turning slowly.',
          expected: 'The resistance changes smoothly with no jumps or open spots.',
          powered: false,
          quantity: 'resistance',
          location: 'Volume control',
        },
      },
      {
        id: 'leaky-coupling-dc',
        cause: 'A leaky coupling capacitor puts DC across the control',
        source: 'S12c',
        test: {
          where: 'Volume control wiper to chassis',
          how: 'Measure DC voltage on the wiper.',
          expected: '0 V (a few tenths at most); any steady DC points to the coupling capacitor feeding it.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'Volume control wiper',
        },
      },
    ],
  },
  {
    id: 'distortion-loud',
    title: 'Distortion on loud passages',
    description: 'Clean at low volume, rough or buzzy as the volume rises.',
    causes: [
      {
        id: 'leaky-coupling-output',
        cause: 'Leaky coupling capacitor to the output grid',
        source: 'S33, S12b',
        test: {
          where: 'Output valve control grid',
          how: 'Measure DC voltage at the output grid to chassis.',
          expected:
            '0 V or slightly negative in a cathode-biased stage; any positive voltage condemns the coupling capacitor.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'Output valve grid',
        },
      },
      {
        id: 'bias-wrong',
        cause: 'Output stage bias wrong (cathode resistor drifted or bypass capacitor dried out)',
        source: 'S12b',
        test: {
          where: 'Output valve cathode',
          how: 'Measure DC voltage from cathode to chassis.',
          expected: 'The chart figure (typically a few volts to about 15 V, from memory).',
          powered: true,
          quantity: 'dc-voltage',
          location: 'Output valve cathode',
        },
      },
      {
        id: 'weak-output-valve',
        cause: 'Worn output valve',
        source: NO_SOURCE,
        test: {
          where: 'Output valve',
          how: 'Test on a valve tester, or substitute a known good valve.',
          expected: "Emission within the tester's good band; the distortion goes with a good valve.",
          powered: true,
        },
      },
    ],
  },
  {
    id: 'red-plating',
    title: 'Output valve anode glows red',
    description: "The output valve's anode shows a dull red patch after a few minutes.",
    causes: [
      {
        id: 'coupling-positive',
        cause: 'Leaky coupling capacitor puts positive DC on the output grid',
        source: 'S33, S12b',
        test: {
          where: 'Output valve control grid',
          how: 'Measure DC voltage grid to chassis.',
          expected: '0 V or negative; any positive voltage is the fault.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'Output valve grid',
        },
      },
      {
        id: 'lost-bias',
        cause: 'Lost negative bias (bias supply or cathode resistor shorted)',
        source: 'S12b',
        test: {
          where: 'Output valve cathode (or the bias supply)',
          how: 'Measure DC voltage cathode to chassis.',
          expected: 'The chart figure; near 0 V in a cathode-biased stage means the bias is gone.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'Output valve cathode',
        },
      },
      {
        id: 'screen-resistor',
        cause: 'Screen resistor shorted or valve running too hot',
        source: 'S33',
        test: {
          where: 'Screen grid resistor',
          how: 'Unplugged, measure its resistance out of circuit.',
          expected: 'Within 20 % of its marked value.',
          powered: false,
          quantity: 'resistance',
          location: 'Screen resistor',
        },
      },
    ],
  },
  {
    id: 'charred-cathode',
    title: 'Charred cathode resistor or worn-out output valve',
    description: 'A burnt cathode resistor, or a new output valve that soon wears out.',
    causes: [
      {
        id: 'bypass-short',
        cause: 'Cathode bypass electrolytic shorted',
        source: 'W5, S12b',
        test: {
          where: 'Across the cathode bypass capacitor',
          how: 'Unplugged, lift one end and measure its resistance.',
          expected: 'Rises toward megohms as it charges; a few ohms means it is shorted.',
          powered: false,
          quantity: 'resistance',
          location: 'Cathode bypass',
        },
      },
      {
        id: 'valve-internal-short',
        cause: 'Internal short in the valve',
        source: 'S12b',
        test: {
          where: 'Output valve',
          how: 'Test for shorts on a valve tester.',
          expected: 'No short between any electrodes.',
          powered: true,
        },
      },
      {
        id: 'shorted-caps-elsewhere',
        cause: 'Overheated resistors elsewhere point to shorted capacitors downstream',
        source: 'S27b',
        test: {
          where: 'Each capacitor fed by a discoloured resistor',
          how: 'Unplugged, lift one end and measure leakage at its working voltage.',
          expected: 'Leakage below the limit for its type and rating.',
          powered: false,
          quantity: 'leakage',
          location: 'Capacitor',
        },
      },
    ],
  },
  {
    id: 'fades-warm',
    title: 'Fades after warming up',
    description: 'Plays normally for a while, then the volume sinks as the set warms.',
    causes: [
      {
        id: 'leaky-coupling-warm',
        cause: 'A coupling capacitor that leaks more as it warms',
        source: `${NO_SOURCE} (from memory)`,
        test: {
          where: 'Grids of the audio and output valves, cold then warm',
          how: 'Measure DC voltage on each grid just after switch-on and again once it has faded.',
          expected:
            'Steady at 0 V or slightly negative; a voltage that creeps positive as it fades points at the capacitor feeding that grid.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'Output valve grid',
        },
      },
      {
        id: 'ht-sags',
        cause: 'HT sagging as a capacitor or rectifier weakens with heat',
        source: NO_SOURCE,
        test: {
          where: 'HT after smoothing, cold then warm',
          how: 'Measure DC voltage at switch-on and again once faded.',
          expected: 'Within about 20 % of the chart both times; a steady fall points at the rectifier or reservoir.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'HT after smoothing',
        },
      },
      {
        id: 'valve-heat',
        cause: 'A valve whose emission fails as it heats',
        source: NO_SOURCE,
        test: {
          where: 'Each valve in turn',
          how: 'Once faded, tap gently or cool each valve with a little freezer spray, or substitute.',
          expected: 'No change; the faulty valve brings the sound back when cooled or swapped.',
          powered: true,
        },
      },
    ],
  },
  {
    id: 'microphonic',
    title: 'Rings when tapped',
    description: 'Tapping the cabinet or a valve makes a bell-like ring from the speaker.',
    causes: [
      {
        id: 'microphonic-valve',
        cause: 'Microphonic valve (loose electrodes)',
        source: 'S36',
        test: {
          where: 'Each valve in turn',
          how: 'With the set playing quietly, tap each valve with a pencil end.',
          expected: 'A dull knock at most; the valve that rings loudly is microphonic.',
          powered: true,
        },
      },
    ],
  },
];
