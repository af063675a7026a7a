// Gridleak bench library: pure calculations for the restorer's bench, SI units throughout.
// Runs in the browser and on the server; imports nothing outside this folder.
export { BenchInputError } from './bench-input-error';
export { parseQuantity } from './quantity-parse';
export type { ParseQuantityOptions, Quantity, QuantityUnit } from './quantity-parse';
export { formatQuantity } from './quantity-format';
export { capacitorCode } from './capacitor-code';
export { colourBands } from './colour-bands';
export type { ColourBandReading } from './colour-bands';
export { preferredValue, seriesValues } from './e-series';
export type { ESeries } from './e-series';
export { esrFromTanDelta, esrLimit, esrLimitDetail } from './esr-limit';
export type { EsrLimitDetail } from './esr-limit';
export { leakageLimit, leakageLimitDetail } from './leakage-limit';
export type { LeakageLimitDetail } from './leakage-limit';
export { dischargeTime, rcCorner, storedEnergy, timeConstant } from './rc';
export { bypassCorner, cathodeBias, cathodeCurrent } from './cathode-bias';
export type { CathodeBias, CathodeBiasInput } from './cathode-bias';
export { seriesLampLimit, seriesLampLimitDetail, tapScaled } from './mains';
export type { SeriesLampInput, SeriesLampLimit } from './mains';
export { valveType } from './valve-type';
export type { ValveHeater, ValveType } from './valve-type';
export type { DataConfidence, TypicalOperation, ValveData } from './valve-data';
export type { HeaterSupply } from './valve-letters';
export { liveChassisLikely } from './live-chassis';
export type { LiveChassisAssessment } from './live-chassis';
export { readingVerdict } from './reading-verdict';
export type { ReadingVerdict, Tolerance } from './reading-verdict';
export { parseTolerance } from './tolerance-text';
export { DEFAULT_INSULATION_MIN, DEFAULT_TOLERANCE, measuredQuantities, measurementVerdict, quantityUnits } from './measurement-verdict';
export type { MeasuredQuantity, MeasurementInput, MeasurementVerdict } from './measurement-verdict';
export { partWarnings, readRating } from './part-rules';
export type { MainsPosition, PartWarning } from './part-rules';
export {
  EARTH_CONTINUITY_BASE_OHMS, INSULATION_TEST_VOLTS, SAFETY_SOURCES, capacitorCurrent, earthContinuityLimit, equipmentClassLabels, equipmentClasses,
  flexSizes, insulationMinimum, leadResistance, safetyTest, touchCurrentLimit,
} from './safety-test';
export type { EquipmentClass, LineVerdict, SafetyLine, SafetyTestInput, SafetyTestResult } from './safety-test';
