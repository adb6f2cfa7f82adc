/**
 * `hotjunction/design`: design files (zod schema, validation, JSON Schema, design file to chain and trip objects)
 * and the caution. Adds zod only; the report renderers and charts (with d3-scale, d3-shape) are `hotjunction/report`.
 * @module
 */
export { designFileSchema, referenceSchema, type DesignFile, type DesignReference } from "./designSchema.js";
export type { DesignDynamics } from "./designSchema.js";
export { DesignFileError, type DesignFileErrorDetails } from "./designFileError.js";
export {
  designFileMaxBytes,
  designFileMaxDepth,
  parseDesign,
  safeParseDesign,
  validateDesign,
  type ParseDesignOptions,
  type SafeParseDesignResult,
} from "./parseDesign.js";
export { loadDesignFile, type LoadDesignFileOptions } from "./loadDesignFile.js";
export { designJsonSchema } from "./designJsonSchema.js";
export { measurementChainFromDesign, referenceOptionFromDesign, tripDesignFromDesign } from "./designToObjects.js";
export { dynamicsModelFromDesign } from "./designToObjects.js";
export { CAUTION_TEXT } from "../caution.js";
