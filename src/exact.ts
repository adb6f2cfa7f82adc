/**
 * `hotjunction/exact`: decimal.js-backed precision tools, kept out of the core entry: published-style
 * reference tables (rounded on the exact decimal value) and decimal evaluation of the reference functions.
 * @module
 */
export { emfFromTemperatureDecimal } from "./its90/exactDecimal.js";
export {
  formatReferenceTableCsv,
  formatReferenceTableMarkdown,
  referenceTable,
  referenceTableMaxRows,
  type ReferenceTable,
  type ReferenceTableOptions,
  type ReferenceTableRow,
} from "./its90/referenceTable.js";
