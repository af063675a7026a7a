import { BenchInputError, requireNonNegative, requirePositive } from './bench-input-error';

/**
 * The final electrical safety test before a set goes back to its owner: pure limits and verdicts.
 * Limits follow the IET Code of Practice for In-service Inspection and Testing of Electrical Equipment
 * (earth continuity, insulation at 500 V DC) and the appliance standard's touch/leakage-current class
 * limits (IEC 60335-1 cl. 16, as the Code of Practice's 4th edition applied them in service). A record of
 * the test, never a certificate.
 */
export const equipmentClasses = ['class-1', 'class-2', 'live-chassis'] as const;
export type EquipmentClass = (typeof equipmentClasses)[number];
export const equipmentClassLabels: Record<EquipmentClass, string> = {
  'class-1': 'Class I (earthed chassis, three-core lead)',
  'class-2': 'Class II (double-insulated, two-core lead)',
  'live-chassis': 'Live chassis (AC/DC) with insulated knobs and back',
};

/** Source texts shown beside each limit. */
export const SAFETY_SOURCES = {
  iet: 'IET Code of Practice for In-service Inspection and Testing of Electrical Equipment',
  classLimits: 'IEC 60335-1 cl. 16 class limits, as the IET Code of Practice (4th ed.) applied them',
  physics: 'I = 2πfCV (capacitive reactance)',
  practice: 'common practice',
} as const;

/** Earth continuity allowance before the lead's own resistance, ohms (IET Code of Practice: 0.1 Ω + R). */
export const EARTH_CONTINUITY_BASE_OHMS = 0.1;
/** Insulation-resistance test voltage, volts DC (IET Code of Practice). */
export const INSULATION_TEST_VOLTS = 500;

/** Maximum chassis-to-plug-earth resistance (Ω): 0.1 Ω plus the resistance `leadOhms` (Ω) of the lead's earth core. */
export function earthContinuityLimit(leadOhms: number): number {
  requireNonNegative(leadOhms, 'lead resistance (Ω)');
  return EARTH_CONTINUITY_BASE_OHMS + leadOhms;
}

// Maximum conductor resistance of class 5 (flexible) plain copper at 20 °C, Ω per km, by cross-section in mm².
const FLEX_OHMS_PER_KM: Record<string, number> = { '0.5': 39, '0.75': 26, '1': 19.5, '1.5': 13.3, '2.5': 7.98 };
export const flexSizes = Object.keys(FLEX_OHMS_PER_KM)
  .map(Number)
  .sort((a, b) => a - b);

/** Resistance (Ω) of one core of a flexible copper lead `metres` (m) long of cross-section `mm2` (mm², a standard size). */
export function leadResistance(metres: number, mm2: number): number {
  requirePositive(metres, 'lead length (m)');
  const perKm = FLEX_OHMS_PER_KM[String(mm2)];
  if (perKm === undefined)
    throw new BenchInputError(`Lead cross-section must be one of ${flexSizes.join(', ')} mm²; got ${mm2}.`);
  return (perKm * metres) / 1000;
}

/** Least insulation resistance (Ω) at 500 V DC, live and neutral joined, to exposed metal: 1 MΩ Class I, 2 MΩ otherwise. */
export function insulationMinimum(equipmentClass: EquipmentClass): number {
  return equipmentClass === 'class-1' ? 1e6 : 2e6;
}

/** Most touch or leakage current (A) for the class: 0.75 mA Class I portable, 0.25 mA Class II (and live chassis, insulated). */
export function touchCurrentLimit(equipmentClass: EquipmentClass): number {
  return equipmentClass === 'class-1' ? 0.75e-3 : 0.25e-3;
}

/** Current (A, rms) through a mains-to-chassis capacitor of `farads` (F) at `volts` (V rms) and `hertz` (Hz): I = 2πfCV. */
export function capacitorCurrent(farads: number, volts: number, hertz: number): number {
  requirePositive(farads, 'capacitance (F)');
  requirePositive(volts, 'mains voltage (V)');
  requirePositive(hertz, 'mains frequency (Hz)');
  return 2 * Math.PI * hertz * farads * volts;
}

export interface SafetyTestInput {
  equipmentClass: EquipmentClass;
  /** Chassis to plug earth pin, Ω (Class I). */
  earthOhms?: number | null;
  /** The lead's earth-core resistance, Ω (0 when the reading already nulls the lead). */
  leadOhms?: number | null;
  /** Live and neutral joined, to exposed metal, Ω. */
  insulationOhms?: number | null;
  /** The insulation tester's voltage, V DC. */
  insulationVolts?: number | null;
  /** Touch or leakage current where measured, A rms. */
  touchAmps?: number | null;
  /** Mains-to-chassis (Y) capacitance, F, when the set has one. */
  yFarads?: number | null;
  mainsVolts: number;
  mainsHertz: number;
  fuseFittedAmps?: number | null;
  fuseRecommendedAmps?: number | null;
  leadAndStrainRelief: boolean;
  coversRefitted: boolean;
  safetyClassCapacitors: boolean;
}

export type LineVerdict = 'pass' | 'fail' | 'not-applicable' | 'not-measured';
export interface SafetyLine {
  key: 'earth' | 'insulation' | 'touch' | 'y-capacitor' | 'fuse' | 'lead' | 'covers' | 'capacitor-class';
  label: string;
  /** The value judged, SI (Ω, A), or null for a yes/no check or a missing reading. */
  value: number | null;
  unit: 'Ω' | 'A' | '';
  /** The limit, SI, or null for a yes/no check. */
  limit: number | null;
  /** 'max': the value must not exceed the limit; 'min': it must reach it. */
  sense: 'max' | 'min' | 'check';
  limitText: string;
  source: string;
  verdict: LineVerdict;
}
export interface SafetyTestResult {
  lines: SafetyLine[];
  /** Passes only when no line fails and every required line was measured. */
  verdict: 'pass' | 'fail';
}

const judge = (value: number | null | undefined, limit: number, sense: 'max' | 'min'): LineVerdict =>
  value == null ? 'not-measured' : (sense === 'max' ? value <= limit : value >= limit) ? 'pass' : 'fail';
const check = (ok: boolean): LineVerdict => (ok ? 'pass' : 'fail');
const ohms = (v: number) => (v >= 1e6 ? `${v / 1e6} MΩ` : `${Number(v.toPrecision(3))} Ω`);
const mA = (a: number) => `${Number((a * 1e3).toPrecision(3))} mA`;

/** Judges every line of the final safety test; earth continuity and insulation are required, touch current and Y current where known. */
export function safetyTest(input: SafetyTestInput): SafetyTestResult {
  const cls = input.equipmentClass;
  const lines: SafetyLine[] = [];
  const earthLimit = earthContinuityLimit(input.leadOhms ?? 0);
  lines.push(
    cls === 'class-1'
      ? {
          key: 'earth',
          label: 'Protective earth continuity, chassis to plug earth pin',
          value: input.earthOhms ?? null,
          unit: 'Ω',
          limit: earthLimit,
          sense: 'max',
          limitText: `≤ ${ohms(earthLimit)} (0.1 Ω + lead ${ohms(input.leadOhms ?? 0)})`,
          source: SAFETY_SOURCES.iet,
          verdict: judge(input.earthOhms, earthLimit, 'max'),
        }
      : {
          key: 'earth',
          label: 'Protective earth continuity',
          value: null,
          unit: 'Ω',
          limit: null,
          sense: 'max',
          limitText: 'No protective earth on this class',
          source: SAFETY_SOURCES.iet,
          verdict: 'not-applicable',
        },
  );
  const insMin = insulationMinimum(cls);
  const atVolts = input.insulationVolts ?? INSULATION_TEST_VOLTS;
  lines.push({
    key: 'insulation',
    label: `Insulation, live and neutral joined to exposed metal, at ${atVolts} V DC`,
    value: input.insulationOhms ?? null,
    unit: 'Ω',
    limit: insMin,
    sense: 'min',
    limitText: `≥ ${ohms(insMin)} at ${INSULATION_TEST_VOLTS} V DC`,
    source: SAFETY_SOURCES.iet,
    verdict:
      atVolts < INSULATION_TEST_VOLTS && input.insulationOhms != null
        ? 'fail'
        : judge(input.insulationOhms, insMin, 'min'),
  });
  const touchMax = touchCurrentLimit(cls);
  lines.push({
    key: 'touch',
    label: 'Touch or leakage current',
    value: input.touchAmps ?? null,
    unit: 'A',
    limit: touchMax,
    sense: 'max',
    limitText: `≤ ${mA(touchMax)}`,
    source: SAFETY_SOURCES.classLimits,
    verdict: input.touchAmps == null ? 'not-applicable' : judge(input.touchAmps, touchMax, 'max'),
  });
  const yAmps = input.yFarads ? capacitorCurrent(input.yFarads, input.mainsVolts, input.mainsHertz) : null;
  lines.push({
    key: 'y-capacitor',
    label: `Current through the mains-to-chassis capacitor at ${input.mainsVolts} V ${input.mainsHertz} Hz`,
    value: yAmps,
    unit: 'A',
    limit: touchMax,
    sense: 'max',
    limitText: `≤ ${mA(touchMax)}`,
    source: `${SAFETY_SOURCES.physics}; ${SAFETY_SOURCES.classLimits}`,
    verdict: yAmps == null ? 'not-applicable' : judge(yAmps, touchMax, 'max'),
  });
  const fitted = input.fuseFittedAmps;
  const recommended = input.fuseRecommendedAmps;
  lines.push({
    key: 'fuse',
    label: 'Fuse fitted against the rating recommended',
    value: fitted ?? null,
    unit: 'A',
    limit: recommended ?? null,
    sense: 'max',
    limitText: recommended ? `≤ ${recommended} A recommended` : 'Recommended rating not given',
    source: SAFETY_SOURCES.practice,
    verdict: fitted == null || recommended == null ? 'not-measured' : judge(fitted, recommended, 'max'),
  });
  const yesNo = (key: SafetyLine['key'], label: string, ok: boolean) =>
    lines.push({
      key,
      label,
      value: null,
      unit: '',
      limit: null,
      sense: 'check',
      limitText: 'Required',
      source: SAFETY_SOURCES.practice,
      verdict: check(ok),
    });
  yesNo('lead', 'Mains lead sound, strain relief fitted', input.leadAndStrainRelief);
  yesNo('covers', 'Knobs, back cover and insulators refitted', input.coversRefitted);
  yesNo('capacitor-class', 'Mains-side capacitors of X/Y safety class', input.safetyClassCapacitors);
  const required = new Set<SafetyLine['key']>(['earth', 'insulation', 'fuse']);
  const fails = lines.some((l) => l.verdict === 'fail' || (l.verdict === 'not-measured' && required.has(l.key)));
  return { lines, verdict: fails ? 'fail' : 'pass' };
}
