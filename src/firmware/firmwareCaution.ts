/**
 * The caution every emitted firmware table carries: re-exported from its one home, `src/caution.ts`.
 * @module
 */
export { firmwareTableCaution } from "../caution.js";
