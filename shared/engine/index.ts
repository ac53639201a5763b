/** Probepath's pure computation engine: readings, specs, verdicts and procedure graphs. No I/O. */
export { decide, readingUncertainty, resolutionFor, type Decision, type Lean, type MeterAccuracy } from './accuracy';
export { stateOfCharge, BCI_OCV_TABLE } from './battery';
export { COPPER_ALPHA_20, COPPER_RESISTIVITY_20, copperFactor, copperResistanceAt } from './copper';
export { evaluate, type Evaluation, type EvaluationContext, type Interval, type Limits, type PriorReading, type ReadingValue } from './evaluate';
export { explainEvaluation } from './explain';
export { marginalPolicyOf, requiredVerdicts } from './outcomes';
export { parseReading, type ParseFailure, type ParsedReading, type ParseResult } from './parse-reading';
export * from './procedure';
export { parseProcedureDocument, procedureDocumentSchema, type ProcedureDocumentParse } from './procedure-schema';
export { METER_FUNCTIONS, QUANTITIES, QUANTITY_INFO, type Dimension, type MeterFunction, type Quantity, type QuantityInfo, type UnitSymbol } from './quantity';
export * from './spec';
export { SI_PREFIXES, formatValue, type FormatOptions } from './units';
export { validateProcedure, type ProblemCode, type ValidationProblem } from './validate-procedure';
export { VERDICTS, type Verdict } from './verdict';
export { checkVin, vinCheckDigit, type VinCheck } from './vin';
export { nextCheckId, type StepInput, type WalkResult } from './walk';
export { AWG_MAX, AWG_MIN, awgDiameterMm, gaugeAreaMm2, isValidGauge, wireResistance, type WireGauge, type WireRun } from './wire';
