import { NO_SOURCE, type Symptom } from './symptom-types';

/** Faults of the tuner, oscillator and IF stages. Our own words, from the trade notes (TRADE.md §5, §7). */
export const rfSymptoms: Symptom[] = [
  {
    id: 'hiss-no-stations',
    title: 'Hiss but no stations',
    description: 'The audio works (hiss or a hum test) but nothing tunes in on any band.',
    causes: [
      {
        id: 'oscillator-dead',
        cause: 'Local oscillator not running (converter valve or oscillator grid resistor)',
        source: 'S40, S35',
        test: {
          where: 'Oscillator grid of the frequency changer',
          how: 'Measure DC voltage oscillator grid to chassis with a high-resistance meter.',
          expected: 'A few volts negative (from memory); 0 V means the oscillator is not running.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'V1 oscillator grid',
        },
      },
      {
        id: 'if-winding-open',
        cause: 'Open IF transformer winding',
        source: 'S38, S39',
        test: {
          where: 'Each IF transformer winding',
          how: 'Unplugged, measure resistance across each winding.',
          expected: 'A few ohms to some tens of ohms each; open circuit condemns the can.',
          powered: false,
          quantity: 'resistance',
          location: 'IFT1 primary',
        },
      },
      {
        id: 'if-mica-leak',
        cause: 'Leaky silver-mica capacitor inside an IF can',
        source: 'S38',
        test: {
          where: 'IF valve anodes and grids',
          how: 'Measure DC voltage at each IF valve grid.',
          expected: '0 V or slightly negative (AVC); a positive grid means a mica in the can is leaking.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'IF valve grid',
        },
      },
    ],
  },
  {
    id: 'one-band-dead',
    title: 'No stations on one band',
    description: 'The other bands work; one band is silent or only hisses.',
    causes: [
      {
        id: 'wavechange-switch',
        cause: 'Dirty or worn wavechange switch contacts for that band',
        source: NO_SOURCE,
        test: {
          where: 'Wavechange switch wafers',
          how: 'Unplugged, measure across the contacts for that band while working the switch.',
          expected: 'Below 1 Ω and steady as the switch is rocked.',
          powered: false,
          quantity: 'resistance',
          location: 'Wavechange switch',
        },
      },
      {
        id: 'band-coil-open',
        cause: 'Open aerial or oscillator coil for that band',
        source: NO_SOURCE,
        test: {
          where: 'Aerial and oscillator coils of that band',
          how: 'Unplugged, measure each winding.',
          expected: 'A few ohms (short wave well under 1 Ω) to tens of ohms (long wave); open condemns the coil.',
          powered: false,
          quantity: 'resistance',
          location: 'Oscillator coil',
        },
      },
      {
        id: 'band-oscillator',
        cause: 'Oscillator does not start on that band (weak converter valve, padder or trimmer)',
        source: `${NO_SOURCE} (from memory)`,
        test: {
          where: 'Oscillator grid on that band',
          how: 'Measure DC voltage at the oscillator grid on each band.',
          expected:
            'A few volts negative on every band; 0 V on one band only points at its coil, padder or the converter.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'V1 oscillator grid',
        },
      },
    ],
  },
  {
    id: 'weak-double-peaks',
    title: 'Weak reception, stations at two spots',
    description: 'Few stations, weakly, or each station peaks twice close together.',
    causes: [
      {
        id: 'weak-converter',
        cause: 'Tired frequency-changer valve',
        source: 'S26',
        test: {
          where: 'Frequency changer',
          how: 'Substitute a known good valve or test it.',
          expected: 'No change with a good valve.',
          powered: true,
        },
      },
      {
        id: 'if-micas-drift',
        cause: 'Drifted IF tuning micas or a cracked IF core',
        source: 'S38, S43',
        test: {
          where: 'IF transformers',
          how: 'Inject a modulated signal at the IF and peak each core, watching for a core that will not peak.',
          expected: 'Each core peaks clearly near the middle of its travel.',
          powered: true,
        },
      },
      {
        id: 'alignment',
        cause: 'Alignment off (check last, after everything else)',
        source: 'S26, S43',
        test: {
          where: 'IF cores, then oscillator and aerial trimmers',
          how: 'Align to the service sheet with a signal generator and output meter.',
          expected: "The IF peaks at the sheet's frequency; stations fall at their dial marks.",
          powered: true,
          quantity: 'frequency',
          location: 'IF',
        },
      },
    ],
  },
  {
    id: 'whistle-tuning',
    title: 'Whistles or howls when tuning',
    description: 'A steady whistle or howl, or whistles on every station as it is tuned.',
    causes: [
      {
        id: 'osc-grid-resistor',
        cause: 'Oscillator grid resistor drifted in value',
        source: 'S35',
        test: {
          where: 'Oscillator grid resistor',
          how: 'Unplugged, lift one end and measure it.',
          expected: 'Within 20 % of its marked value.',
          powered: false,
          quantity: 'resistance',
          location: 'Oscillator grid resistor',
        },
      },
      {
        id: 'weak-bypass',
        cause: 'A screen or AVC bypass capacitor lost its capacitance (IF stage unstable)',
        source: 'S36, S38',
        test: {
          where: 'Screen decoupling capacitors of the IF and converter stages',
          how: 'Bridge each with a known good capacitor (set off, discharged, then on) or measure it out of circuit.',
          expected: 'Within tolerance; the whistle stops when the tired one is bridged.',
          powered: false,
          quantity: 'capacitance',
          location: 'Screen decoupling',
        },
      },
      {
        id: 'valve-screening',
        cause: 'Flaking valve screening or a missing valve can',
        source: 'S38',
        test: {
          where: 'Valve shields and sprayed screening',
          how: 'Look, then measure from the screening or can to chassis.',
          expected: 'Screening intact and below 1 Ω to chassis.',
          powered: false,
          quantity: 'resistance',
          location: 'Valve screen',
        },
      },
    ],
  },
  {
    id: 'crackle-random',
    title: 'Random crackles or cutting out',
    description: 'Crackles or drop-outs that come and go by themselves.',
    causes: [
      {
        id: 'valve-pins',
        cause: 'Poor valve pin or socket contacts',
        source: 'S26',
        test: {
          where: 'Each valve in its socket',
          how: 'With the set playing, gently wiggle each valve; clean pins and retension sockets.',
          expected: 'No change in sound when wiggled.',
          powered: true,
        },
      },
      {
        id: 'noisy-resistors',
        cause: 'Noisy high-value carbon resistors',
        source: 'S26',
        test: {
          where: 'Anode load resistors',
          how: 'Tap each gently with an insulated tool while listening, then measure out of circuit.',
          expected: 'No crackle when tapped; value within 20 %.',
          powered: false,
          quantity: 'resistance',
          location: 'Anode load',
        },
      },
    ],
  },
  {
    id: 'static-tuning',
    title: 'Static when tuning, dead spots on the dial',
    description: 'Scratching as the dial is turned, or stretches where nothing is heard.',
    causes: [
      {
        id: 'gang-plates',
        cause: 'Dirt between, or touching plates in, the tuning gang',
        source: 'W2',
        test: {
          where: 'Each section of the tuning gang',
          how: 'Unplugged, one end lifted, measure resistance across each section while turning through its whole travel.',
          expected: 'Open circuit everywhere; any dip shows where plates touch.',
          powered: false,
          quantity: 'resistance',
          location: 'Tuning gang',
        },
      },
    ],
  },
  {
    id: 'avc-distortion',
    title: 'Distortion or blocking on strong stations',
    description: 'Weak stations sound right; strong ones distort or choke.',
    causes: [
      {
        id: 'avc-bypass',
        cause: 'Leaky AVC bypass capacitor',
        source: 'S35',
        test: {
          where: 'AVC line to chassis',
          how: 'Measure DC voltage on the AVC line tuned off station and then on a strong station, with a high-resistance meter.',
          expected:
            'Near 0 V off station, several volts negative on a strong one; little change means the bypass leaks.',
          powered: true,
          quantity: 'dc-voltage',
          location: 'AVC line',
        },
      },
      {
        id: 'avc-load',
        cause: 'AVC load or filter resistor changed value',
        source: 'S35',
        test: {
          where: 'AVC resistors',
          how: 'Unplugged, lift one end and measure each.',
          expected: 'Within 20 % of its marked value.',
          powered: false,
          quantity: 'resistance',
          location: 'AVC resistor',
        },
      },
    ],
  },
];
