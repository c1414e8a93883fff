/**
 * The engine's public API: read a circuit file (`elaborate`, the schema and the per-field parser the part sheet's
 * forms use), check its structure, solve it (`simulate`), and produce the headless command's document
 * (`runCircuit`). Pure TypeScript: it runs in the browser's worker and on the server alike.
 */
export { simulate } from "./analyses/simulate";
export { DEFAULT_AC_GRID, DEFAULT_AC_PRESSURE_PA, DEFAULT_NOISE_GRID } from "./circuit/analyses";
export { type ElaborateOptions, elaborate } from "./circuit/elaborate";
export { type FieldOptions, type FieldResult, parseFieldValue, partValuesSchema } from "./circuit/field";
export { countFrequencies, expandFrequencies, logGrid } from "./circuit/frequencies";
export { parseCircuitJson } from "./circuit/json";
export { KIND_SPECS, type KindSpec, type ValueSpec } from "./circuit/kinds";
export { evaluateParameters } from "./circuit/parameters";
export { QUANTITIES, type Quantity, type QuantityName } from "./circuit/quantities";
export {
  type CircuitFile,
  type CircuitPart,
  circuitFileSchema,
  type FileValidation,
  parseCircuitFile,
  validateCircuitFile,
  valueInputSchema,
} from "./circuit/schema";
export { checkTopology } from "./circuit/topology";
export * from "./circuit/types";
export { parseLiteral, parseTolerance, SI_PREFIXES } from "./circuit/values";
export { isSimError, SimError, type SimErrorCode, type SimErrorJson } from "./errors";
export type * from "./results";
export { runCircuit } from "./run";
export { type RunOptions, runWith, type Simulate, withFiniteNumbers } from "./runner";
export {
  allPass,
  BASE_VARIANT,
  checkTarget,
  checkTargets,
  type FiguresByVariant,
  variantsNeeded,
} from "./analyses/targets";
