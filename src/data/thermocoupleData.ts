/**
 * The shape of a thermocouple type's reference data. Data modules implement it; engines take it as an argument.
 * Every number is kept as the decimal text the standard prints, so the float64 path and the decimal.js
 * check path read one source.
 * @module
 */

/** A letter designation of IEC 60584-1 / NIST Monograph 175. */
export type ThermocoupleType = "B" | "E" | "J" | "K" | "N" | "R" | "S" | "T";

/** One sub-range of the reference function E(t) = Σ cᵢ·tⁱ (mV, °C). */
export interface ForwardSubrange {
  /** Lower end in °C (decimal text). */
  readonly minC: string;
  /** Upper end in °C (decimal text). Shared with the next sub-range, which takes precedence there. */
  readonly maxC: string;
  /** c₀…cₙ in mV/°Cⁱ (decimal text). */
  readonly coefficients: readonly string[];
}

/** Type K's added term a₀·exp(a₁·(t − a₂)²) (mV) for 0 °C ≤ t. */
export interface ExponentialTerm {
  readonly a0: string;
  readonly a1: string;
  readonly a2: string;
}

/** One sub-range of the published approximate inverse t = Σ dᵢ·Eⁱ (°C, mV) with its stated error band. */
export interface InverseSubrange {
  readonly minEmfMillivolts: string;
  readonly maxEmfMillivolts: string;
  readonly minC: string;
  readonly maxC: string;
  /** Lowest error of the approximation (t_approx − t90) stated by the source, °C. */
  readonly errorMinC: string;
  /** Highest error of the approximation stated by the source, °C. */
  readonly errorMaxC: string;
  readonly coefficients: readonly string[];
}

/** All reference data of one thermocouple type. */
export interface ThermocoupleData {
  readonly type: ThermocoupleType;
  /** Where the numbers come from. */
  readonly source: string;
  /** Lowest temperature of the reference function, °C. */
  readonly minC: string;
  /** Highest temperature of the reference function, °C. */
  readonly maxC: string;
  readonly forward: readonly ForwardSubrange[];
  readonly exponential?: ExponentialTerm;
  readonly inverse: readonly InverseSubrange[];
}
