/**
 * The shape of a thermocouple type's reference data. Data modules implement it; engines take it as an argument.
 * Every coefficient the standard prints has at most 12 significant digits, so a number literal holds it
 * exactly: `String(x)` gives back the printed decimal value, which is what the decimal.js check path reads.
 * The float64 path and the decimal path therefore share one source.
 * @module
 */

/** A letter designation of IEC 60584-1 / NIST Monograph 175. */
export type ThermocoupleType = "B" | "E" | "J" | "K" | "N" | "R" | "S" | "T";

/** One sub-range of the reference function E(t) = Σ cᵢ·tⁱ (mV, °C). */
export interface ForwardSubrange {
  /** Lower end in °C. */
  readonly minC: number;
  /** Upper end in °C. Shared with the next sub-range, which takes precedence there. */
  readonly maxC: number;
  /** c₀…cₙ in mV/°Cⁱ. */
  readonly coefficients: readonly number[];
}

/** Type K's added term a₀·exp(a₁·(t − a₂)²) (mV) for 0 °C ≤ t. */
export interface ExponentialTerm {
  /** mV. */
  readonly a0: number;
  /** 1/°C². */
  readonly a1: number;
  /** °C. */
  readonly a2: number;
}

/** One sub-range of the published approximate inverse t = Σ dᵢ·Eⁱ (°C, mV) with its stated error band. */
export interface ApproximateInverseRange {
  readonly minEmfMillivolts: number;
  readonly maxEmfMillivolts: number;
  readonly minC: number;
  readonly maxC: number;
  /** Lowest error of the approximation (t_approx − t90) stated by the source, °C. */
  readonly errorMinC: number;
  /** Highest error of the approximation stated by the source, °C. */
  readonly errorMaxC: number;
  /** d₀…dₙ in °C/mVⁱ. */
  readonly coefficients: readonly number[];
}

/**
 * One sub-range of the published approximate inverse.
 * @deprecated Use {@link ApproximateInverseRange} (the same type); this name goes in the next minor version.
 */
export type InverseSubrange = ApproximateInverseRange;

/** All reference data of one thermocouple type. */
export interface ThermocoupleData {
  readonly type: ThermocoupleType;
  /** Where the numbers come from. */
  readonly source: string;
  /** Lowest temperature of the reference function, °C. */
  readonly minC: number;
  /** Highest temperature of the reference function, °C. */
  readonly maxC: number;
  readonly forward: readonly ForwardSubrange[];
  readonly exponential?: ExponentialTerm;
}

/** The published approximate inverse of one type: its sub-ranges with coefficients and stated error bands. */
export interface ApproximateInverseData {
  readonly type: ThermocoupleType;
  /** Where the numbers come from. */
  readonly source: string;
  readonly ranges: readonly ApproximateInverseRange[];
}
