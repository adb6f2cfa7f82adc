/**
 * The figures behind the printed bounds (firmware tables, the exact inverse's monotonicity, the worst-case
 * bracket of the example designs), measured here, not in a timed test:
 *
 * - firmware tables: every type × direction × {32-bit integer, float64} over the type's range, built, then
 *   checked at every integer input (integer tables) or 64 points per segment plus every breakpoint ± 3 ulps
 *   (float tables) against the library's float64 conversion (plus the table's stated reference error), and at
 *   the 8 worst points of each table against a 40-digit decimal.js evaluation of the NIST Monograph 175
 *   reference function; prints tables built and refused, points checked, the worst error/bound ratio both ways;
 * - the exact inverse: every piece edge ± 6 ulps and 2,000 adjacent floats inside each Newton-solved segment,
 *   steps backwards counted;
 * - the worst-case bracket of every setpoint of `examples/`: comparator designs (the trip model's bracket) and ADC
 *   designs (the reading model's at the setpoint, as the check report shows it): attained, enclosure, gap.
 *
 * Usage: `npx tsx scripts/boundFigures.ts [--json] [--brackets]` (about a minute on a quiet 2-core machine;
 * `--brackets` measures the brackets only).
 */
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { buildFirmwareTable, emfFromTemperature, interpolateFirmwareTable, seebeckCoefficient, temperatureFromEmf, temperatureRange } from "../src/index.js";
import type { BuildFirmwareTableOptions, FirmwareTable, ThermocoupleType } from "../src/index.js";
import { _decimalContext, _emfDecimal } from "../src/its90/exactDecimal.js";
import { _compile } from "../src/its90/compiled.js";
import { _completeExactInverse, _exactInverse } from "../src/its90/exactInverse.js";
import { thermocoupleData, thermocoupleTypes } from "../src/its90/resolveType.js";
import { parseDesign, tripDesignFromDesign } from "../src/design/index.js";
import { designTrip } from "../src/trip/designTrip.js";
import { _tripReportOfDesign } from "../src/cli/commands/check.js";

const D = _decimalContext(40);
const asJson = process.argv.includes("--json");

function ulps(x: number, k: number): number {
  if (x === 0) return k * 2 ** -1074;
  const b = new Float64Array([x]);
  const i = new BigInt64Array(b.buffer);
  i[0] = (i[0] as bigint) + BigInt(x > 0 ? k : -k);
  return b[0] as number;
}

/** The library's float64 conversion a table approximates, natural output units (µV or °C), at a stored input. */
function reference(table: FirmwareTable, x: number): number {
  const natural = x / table.input.scale;
  return table.kind === "temperatureToEmf" ? emfFromTemperature(table.thermocoupleType, natural) * 1000 : temperatureFromEmf(table.thermocoupleType, natural / 1000);
}

/** 40-digit value of the same conversion (decimal.js; the inverse by Newton on the decimal forward function). */
function reference40(table: FirmwareTable, x: number): InstanceType<typeof D> {
  const data = thermocoupleData(table.thermocoupleType);
  const natural = new D(x).div(table.input.scale);
  if (table.kind === "temperatureToEmf") return _emfDecimal(data, natural.toString(), 40).times(1000);
  const emf = natural.div(1000);
  const range = temperatureRange(table.thermocoupleType);
  let t = new D(reference(table, x));
  for (let i = 0; i < 5; i++) {
    const slope = new D(seebeckCoefficient(table.thermocoupleType, Math.min(Math.max(t.toNumber(), range.minC), range.maxC)) / 1000);
    t = t.minus(_emfDecimal(data, t.toString(), 40).minus(emf).div(slope));
  }
  return t;
}

function inputsOf(table: FirmwareTable): number[] {
  const { min, max, numberType } = table.input;
  const out: number[] = [];
  if (!numberType.startsWith("float")) {
    for (let x = min; x <= max; x++) out.push(x);
    return out;
  }
  for (let i = 0; i + 1 < table.inputs.length; i++) {
    const a = table.inputs[i] as number;
    const b = table.inputs[i + 1] as number;
    for (let k = 0; k < 64; k++) out.push(a + ((b - a) * (k + 0.5)) / 64);
  }
  for (const b of [...table.inputs, min, max]) for (let k = -3; k <= 3; k++) out.push(ulps(b, k));
  return out.filter((x) => x >= min && x <= max);
}

function tableFigures() {
  const figures = { built: 0, refused: 0, points: 0, decimalPoints: 0, worstRatio: 0, worstRatio40: 0, worstTable: "", refusedTables: [] as string[] };
  for (const type of thermocoupleTypes as readonly ThermocoupleType[]) {
    const range = temperatureRange(type);
    const minC = type === "B" ? 250 : range.minC;
    const maxC = range.maxC;
    for (const kind of ["temperatureToEmf", "emfToTemperature"] as const) {
      for (const numberType of ["int32", "float64"] as const) {
        const inverse = kind === "emfToTemperature";
        const float = numberType === "float64";
        const options: BuildFirmwareTableOptions = {
          type,
          kind,
          minC,
          maxC,
          input: { numberType, scale: inverse || float ? 1 : 10 },
          output: { numberType, scale: inverse && !float ? 100 : 1 },
          maxErrorOutputUnits: inverse ? (float ? 1e-3 : 0.05) : float ? 0.05 : 2,
          maxBreakpoints: 8192,
        };
        const name = `${type} ${kind} ${numberType} ${minC}…${maxC} °C`;
        let table: FirmwareTable;
        try {
          table = buildFirmwareTable(options);
        } catch (error) {
          figures.refused++;
          figures.refusedTables.push(`${name}: ${(error as Error).message}`);
          continue;
        }
        figures.built++;
        const bound = table.errorBound.totalOutputUnits;
        const errors: [number, number][] = [];
        for (const x of inputsOf(table)) errors.push([Math.abs(interpolateFirmwareTable(table, x) / table.output.scale - reference(table, x)), x]);
        figures.points += errors.length;
        errors.sort((a, b) => b[0] - a[0]);
        const ratio = ((errors[0]?.[0] ?? 0) + table.errorBound.referenceOutputUnits) / bound;
        if (ratio > figures.worstRatio) {
          figures.worstRatio = ratio;
          figures.worstTable = name;
        }
        for (const [, x] of errors.slice(0, 8)) {
          const e40 = new D(interpolateFirmwareTable(table, x)).div(table.output.scale).minus(reference40(table, x)).abs().toNumber();
          figures.decimalPoints++;
          figures.worstRatio40 = Math.max(figures.worstRatio40, e40 / bound);
        }
      }
    }
  }
  return figures;
}

function monotoneFigures() {
  let edges = 0;
  let points = 0;
  let backwards = 0;
  for (const letter of thermocoupleTypes) {
    const ct = _compile(thermocoupleData(letter));
    const inv = _completeExactInverse(ct);
    const scan = (xs: number[]): void => {
      let previous = Number.NEGATIVE_INFINITY;
      for (const x of xs) {
        if (!(x > ct.emfAtMinC && x <= ct.emfAtMaxC)) continue;
        const t = _exactInverse(ct, inv, x);
        points++;
        if (t < previous) backwards++;
        previous = t;
      }
    };
    for (const piece of inv.pieces) {
      for (let k = 0; k <= piece.count; k++) {
        const edge = piece.emfStart + k / piece.perMillivolt;
        edges++;
        scan(Array.from({ length: 13 }, (_, j) => ulps(edge, j - 6)));
        if (k < piece.count && piece.state[k] === 1) {
          const start = piece.emfStart + (k + 0.5) / piece.perMillivolt;
          scan(Array.from({ length: 2000 }, (_, j) => ulps(start, j - 1000)));
        }
      }
    }
  }
  return { edges, points, backwards };
}

function bracketFigures() {
  const dir = join(import.meta.dirname, "../examples");
  const out: { design: string; setpoint: string; kind: "comparator" | "adc"; attained: [number, number]; enclosure: [number, number]; gap: [number, number] }[] = [];
  const quietIo = { writeOut: () => undefined, writeErr: () => undefined, stderrIsTty: false, cwd: "." };
  for (const file of readdirSync(dir).filter((f) => f.endsWith(".json"))) {
    const design = parseDesign(readFileSync(join(dir, file), "utf8"));
    const comparator = (design as { comparator?: unknown }).comparator !== undefined;
    const bands = comparator
      ? designTrip(tripDesignFromDesign(design), { monteCarloTrials: 200 }).setpoints.map((sp) => ({ name: sp.name, w: sp.worstCase }))
      : _tripReportOfDesign(quietIo, design, { acceptanceMethod: "worst-case", coverage: 0.95, trials: 200, seed: 1 }).setpoints.map((sp) => ({
          name: sp.name,
          w: sp.bands.find((b) => b.method === "worst-case") as NonNullable<(typeof sp.bands)[number]>,
        }));
    for (const { name, w } of bands) {
      out.push({
        design: file,
        setpoint: name,
        kind: comparator ? "comparator" : "adc",
        attained: [w.lowC, w.highC],
        enclosure: [w.enclosureLowC ?? Number.NaN, w.enclosureHighC ?? Number.NaN],
        gap: [w.enclosureGapLowC ?? Number.NaN, w.enclosureGapHighC ?? Number.NaN],
      });
    }
  }
  return out;
}

const bracketsOnly = process.argv.includes("--brackets");
const tables = bracketsOnly ? { built: 0, refused: 0, points: 0, decimalPoints: 0, worstRatio: 0, worstRatio40: 0, worstTable: "", refusedTables: [] as string[] } : tableFigures();
const monotone = bracketsOnly ? { edges: 0, points: 0, backwards: 0 } : monotoneFigures();
const brackets = bracketFigures();
if (asJson) console.log(JSON.stringify({ tables, monotone, brackets }, null, 2));
else {
  console.log(`firmware tables: ${tables.built} built, ${tables.refused} refused; ${tables.points} points checked against float64 (+ reference error), ${tables.decimalPoints} at 40 digits`);
  console.log(`  worst error/bound ${tables.worstRatio.toFixed(4)} (float64 + reference error; ${tables.worstTable}), ${tables.worstRatio40.toFixed(4)} (40 digits)`);
  for (const r of tables.refusedTables) console.log(`  refused: ${r}`);
  console.log(`exact inverse: ${monotone.edges} piece edges ± 6 ulps and the Newton segments, ${monotone.points} EMFs, ${monotone.backwards} steps backwards`);
  for (const b of brackets) {
    console.log(`worst-case bracket (${b.kind}) ${b.design} "${b.setpoint}": attained ${b.attained.join(" to ")} °C, enclosure ${b.enclosure.join(" to ")} °C, gap ${b.gap.map((g) => g.toExponential(2)).join(" / ")} °C`);
  }
}
