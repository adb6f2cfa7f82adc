/**
 * `hotjunction/design`: design files (zod schema, validation, JSON Schema) and the report renderers.
 * @module
 */
export { designFileSchema, referenceSchema, type DesignFile, type DesignReference } from "./designSchema.js";
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
export { CAUTION_TEXT } from "../report/caution.js";
