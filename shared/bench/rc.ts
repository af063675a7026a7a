import { BenchInputError, requireFinite, requirePositive } from './bench-input-error';

/** −3 dB corner in hertz of a first-order RC network of `ohms` (Ω) and `farads` (F): 1/(2πRC). */
export function rcCorner(ohms: number, farads: number): number {
  return 1 / (2 * Math.PI * timeConstant(ohms, farads));
}

/** Time constant in seconds of `ohms` (Ω) and `farads` (F): RC. */
export function timeConstant(ohms: number, farads: number): number {
  requirePositive(ohms, 'resistance (Ω)');
  requirePositive(farads, 'capacitance (F)');
  return ohms * farads;
}

/**
 * Seconds for `farads` (F) discharging through `ohms` (Ω) to fall from `fromVolts` (V) to `toVolts` (V):
 * RC·ln(V₀/V). Both voltages have the same sign and the target is nearer zero.
 */
export function dischargeTime(farads: number, ohms: number, fromVolts: number, toVolts: number): number {
  requireFinite(fromVolts, 'starting voltage (V)');
  requireFinite(toVolts, 'target voltage (V)');
  if (toVolts === 0) {
    throw new BenchInputError(
      'A capacitor never quite reaches 0 V through a resistor; choose a safe level such as 50 V or 1 V.',
    );
  }
  const ratio = fromVolts / toVolts;
  if (!(ratio > 1)) {
    throw new BenchInputError(
      `To discharge, the target voltage (${toVolts} V) must be nearer zero than the starting voltage (${fromVolts} V), with the same sign.`,
    );
  }
  return timeConstant(ohms, farads) * Math.log(ratio);
}

/** Energy in joules stored in `farads` (F) charged to `volts` (V): ½CV². */
export function storedEnergy(farads: number, volts: number): number {
  requirePositive(farads, 'capacitance (F)');
  requireFinite(volts, 'voltage (V)');
  return 0.5 * farads * volts * volts;
}
