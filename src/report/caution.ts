/**
 * The safety caution of the reports: re-exported from its one home, `src/caution.ts`.
 * @module
 */
export { CAUTION_TEXT } from "../caution.js";
