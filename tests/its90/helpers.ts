// Shared helpers of the ITS-90 tests: the fixture table and a 40-digit decimal check path.
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { Decimal } from "decimal.js";
import { thermocoupleData, type ThermocoupleType } from "../../src/index.js";
import { _emfDecimal } from "../../src/its90/exactDecimal.js";

export interface TableRow {
  type: ThermocoupleType;
  temperatureC: number;
  emfText: string;
  source: string;
}

/**
 * Published table values copied from ../shared/its90/tables.tsv; each row names its document
 * (NIST SRD 60 type_t.tab and type_b.tab; ASTM E230 Table 9 for type K; the 350 °C values of all types).
 */
export function loadTableFixture(): TableRow[] {
  const path = fileURLToPath(new URL("../fixtures/its90Tables.tsv", import.meta.url));
  const lines = readFileSync(path, "utf8").trim().split("\n").slice(1);
  return lines.map((line) => {
    const [type, t, e, source] = line.split("\t");
    return { type: type as ThermocoupleType, temperatureC: Number(t), emfText: e as string, source: source as string };
  });
}

/** E(t) in 40-digit decimal arithmetic from the printed coefficients. */
export function emfDecimal(type: ThermocoupleType, temperatureC: number): Decimal {
  return _emfDecimal(thermocoupleData(type), temperatureC, 40);
}

/** Signed distance in mV between E_decimal(t) and a target EMF. */
export function residualMillivolts(type: ThermocoupleType, temperatureC: number, emfMillivolts: number): number {
  return emfDecimal(type, temperatureC).minus(new Decimal(emfMillivolts)).toNumber();
}

/** Deterministic dense grid of n+1 points from a to b. */
export function grid(a: number, b: number, n: number): number[] {
  const out: number[] = [];
  for (let i = 0; i <= n; i++) out.push(i === n ? b : a + ((b - a) * i) / n);
  return out;
}
