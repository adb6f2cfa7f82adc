/**
 * Plain, JSON-serializable descriptions of the parts of the wire between the probe and the amplifier:
 * extension or compensating cable, intermediate connectors, loop resistance with bias and open-circuit
 * detection currents, insulation leakage at temperature, and ageing of the probe. Every number carries its
 * unit in its key name (°C `C`, Ω `Ohms`, nA `Nanoamps`, m `Metres`, mm `Mm`, h `Hours`, µV `Microvolts`).
 *
 * These elements exist as modules (`src/chain/wire/`); they are wired into the compiled chain, the design
 * schema, the fault catalogue and the reports in a later step (see `src/chain/wire/index.ts` for where each
 * stage sits in the signal path).
 * @module
 */
import type { ContactMetalName } from "../data/wireAlloys.js";

/** A temperature range, °C (min ≤ max; a single temperature is min = max). */
export interface TemperatureRangeC {
  readonly minC: number;
  readonly maxC: number;
}

// ---------------------------------------------------------------------------------------------------
// Extension and compensating cable
// ---------------------------------------------------------------------------------------------------

/** IEC 60584-3 cable tolerance class (compensating cables have class 2 only). */
export interface IecCableClass {
  readonly standard: "IEC 60584-3";
  readonly class: 1 | 2;
  /** Compensating cables of types K, R and S: variant A or B. */
  readonly variant?: "A" | "B";
}

/** ASTM E230 extension-wire limits. */
export interface AstmCableLimits {
  readonly standard: "ASTM E230";
  readonly limits: "standard" | "special";
}

/** A cable tolerance of one's own (a supplier's statement): ± °C at the cable's temperature, over a range. */
export interface CustomCableTolerance {
  readonly standard: "custom";
  /** ± °C at the cable's temperature (≥ 0), converted through S(t_cable). */
  readonly toleranceC: number;
  /** Lowest cable temperature where it holds, °C. */
  readonly minC: number;
  /** Highest cable temperature where it holds, °C. */
  readonly maxC: number;
}

/** How a cable's tolerance is stated. */
export type CableTolerance = IecCableClass | AstmCableLimits | CustomCableTolerance;

/**
 * How the cable's deviation behaves between the temperatures its tolerance is stated for.
 * - `"envelope"` (default): only what the statement guarantees: |ΔE| ≤ T(t_junction) + T(t_cj), where T is the
 *   tolerance as an EMF. Larger, and does not vanish for an isothermal run; the default because a safety
 *   band must hold for any cable the statement admits.
 * - `"proportional"`: the cable's EMF is (1 + k)·[E(t_junction) − E(t_cj)], a relative mismatch of
 *   its alloys; k is bounded so that the deviation from a 0 °C reference stays within the tolerance everywhere
 *   in the rated range. A cable with both ends at one temperature adds nothing. Narrower; it assumes the
 *   deviation's shape (a uniform relative mismatch of the alloys): choose it where the cable maker's data
 *   support that.
 */
export type CableMismatchModel = "proportional" | "envelope";

/** An extension or compensating cable between the probe's head and the instrument's terminals. */
export interface ExtensionCableElement {
  readonly kind: "extensionCable";
  /** `"extension"` (the thermocouple's own alloys) or `"compensating"` (other alloys over a narrow range). */
  readonly grade: "extension" | "compensating";
  readonly tolerance: CableTolerance;
  /** Every temperature the cable passes through, both ends included, °C; must lie in the rated range. */
  readonly runTemperatureC: TemperatureRangeC;
  /** Temperature of the cable's junction with the thermocouple (the probe head), °C; within the run. */
  readonly junctionTemperatureC: TemperatureRangeC;
  /** Default `"envelope"` (conservative: holds for any deviation the statement admits). */
  readonly mismatch?: CableMismatchModel;
  /** Optional label for reports. */
  readonly label?: string;
}

// ---------------------------------------------------------------------------------------------------
// Connectors and terminal blocks
// ---------------------------------------------------------------------------------------------------

/** A contact metal: a tabulated one, the thermocouple's own alloys, or one stated by the user. */
export type ContactMetal = ContactMetalName | "matching" | StatedContactMetal;

/** A contact metal with its Seebeck coefficient against platinum stated by the user. */
export interface StatedContactMetal {
  readonly name: string;
  /** Seebeck coefficient against platinum at the connector's temperature, µV/°C. */
  readonly seebeckVsPlatinumMicrovoltsPerC: number;
}

/** Seebeck coefficients of the legs against the contact metal, stated by the user (overrides the tables). */
export interface StatedLegSeebeck {
  /** Positive leg against the contact metal, µV/°C. */
  readonly positiveMicrovoltsPerC: number;
  /** Negative leg against the contact metal, µV/°C. */
  readonly negativeMicrovoltsPerC: number;
}

/**
 * A connector or terminal block in the thermocouple circuit.
 * - `arrangement: "terminates"`: the thermocouple (or its cable) ends here and copper runs on to the
 *   instrument. The connector becomes the de facto reference junction: the error is E(t_cj) − E(t_connector)
 *   (exact, ITS-90), plus a per-leg term when the two legs' contacts differ in temperature. Give the
 *   connector's temperature as `temperatureC` (absolute) or `aboveColdJunctionC` (relative to the
 *   cold-junction sensor), exactly one.
 * - `arrangement: "inline"`: the same alloy continues on the far side. Each leg adds its Seebeck coefficient
 *   against the contact metal times the temperature difference across its pair of contacts. A connector of
 *   matching alloy adds nothing.
 */
export interface ConnectorElement {
  readonly kind: "connector";
  readonly arrangement: "terminates" | "inline";
  /** Metal of the contacts. */
  readonly contactMetal: ContactMetal;
  /** Temperature of the connector, °C (absolute). */
  readonly temperatureC?: TemperatureRangeC;
  /** Temperature of the connector minus that of the cold-junction sensor, °C ("terminates" only). */
  readonly aboveColdJunctionC?: TemperatureRangeC;
  /** "terminates": difference between the positive and the negative leg's contacts, ± °C. Default 0. */
  readonly legDifferenceC?: number;
  /** "inline": temperature difference across the positive leg's pair of contacts (probe side − instrument side), ± °C. */
  readonly positiveLegDifferenceC?: number;
  /** "inline": the same for the negative leg, ± °C. */
  readonly negativeLegDifferenceC?: number;
  /** Leg coefficients against the contact metal; default from `src/data/wireAlloys.ts`. */
  readonly legSeebeck?: StatedLegSeebeck;
  /** Optional label for reports. */
  readonly label?: string;
}

// ---------------------------------------------------------------------------------------------------
// Loop resistance, bias and detection currents
// ---------------------------------------------------------------------------------------------------

/** A length of thermocouple wire of the chain's type: gauge by AWG or diameter. */
export interface ThermocoupleWireRun {
  /** Length of the pair (each leg has this length), m (≥ 0). */
  readonly lengthMetres: number;
  /** Diameter of each leg, mm (> 0). Give this or `awg`. */
  readonly diameterMm?: number;
  /** American Wire Gauge of each leg, integer −3 (4/0) … 40. Give this or `diameterMm`. */
  readonly awg?: number;
}

/** Direction of the open-circuit detection current through the loop. */
export type DetectionDirection = "pullUp" | "pullDown";

/**
 * The thermocouple loop's resistance and the currents through it. The loop resistance is the sum of the
 * thermocouple wire (from alloy resistivities, or `thermocoupleOhms`), the cable (`cableOhms`) and any other
 * series resistance (`otherOhms`).
 */
export interface LoopResistanceElement {
  readonly kind: "loopResistance";
  /** Thermocouple wire by gauge and length; or give `thermocoupleOhms`. */
  readonly thermocoupleWire?: ThermocoupleWireRun;
  /** Loop resistance of the thermocouple, both legs, Ω (≥ 0). */
  readonly thermocoupleOhms?: number;
  /** Loop resistance of the extension or compensating cable, both conductors, Ω (≥ 0). Default 0. */
  readonly cableOhms?: number;
  /**
   * An extension-grade cable by gauge and length (the thermocouple's own alloys); or give `cableOhms`.
   * Compensating cables are of other alloys: give their `cableOhms`.
   */
  readonly cableWire?: ThermocoupleWireRun;
  /** Other series resistance in the loop (filter resistors), Ω (≥ 0). Default 0. */
  readonly otherOhms?: number;
  /** Tolerance of the loop resistance, ± fraction. Default 0. */
  readonly resistanceToleranceFraction?: number;
  /** The amplifier's input bias current, ± nA (sign unknown). Default 0. */
  readonly biasCurrentNanoamps?: number;
  /** Open-circuit detection current, nA (≥ 0, magnitude). Default 0. */
  readonly detectionCurrentNanoamps?: number;
  /** Tolerance of the detection current, ± fraction. Default 0. */
  readonly detectionCurrentToleranceFraction?: number;
  /**
   * `"pullUp"`: current flows into the positive input, through the loop, out of the negative input: the
   * signal reads high by I·R (an open circuit drives the input upscale). `"pullDown"`: the reverse, reads low.
   * Required when the detection current is not 0.
   */
  readonly detectionDirection?: DetectionDirection;
  /** Optional label for reports. */
  readonly label?: string;
}

// ---------------------------------------------------------------------------------------------------
// Probe: insulation leakage and ageing
// ---------------------------------------------------------------------------------------------------

/**
 * Insulation leakage at temperature: a shunt across the hot end that, with the loop resistance, divides the
 * EMF by (1 + R_loop/R_shunt). Design-specific: mineral-insulated probes lose insulation resistance steeply
 * with temperature; take the value from the probe maker for your sheath, length and temperature.
 */
export interface InsulationLeakageElement {
  readonly kind: "insulationLeakage";
  /** Lowest shunt (insulation) resistance at the operating temperature, Ω (> 0). */
  readonly minimumShuntOhms: number;
  /** Loop resistance between the shunt and the amplifier, Ω (≥ 0). */
  readonly loopOhms: number;
  /** Temperature at which the insulation resistance is stated, °C (for reports). */
  readonly statedAtC?: number;
  /** Optional label for reports. */
  readonly label?: string;
}

/** Whether an ageing drift has a known sign. */
export type DriftDirection = "up" | "down" | "symmetric";

/**
 * Ageing of the probe: a drift the user states, either as a rate (°C per 1,000 h at a stated temperature)
 * or as a total over the service life between recalibrations. Accumulates linearly with time in service.
 */
export interface AgeingElement {
  readonly kind: "ageing";
  /** Drift rate, ± °C per 1,000 h at `statedAtC` (≥ 0). Give this or `totalDriftC`. */
  readonly driftCPer1000Hours?: number;
  /** Total drift over `serviceHours`, ± °C (≥ 0). Give this or `driftCPer1000Hours`. */
  readonly totalDriftC?: number;
  /** Temperature at which the drift is stated, °C; the hot junction must not exceed it. */
  readonly statedAtC: number;
  /** Service life between recalibrations, h (> 0). */
  readonly serviceHours: number;
  /** `"up"`: reads high by 0 … D; `"down"`: low by 0 … D; `"symmetric"`: ±D. */
  readonly direction: DriftDirection;
  /** Optional label for reports. */
  readonly label?: string;
}

/** Any element of the wire. */
export type WireElement =
  | ExtensionCableElement
  | ConnectorElement
  | LoopResistanceElement
  | InsulationLeakageElement
  | AgeingElement;

/**
 * Roles under which the wire's error sources are listed. `ChainSourceElement` in `types.ts` gains these
 * when the wire is wired into the chain.
 */
export type WireSourceElement = "cable" | "connector" | "loop" | "probe";

/** The wire's elements, each optional (plain data). */
export interface WireDescription {
  readonly cable?: ExtensionCableElement;
  /** Connectors and terminal blocks; sources are named `connector.*` for one, `connector1.*`, `connector2.*` … for several. */
  readonly connectors?: readonly ConnectorElement[];
  readonly loop?: LoopResistanceElement;
  readonly leakage?: InsulationLeakageElement;
  readonly ageing?: AgeingElement;
}
