import { requirePositive } from './bench-input-error';

/** Speed of light as the dial-scale rule rounds it: λ[m] = 300,000 / f[kHz], i.e. 3 × 10⁸ m/s. */
const DIAL_SPEED = 3e8;

/** Wavelength in metres of `hertz` (Hz), as dial scales mark it: 300,000 / f[kHz]. */
export function wavelengthOf(hertz: number): number {
  return DIAL_SPEED / requirePositive(hertz, 'frequency (Hz)');
}

/** Frequency in hertz of a wavelength of `metres` (m), as dial scales mark it: 300,000 / λ[m] kHz. */
export function frequencyOf(metres: number): number {
  return DIAL_SPEED / requirePositive(metres, 'wavelength (m)');
}

export interface IfPreset {
  /** The intermediate frequency, hertz. */
  hertz: number;
  /** How far off the IF may sit before it needs attention, hertz (absolute, not per cent). */
  toleranceHertz: number;
  label: string;
}

/**
 * Intermediate frequencies of broadcast receivers, with an absolute tolerance: an AM IF within ±2 kHz and an
 * FM IF within ±25 kHz of nominal is close enough for alignment to bring in (common practice, no source).
 */
export const IF_PRESETS: readonly IfPreset[] = [
  { hertz: 455e3, toleranceHertz: 2e3, label: '455 kHz (AM)' },
  { hertz: 465e3, toleranceHertz: 2e3, label: '465 kHz (AM)' },
  { hertz: 468e3, toleranceHertz: 2e3, label: '468 kHz (AM)' },
  { hertz: 470e3, toleranceHertz: 2e3, label: '470 kHz (AM)' },
  { hertz: 472e3, toleranceHertz: 2e3, label: '472 kHz (AM)' },
  { hertz: 10.7e6, toleranceHertz: 25e3, label: '10.7 MHz (FM)' },
];

/** The absolute tolerance (Hz) for a frequency of `hertz`: the IF preset's when it is one, else ±2 kHz below 1 MHz and ±25 kHz above. */
export function frequencyTolerance(hertz: number): number {
  const preset = IF_PRESETS.find((p) => Math.abs(p.hertz - hertz) < 1e-6 * p.hertz);
  if (preset) return preset.toleranceHertz;
  return hertz < 1e6 ? 2e3 : 25e3;
}
