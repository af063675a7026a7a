// Data for common radio valves. Published figures are makers' *typical* values (production
// spread up to about ±30 %); anything marked 'from memory' is provisional until checked against
// the type's published data. Each record names its source: a valve data
// handbook or a maker's data sheet as reproduced on a reference page, or 'from memory'.

/** How far a record can be trusted: 'published' (a maker's data via a reference page), 'from memory', or 'mixed'. */
export type DataConfidence = 'published' | 'from memory' | 'mixed';

/** Typical operating point, all SI: volts, amperes, ohms, siemens, watts. Per section for multiple valves. */
export interface TypicalOperation {
  anodeVolts?: number;
  screenVolts?: number;
  gridVolts?: number;
  anodeAmps?: number;
  screenAmps?: number;
  cathodeOhms?: number;
  /** Mutual conductance gm, siemens (1 mA/V = 1e-3 S). */
  transconductanceSiemens?: number;
  /** Amplification factor µ (dimensionless). */
  mu?: number;
  /** Anode resistance ra, ohms. */
  anodeOhms?: number;
  loadOhms?: number;
  outputWatts?: number;
  maxAnodeWatts?: number;
  /** Rectifiers: maximum rms voltage per anode, volts. */
  maxRmsVolts?: number;
  /** Rectifiers: maximum DC output current, amperes. */
  maxDcAmps?: number;
}

export interface ValveData {
  description: string;
  heaterVolts: number;
  heaterAmps: number;
  typical?: TypicalOperation;
  equivalents: string[];
  confidence: DataConfidence;
  /** Where the figures come from, and where sources disagree. */
  source: string;
}

const MEMORY = 'recalled, not checked against published data';

export const VALVE_DATA: Readonly<Record<string, ValveData>> = {
  ECC83: {
    description: 'high-µ double triode; heater centre-tapped: 12.6 V 0.15 A in series or 6.3 V 0.3 A parallel',
    heaterVolts: 6.3,
    heaterAmps: 0.3,
    typical: { anodeVolts: 250, gridVolts: -2, anodeAmps: 1.2e-3, mu: 100, anodeOhms: 62.5e3, maxAnodeWatts: 1 },
    equivalents: ['12AX7'],
    confidence: 'published',
    source: "encyclopedia article citing a maker's data sheet",
  },
  ECC81: {
    description: 'high-frequency double triode',
    heaterVolts: 6.3,
    heaterAmps: 0.3,
    equivalents: ['12AT7'],
    confidence: 'from memory',
    source: MEMORY,
  },
  ECC82: {
    description: 'medium-µ double triode',
    heaterVolts: 6.3,
    heaterAmps: 0.3,
    equivalents: ['12AU7'],
    confidence: 'from memory',
    source: MEMORY,
  },
  ECC85: {
    description: 'VHF double triode (FM front end)',
    heaterVolts: 6.3,
    heaterAmps: 0.435,
    typical: { anodeVolts: 250, cathodeOhms: 200, anodeAmps: 10e-3, transconductanceSiemens: 5.9e-3, mu: 57 },
    equivalents: ['6AQ8'],
    confidence: 'from memory',
    source: MEMORY,
  },
  EL84: {
    description: 'output pentode',
    heaterVolts: 6.3,
    heaterAmps: 0.76,
    typical: {
      anodeVolts: 250,
      screenVolts: 250,
      gridVolts: -7.3,
      anodeAmps: 48e-3,
      screenAmps: 5.5e-3,
      cathodeOhms: 135,
      transconductanceSiemens: 11.3e-3,
      loadOhms: 5.2e3,
      outputWatts: 5.7,
      maxAnodeWatts: 12,
    },
    equivalents: ['6BQ5'],
    confidence: 'mixed',
    source:
      'encyclopedia article (heater, gm, output, Pa max); Ia, Ig2, Rk, Vg1 from memory; load 5.2 kΩ from memory vs 4.5 kΩ in one reference',
  },
  ECL86: {
    description: 'triode (µ 100) and output pentode; figures for the pentode',
    heaterVolts: 6.3,
    heaterAmps: 0.7,
    typical: {
      anodeVolts: 250,
      screenVolts: 250,
      anodeAmps: 36e-3,
      screenAmps: 6e-3,
      cathodeOhms: 170,
      transconductanceSiemens: 10e-3,
      loadOhms: 7e3,
      maxAnodeWatts: 9,
    },
    equivalents: ['6GW8'],
    confidence: 'mixed',
    source:
      "maker's 1962 type announcement (Va, Ia, gm, Pa max); heater 0.66 A in one reference, 0.7 A from memory; Ig2, Rk, load from memory",
  },
  ECH81: {
    description: 'triode-heptode frequency changer',
    heaterVolts: 6.3,
    heaterAmps: 0.3,
    typical: {
      anodeVolts: 250,
      screenVolts: 100,
      gridVolts: -2,
      anodeAmps: 3e-3,
      screenAmps: 6.5e-3,
      transconductanceSiemens: 0.75e-3,
    },
    equivalents: ['6AJ8'],
    confidence: 'from memory',
    source: `operating point ${MEMORY} (low confidence); equivalent from a valve data site`,
  },
  EF80: {
    description: 'wide-band pentode',
    heaterVolts: 6.3,
    heaterAmps: 0.3,
    equivalents: ['6BX6'],
    confidence: 'from memory',
    source: MEMORY,
  },
  EF89: {
    description: 'variable-µ IF pentode',
    heaterVolts: 6.3,
    heaterAmps: 0.2,
    typical: {
      anodeVolts: 250,
      screenVolts: 100,
      gridVolts: -2,
      anodeAmps: 9e-3,
      screenAmps: 3e-3,
      transconductanceSiemens: 3.6e-3,
    },
    equivalents: ['6DA6'],
    confidence: 'from memory',
    source: `${MEMORY} (low confidence)`,
  },
  EBF89: {
    description: 'double diode and variable-µ pentode',
    heaterVolts: 6.3,
    heaterAmps: 0.3,
    equivalents: ['6DC8'],
    confidence: 'from memory',
    source: MEMORY,
  },
  EABC80: {
    description: 'triple diode and triode (AM and FM detectors, AF amplifier); figures for the triode',
    heaterVolts: 6.3,
    heaterAmps: 0.45,
    typical: { anodeVolts: 250, gridVolts: -3, anodeAmps: 1e-3, mu: 70, transconductanceSiemens: 1.2e-3 },
    equivalents: ['6AK8'],
    confidence: 'from memory',
    source: `${MEMORY}; equivalent from a schematic-symbol library`,
  },
  EZ80: {
    description: 'indirectly heated full-wave rectifier',
    heaterVolts: 6.3,
    heaterAmps: 0.6,
    typical: { maxRmsVolts: 350, maxDcAmps: 90e-3 },
    equivalents: ['6V4'],
    confidence: 'mixed',
    source: 'ratings from a valve data site quoting maker data (as EZ40); heater from memory',
  },
  EZ81: {
    description: 'indirectly heated full-wave rectifier',
    heaterVolts: 6.3,
    heaterAmps: 1.0,
    typical: { maxRmsVolts: 350, maxDcAmps: 150e-3 },
    equivalents: ['6CA4'],
    confidence: 'from memory',
    source: `${MEMORY}; equivalent from a valve data page`,
  },
  EM80: {
    description: 'tuning indicator',
    heaterVolts: 6.3,
    heaterAmps: 0.3,
    equivalents: ['6BR5'],
    confidence: 'from memory',
    source: MEMORY,
  },
  EM84: {
    description: 'tuning indicator (bar)',
    heaterVolts: 6.3,
    heaterAmps: 0.21,
    equivalents: ['6FG6'],
    confidence: 'from memory',
    source: MEMORY,
  },
  DK96: {
    description: 'battery heptode frequency changer',
    heaterVolts: 1.4,
    heaterAmps: 0.025,
    equivalents: ['1AB6'],
    confidence: 'from memory',
    source: MEMORY,
  },
  UCH42: {
    description: 'triode-hexode frequency changer (Rimlock)',
    heaterVolts: 14,
    heaterAmps: 0.1,
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  UF89: {
    description: 'variable-µ IF pentode, 100 mA version of the EF89',
    heaterVolts: 12.6,
    heaterAmps: 0.1,
    equivalents: ['12DA6'],
    confidence: 'from memory',
    source: MEMORY,
  },
  UAF42: {
    description: 'diode and variable-µ pentode (Rimlock)',
    heaterVolts: 12.6,
    heaterAmps: 0.1,
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  UBC41: {
    description: 'double diode and triode (Rimlock)',
    heaterVolts: 14,
    heaterAmps: 0.1,
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  UL41: {
    description: 'output pentode (Rimlock); operating point not found',
    heaterVolts: 45,
    heaterAmps: 0.1,
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  UY41: {
    description: 'half-wave rectifier (Rimlock)',
    heaterVolts: 31,
    heaterAmps: 0.1,
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
  UCH81: {
    description: 'triode-heptode frequency changer, 100 mA version of the ECH81',
    heaterVolts: 19,
    heaterAmps: 0.1,
    equivalents: ['19AJ8'],
    confidence: 'mixed',
    source: 'heater from a valve data site (HCH81 note); equivalent from memory',
  },
  UCC85: {
    description: 'VHF double triode, 100 mA version of the ECC85',
    heaterVolts: 26,
    heaterAmps: 0.1,
    equivalents: ['26AQ8'],
    confidence: 'from memory',
    source: MEMORY,
  },
  UABC80: {
    description: 'triple diode and triode, 100 mA version of the EABC80',
    heaterVolts: 28,
    heaterAmps: 0.1,
    equivalents: ['28AK8'],
    confidence: 'from memory',
    source: MEMORY,
  },
  UL84: {
    description: 'output pentode (differs from the EL84)',
    heaterVolts: 45,
    heaterAmps: 0.1,
    equivalents: ['45B5'],
    confidence: 'from memory',
    source: MEMORY,
  },
  UY85: {
    description: 'half-wave rectifier',
    heaterVolts: 38,
    heaterAmps: 0.1,
    equivalents: ['38A3'],
    confidence: 'from memory',
    source: MEMORY,
  },
  PL504: {
    description: 'line-output pentode (television), magnoval',
    heaterVolts: 27,
    heaterAmps: 0.3,
    equivalents: [],
    confidence: 'from memory',
    source: MEMORY,
  },
};
