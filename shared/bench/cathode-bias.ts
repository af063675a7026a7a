import { requireNonNegative, requirePositive } from './bench-input-error';
import { rcCorner } from './rc';

export interface CathodeBiasInput {
  /** Cathode resistor, ohms. */
  cathodeOhms: number;
  /** Anode current, amperes. */
  anodeAmps: number;
  /** Screen-grid current, amperes (tetrodes and pentodes; default 0). */
  screenAmps?: number;
}

export interface CathodeBias {
  /** Voltage across the cathode resistor, volts, positive: what a meter reads cathode to chassis. */
  biasVolts: number;
  /** The same bias as a data sheet writes it, grid relative to cathode (volts, negative). */
  gridVolts: number;
  /** Current through the cathode resistor, amperes. */
  cathodeAmps: number;
  /** Power dissipated in the cathode resistor, watts. */
  resistorWatts: number;
}

/**
 * Self-bias from a cathode resistor: ohms and amperes in, volts, amperes and watts out.
 * The screen current returns through the cathode, so Ik = Ia + Ig2 and Vk = Ik·Rk.
 */
export function cathodeBias({ cathodeOhms, anodeAmps, screenAmps = 0 }: CathodeBiasInput): CathodeBias {
  requirePositive(cathodeOhms, 'cathode resistance (Ω)');
  requireNonNegative(anodeAmps, 'anode current (A)');
  requireNonNegative(screenAmps, 'screen current (A)');
  const cathodeAmps = anodeAmps + screenAmps;
  const biasVolts = cathodeAmps * cathodeOhms;
  return { biasVolts, gridVolts: -biasVolts, cathodeAmps, resistorWatts: cathodeAmps * cathodeAmps * cathodeOhms };
}

/** Cathode current in amperes from the measured cathode voltage (V, to chassis) and the cathode resistor (Ω). */
export function cathodeCurrent({ cathodeVolts, cathodeOhms }: { cathodeVolts: number; cathodeOhms: number }): number {
  requireNonNegative(cathodeVolts, 'cathode voltage (V)');
  requirePositive(cathodeOhms, 'cathode resistance (Ω)');
  return cathodeVolts / cathodeOhms;
}

/**
 * Lower bound in hertz for the cathode bypass corner of `cathodeOhms` (Ω) and `farads` (F): 1/(2π·Rk·Ck).
 * The true corner is higher, because the valve's own cathode source resistance sits in parallel with Rk.
 */
export function bypassCorner(cathodeOhms: number, farads: number): number {
  return rcCorner(cathodeOhms, farads);
}
