/** The case layer's public API: reading, units, validation and the built-in materials. */
export { bareLengthUnit, loadCase, maxCaseBytes, parseCaseObject, parseCaseText, readCaseFile, readCaseStream, type ParseOptions } from './parse.js';
export { caseJsonSchema, caseSchemaFor, profileNames, type ValidatedCase } from './schema.js';
export { dimensionWarning, dimensionWarnings } from './plausibility.js';
export { clip, cleanFreeText, quoted } from './clip-text.js';
export { formatKeyPath, getByKeyPath, parseKeyPath, setByKeyPath, type KeyPath } from './key-path.js';
export type { Locate, SourcePosition } from './issues.js';
export { readDocument, detectFormat, type ReadDocument, type SourceFormat } from './document.js';
export { builtInMaterials, findMaterial, materialNames, similarMaterialNames, type BuiltInMaterial } from './materials.js';
export {
  describeQuantity,
  fromSI,
  isLengthUnit,
  lengthUnits,
  type LengthUnit,
  normaliseUnitText,
  parseQuantity,
  quantityKinds,
  type QuantityKind,
  type QuantityResult,
} from './units.js';
export { finExtent, uniformProfiles } from './checks.js';
export type * from './types.js';
export type * from './heat-sink-types.js';
export { isHeatSinkObject } from './heat-sink-detect.js';
export { loadAnyCase, parseAnyCaseObject, parseAnyCaseText, parseHeatSinkObject, parseHeatSinkText, type AnyCase } from './heat-sink-parse.js';
export {
  finCount as sinkFinCountRange,
  heatSinkJsonSchema,
  heatSinkSchemaFor,
  rowCount as sinkRowCountRange,
  sourcePower as sourcePowerRange,
  type ValidatedHeatSink,
} from './heat-sink-schema.js';
export {
  aboveAbsoluteZero,
  coefficientRange,
  conductivityRange,
  contactResistanceRange,
  exponentRange,
  finPosition,
  finSize,
  finSizeOrZero,
  fraction,
  nonNegative,
  positive,
  rangeText,
  temperatureRange,
} from './fields.js';
export type { Range } from './fields.js';
export type { Case, HDistribution, Profile, TipCondition, Conductivity, Edges, Convection, Material, TabulatedProfile } from './types.js';
export type { CaseWarning } from './types.js';
export { numericInputs, type NumericInput } from './numeric-inputs.js';
export { DEFAULT_UNCERTAINTY, readUncertainty, readUncertaintyOf } from './uncertainty.js';
export { sinkNumericInputs } from './sink-numeric-inputs.js';
export type { InputUncertainty } from './types.js';
export {
  arrayInUnit,
  defaultDisplayUnits,
  detectDisplaySystem,
  displayKinds,
  displaySystem,
  displaySystems,
  displayUnitChoices,
  inUnit,
  isDisplaySystem,
  resolveDisplayUnits,
  type DisplayKind,
  type DisplaySystem,
  type DisplayUnit,
  type DisplayUnits,
} from './display-units.js';
export { deepMerge, hasExtends, maxExtendsDepth, resolveExtends } from './extends.js';
