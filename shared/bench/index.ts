// Gridleak bench library: pure calculations for the restorer's bench, SI units throughout.
// Runs in the browser and on the server; imports nothing outside this folder.
export { BenchInputError } from './bench-input-error';
export { parseQuantity } from './quantity-parse';
export { isOverRange, parseReading } from './reading-text';
export type { MeterReading } from './reading-text';
export type { ParseQuantityOptions, Quantity, QuantityUnit } from './quantity-parse';
export { formatQuantity } from './quantity-format';
export { capacitorCode } from './capacitor-code';
export { meterCorrection, meterOhms, loadedReading } from './meter-loading';
export type { MeterCorrection, MeterSpec } from './meter-loading';
export { parseMeter } from './meter-text';
export type { MeterTexts } from './meter-text';
export { heaterChain } from './heater-chain';
export type { ChainValve, HeaterChain, HeaterChainInput } from './heater-chain';
export { anodeDissipation, rectifierLoad, resistorDissipation } from './dissipation';
export type { RatingCheck } from './dissipation';
export { frequencyOf, frequencyTolerance, IF_PRESETS, wavelengthOf } from './alignment';
export type { IfPreset } from './alignment';
export { describeDeviation } from './verdict-words';
export type { DeviationInput, LimitKind } from './verdict-words';
export { colourBands } from './colour-bands';
export type { ColourBandReading } from './colour-bands';
export { resistorBands } from './colour-bands-encode';
export type { BandTolerance } from './colour-bands-encode';
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
export { measurementVerdict } from './measurement-verdict';
export type { MeasurementInput, MeasurementVerdict } from './measurement-verdict';
export { DEFAULT_TOLERANCE, measuredQuantities, readingKinds } from './reading-kinds';
export type { FormHints, MeasuredQuantity, ReadingKind, ReadingRule, SignRule, UsualBand } from './reading-kinds';
export { absoluteTolerance, applicableFields, applicableTexts, limitOf, outHeadings } from './reading-kind-rules';
export type { KindTexts } from './reading-kind-rules';
export { partWarnings, readRating } from './part-rules';
export type { MainsPosition, PartWarning } from './part-rules';
export {
  capacitorCurrent,
  earthContinuityLimit,
  equipmentClassLabels,
  equipmentClasses,
  flexSizes,
  insulationMinimum,
  leadResistance,
  safetyTest,
  touchCurrentLimit,
} from './safety-test';
export type { EquipmentClass, LineVerdict, SafetyLine, SafetyTestInput, SafetyTestResult } from './safety-test';
