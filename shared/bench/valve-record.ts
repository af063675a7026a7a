// The shape of a valve record, shared by the data files (valve-data.ts, series-heater-valves.ts).

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

/** The source of a record recalled from handbooks and not yet checked against the type's published data. */
export const MEMORY = 'recalled, not checked against published data';
