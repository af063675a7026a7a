import { NO_SOURCE, type Symptom } from './symptom-types';

/** Faults of the power supply and of a set that does nothing at all. Our own words, from the trade notes (TRADE.md §5, §7). */
export const powerSymptoms: Symptom[] = [
  {
    id: 'dead-dial-dark',
    title: 'Set dead, dial lamp dark',
    description: 'Nothing lights and nothing warms up when the set is switched on.',
    causes: [
      {
        id: 'mains-lead-fuse',
        cause: 'Open mains lead, plug fuse or on/off switch',
        source: NO_SOURCE,
        test: {
          where: 'Across the mains plug pins, set switched on',
          how: 'Unplugged, measure resistance with the switch on and then off.',
          expected:
            'A few ohms to a few tens of ohms with the switch on (transformer primary or heater chain); open with it off.',
          powered: false,
          quantity: 'resistance',
          location: 'Mains plug',
        },
      },
      {
        id: 'primary-open',
        cause: 'Mains transformer primary open (often after an overload)',
        source: NO_SOURCE,
        test: {
          where: 'Mains transformer primary tags',
          how: 'Unplugged, measure resistance across the primary winding in use.',
          expected: 'Tens of ohms (from memory); open circuit condemns the winding.',
          powered: false,
          quantity: 'resistance',
          location: 'T1 primary',
        },
      },
      {
        id: 'heater-chain-open',
        cause: 'One open heater in a series chain (AC/DC sets) or an open dropper section',
        source: NO_SOURCE,
        test: {
          where: 'Each valve heater pin pair and each dropper section',
          how: 'Unplugged, measure each heater and dropper section in turn.',
          expected: 'Each heater a few to a few hundred ohms cold; every dropper section near its marked value.',
          powered: false,
          quantity: 'resistance',
          location: 'V1 heater',
        },
      },
    ],
  },
  {
    id: 'lamp-bright-fuse',
    title: 'Limiter lamp stays bright or the fuse blows',
    description: 'On a lamp limiter the lamp never dims after warm-up, or the fuse goes at switch-on.',
    causes: [
      {
        id: 'reservoir-short',
        cause: 'Reservoir or smoothing capacitor shorted',
        source: 'S1, S12a',
        test: {
          where: 'HT line to chassis, after the rectifier',
          how: 'Unplugged and discharged, measure resistance from HT to chassis (watch the meter charge the capacitors).',
          expected: 'Rises to tens of kilohms or more as the capacitors charge; a few ohms means a short.',
          powered: false,
          quantity: 'resistance',
          location: 'HT to chassis',
        },
      },
      {
        id: 'rectifier-short',
        cause: 'Rectifier valve shorted (anode to cathode)',
        source: 'S12a',
        test: {
          where: 'Rectifier socket',
          how: 'With the rectifier out, power through the limiter and watch the lamp.',
          expected:
            'The lamp dims once the heaters warm; if it stays bright with the rectifier in and dims with it out, the rectifier is at fault.',
          powered: true,
        },
      },
      {
        id: 'transformer-fault',
        cause: 'Mains transformer with shorted turns',
        source: 'S1, S12a',
        test: {
          where: 'Mains transformer, all valves out',
          how: 'Power through the limiter with no load and feel for heat after a few minutes.',
          expected: 'Lamp dim, transformer barely warm; a bright lamp with no load points at the transformer.',
          powered: true,
        },
      },
    ],
  },
  {
    id: 'hum',
    title: 'Loud hum',
    description:
      'A steady hum at twice the mains frequency (at mains frequency on half-wave sets), whatever the volume setting.',
    causes: [
      {
        id: 'smoothing-caps',
        cause: 'Reservoir or smoothing electrolytics lost their capacitance',
        source: 'S60, S41',
        test: {
          where: 'Across the reservoir and smoothing capacitors',
          how: 'Measure the AC ripple on the HT with the meter on AC through a blocking capacitor, or bridge a known-good capacitor across briefly (discharged, with the set off).',
          expected:
            'A volt or two of ripple at most on the smoothed HT (from memory); several volts means a tired capacitor.',
          powered: true,
          quantity: 'ac-voltage',
          location: 'HT after smoothing',
        },
      },
      {
        id: 'poor-earth',
        cause: 'Poor earth at a rusted valve-socket rivet or tag',
        source: 'S41',
        test: {
          where: 'Between each earth tag and the chassis',
          how: 'Unplugged, measure resistance from each earthing tag to clean chassis metal.',
          expected: 'Below 1 Ω.',
          powered: false,
          quantity: 'resistance',
          location: 'Earth tag to chassis',
        },
      },
      {
        id: 'heater-cathode-leak',
        cause: 'Heater-to-cathode leakage in an audio valve',
        source: 'S60 (from memory)',
        test: {
          where: 'Audio valves',
          how: 'Swap each audio valve with a known good one of the same type, or test heater-cathode insulation on a valve tester.',
          expected: 'The hum stays the same with a good valve; it drops when the leaky one is replaced.',
          powered: true,
        },
      },
    ],
  },
  {
    id: 'motorboating',
    title: 'Motorboating (put-put)',
    description: 'A slow regular putt-putt or thumping from the speaker, sometimes only at high volume.',
    causes: [
      {
        id: 'decoupling-caps',
        cause: 'Decoupling or smoothing capacitors have lost capacitance',
        source: 'S37, S36',
        test: {
          where: 'HT decoupling capacitors of the early stages',
          how: 'Out of circuit, measure capacitance (or ESR in circuit, set off and discharged).',
          expected: 'Within the marked tolerance; electrolytics -20/+50 %.',
          powered: false,
          quantity: 'capacitance',
          location: 'Decoupling capacitor',
        },
      },
      {
        id: 'grounding',
        cause: 'A poor earth return shared between stages',
        source: 'S37, S36',
        test: {
          where: 'Earth points of the audio and IF stages',
          how: 'Unplugged, measure from each earth point to the chassis.',
          expected: 'Below 1 Ω.',
          powered: false,
          quantity: 'resistance',
          location: 'Earth point to chassis',
        },
      },
    ],
  },
];
