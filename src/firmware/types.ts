/**
 * Types of firmware tables: options, columns, the built table and its error report; and the data the
 * interpolation reads. Imported by the builder, the interpolation and the emitters, so none of them imports
 * another for its types.
 * @module
 */
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import type { FirmwareAdcChain } from "./firmwareAdcChain.js";
import type { FirmwareNumberType } from "./firmwareNumberType.js";
import type { FirmwareTableKind, FirmwareTableUnit } from "./tableFunction.js";

/** How breakpoints are placed. */
export type FirmwareTablePlacement = "adaptive" | "uniform";

/** Storage of one column: number type and fixed-point scale (stored = natural · scale). */
export interface FirmwareColumnFormat {
  /** Number type of the stored values. */
  readonly numberType: FirmwareNumberType;
  /**
   * Stored units per natural unit, finite and > 0 (default 1). E.g. 100 stores temperature in
   * centi-degrees, 1000 in milli-degrees; 1 stores EMF in whole µV.
   */
  readonly scale?: number;
}

/** Options of {@link buildFirmwareTable}. A plain JSON-able object. */
export interface BuildFirmwareTableOptions {
  /** Thermocouple type letter. */
  readonly type: ThermocoupleType;
  /** What the table converts; see {@link FirmwareTableKind}. */
  readonly kind: FirmwareTableKind;
  /**
   * Lowest temperature the table must cover, °C (hot junction, or cold-junction sensor for cold-junction
   * tables), within the type's range (for EMF/code inputs of type B: above about 42.13 °C, where the
   * inverse becomes unique).
   */
  readonly minC: number;
  /** Highest temperature the table must cover, °C, above `minC` and within the type's range. */
  readonly maxC: number;
  /**
   * Largest error allowed anywhere in the range, in the output's natural unit (°C for temperature
   * outputs, µV for EMF outputs, codes for ADC-code outputs), finite and > 0, and above the rounding
   * bound of the output format (1 stored unit for integer outputs).
   */
  readonly maxErrorOutputUnits: number;
  /**
   * `"adaptive"` (default): fewest breakpoints meeting the error (greedy farthest reach with bisection).
   * `"uniform"`: equal spacing of 2^k stored input units (shift-based indexing), the widest that meets
   * the error; needs an integer input type.
   */
  readonly placement?: FirmwareTablePlacement;
  /**
   * Input column format. Default: int32, scale 1 for EMF (whole µV) and codes; int32, scale 100
   * (centi-degrees) for temperatures.
   */
  readonly input?: FirmwareColumnFormat;
  /**
   * Output column format. Default: int32, scale 1000 (milli-degrees) for temperatures; int32, scale 1
   * for µV and codes. An integer output needs an integer input.
   */
  readonly output?: FirmwareColumnFormat;
  /** The ADC chain, required for the `…AdcCode…` kinds; see {@link FirmwareAdcChain}. */
  readonly chain?: FirmwareAdcChain;
  /** Cap on the number of breakpoints, an integer 2 … 65536 (default 4096). */
  readonly maxBreakpoints?: number;
}

/** One column of a built table. */
export interface FirmwareTableColumn {
  /** What the column holds, in words (e.g. `"EMF"`, `"temperature"`, `"ADC code"`). */
  readonly quantity: string;
  /** Natural unit. */
  readonly unit: FirmwareTableUnit;
  readonly numberType: FirmwareNumberType;
  /** Stored units per natural unit. */
  readonly scale: number;
  /** Lowest value: for the input, the lowest accepted input; for the output, the lowest stored value (stored units). */
  readonly min: number;
  /** Highest value (stored units), as `min`. */
  readonly max: number;
}

/** The reported error of a table, in the output's natural unit. */
export interface FirmwareTableErrorBound {
  /**
   * Bound on |table − exact| anywhere in the input range, never above the request: interpolation plus
   * rounding plus reference error on the worst segment (and at least the largest error found plus the
   * reference error).
   */
  readonly totalOutputUnits: number;
  /** Interpolation part, max|f''|·h²/8 on the worst segment (max|f''| from an interval enclosure). */
  readonly interpolationOutputUnits: number;
  /** Rounding part (fixed point or float). */
  readonly roundingOutputUnits: number;
  /**
   * Float64 error of the reference values the breakpoints are computed from, on the worst segment: an
   * a-priori Horner bound of the forward function (proven), for inverse tables over the smallest Seebeck
   * coefficient plus the exact inverse's fit tolerance (tested, not proven).
   */
  readonly referenceOutputUnits: number;
  /** How max|f''| is enclosed (forward: E''(t); inverse: t'' = −E''/E'³), in words. */
  readonly curvatureMethod: string;
  /** Index of the worst segment (breakpoints `segmentIndex` and `segmentIndex + 1`). */
  readonly segmentIndex: number;
  /** Temperature span of the worst segment, °C. */
  readonly fromC: number;
  readonly toC: number;
}

/** The largest error the dense search found. */
export interface FirmwareTableErrorFound {
  /** |table − float64 reference|, output's natural unit (the true error is within this plus the reference error). */
  readonly errorOutputUnits: number;
  /** Input where it occurs, stored units. */
  readonly atInputStored: number;
  /** Temperature there, °C. */
  readonly atTemperatureC: number;
  /** How many inputs the search evaluated. */
  readonly pointsChecked: number;
}

/** A built firmware table: breakpoints in stored units, formats and the error report. */
export interface FirmwareTable {
  readonly thermocoupleType: ThermocoupleType;
  readonly kind: FirmwareTableKind;
  readonly placement: FirmwareTablePlacement;
  /** The requested temperature range, °C. */
  readonly requestedMinC: number;
  readonly requestedMaxC: number;
  /** The temperatures the accepted input range spans, °C (may differ from the request by one input step). */
  readonly coveredMinC: number;
  readonly coveredMaxC: number;
  readonly input: FirmwareTableColumn;
  readonly output: FirmwareTableColumn;
  /** The chain the table was built for, with defaults filled in, or null. */
  readonly chain: FirmwareTableChain | null;
  /** log2 of the spacing of a uniform table, stored input units; null for adaptive tables. */
  readonly spacingLog2: number | null;
  /**
   * Breakpoint inputs, stored units, increasing. A uniform table's last breakpoint may lie beyond
   * `input.max`; its value then continues the last segment's chord.
   */
  readonly inputs: readonly number[];
  /** Breakpoint outputs, stored units. */
  readonly outputs: readonly number[];
  readonly requestedMaxErrorOutputUnits: number;
  readonly errorBound: FirmwareTableErrorBound;
  readonly maxErrorFound: FirmwareTableErrorFound;
  /** Order of the stored outputs. */
  readonly monotonic: "increasing" | "decreasing" | "none";
}

/** The table data the interpolation needs. @internal */
export interface _InterpolationData {
  readonly inputs: ArrayLike<number>;
  readonly outputs: ArrayLike<number>;
  /** log2 of the uniform spacing (stored input units), or null for a searched table. */
  readonly spacingLog2: number | null;
  readonly inputNumberType: FirmwareNumberType;
  readonly outputNumberType: FirmwareNumberType;
}

/** The ADC chain a table was built for, with defaults filled in (see {@link FirmwareAdcChain}). */
export interface FirmwareTableChain {
  readonly gain: number;
  readonly offsetMillivolts: number;
  /** ADC full-scale voltage, V. */
  readonly fullScaleVolts: number;
  /**
   * The same value under its former name.
   * @deprecated read `fullScaleVolts` (kept for one minor version).
   */
  readonly referenceVolts: number;
  readonly bits: number;
  readonly coldJunctionC: number | null;
}
