/**
 * Axisline acoustics library: pure, dependency-free math for microphone
 * patterns, proximity effect, sound in air, comb filtering, levels, DI
 * transformers, phantom power, feedback gain, noise exposure, digital alignment,
 * thermal noise and gain structure.
 * Every function documents its formula and published source.
 */
export * from "./patterns";
export * from "./proximity";
export * from "./air";
export * from "./comb";
export * from "./levels";
export * from "./di";
export * from "./phantom";
export * from "./feedback";
export * from "./exposure";
export * from "./units";
export * from "./alignment";
export * from "./thermal-noise";
export * from "./gain-structure";
export {
  requireFinite,
  requirePositive,
  requireNonNegative,
  requireUnitInterval,
  requireIntegerAtLeast,
  requirePatternCoefficient,
} from "./validate";
