/** Public surface of the pure assessment library: schemas, grading, client views, statistics. */
export * from "./question-schema";
export * from "./answer-schema";
export * from "./grading";
export * from "./client-view";
export * from "./presentation";
export * from "./item-statistics";
export { pearsonR, pointBiserialR, listwiseComplete } from "./basic-statistics";
export {
  GENERATOR_CATALOG,
  GENERATOR_NAMES,
  createGeneratorRegistry,
  fillTemplate,
  templatePlaceholders,
  type AcousticsFunctions,
  type GeneratedValue,
  type GeneratorDefinition,
  type GeneratorName,
  type GeneratorRegistry,
} from "./generated";
export { deriveSeed, drawInputs, mulberry32, seededShuffle, inputRangeSchema, type InputRange } from "./random";
export { drawQuestionInputs, renderGeneratedPrompt, computeGeneratedKey } from "./variant";
export {
  UNITS,
  UNIT_IDS,
  convertUnit,
  formatQuantity,
  quantityOf,
  sameQuantity,
  unitsOfSameQuantity,
  type Quantity,
  type UnitDefinition,
  type UnitId,
} from "./units";
export { acousticsGenerators } from "./acoustics-generators";
