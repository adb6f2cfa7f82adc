/**
 * Thermocouple leg alloys (data only): electrical resistivity and Seebeck coefficient against platinum, used
 * by `chain/wire/` for loop resistance and for connectors of another metal.
 *
 * **Every value here is from memory** (handbook tables of thermoelement properties, not copied from a seen
 * copy); they are typical values near room temperature and vary with the supplier's alloy. State your own
 * (`ohms` / `legSeebeck` in the elements) when you have the maker's figures.
 *
 * - Resistivity at 20 °C, µΩ·cm. Checked for consistency against the loop resistances per length of the
 *   common gauges (e.g. type K 20 AWG ≈ 0.59 Ω per double foot, from memory).
 * - Seebeck coefficient against platinum near 0 °C, µV/°C, positive legs only; the negative leg of each type
 *   is derived as S_positive − S_type(t) from the ITS-90 reference function, so the two legs always add up to
 *   the type's own Seebeck coefficient. Valid for contacts between `seebeckValidMinC` and `seebeckValidMaxC`.
 * @module
 */
import type { ThermocoupleType } from "./thermocoupleData.js";

/** An alloy of a thermocouple leg or a contact. */
export interface WireAlloy {
  /** Name of the alloy (generic). */
  readonly name: string;
  /** Resistivity at 20 °C, µΩ·cm. */
  readonly resistivityMicroohmCm: number;
}

/** The legs of a thermocouple type. */
export interface ThermocoupleLegs {
  readonly positive: WireAlloy;
  readonly negative: WireAlloy;
  /** Seebeck coefficient of the positive leg against platinum near 0 °C, µV/°C. */
  readonly positiveSeebeckVsPlatinumMicrovoltsPerC: number;
}

/** Source note of {@link thermocoupleLegs} and {@link contactMetals}. */
export const wireAlloySource =
  "typical thermoelement resistivities (20 °C) and Seebeck coefficients against platinum (near 0 °C), from memory";

/** Lowest contact temperature for which the tabulated leg coefficients are used, °C. */
export const seebeckValidMinC = -20;
/** Highest contact temperature for which the tabulated leg coefficients are used, °C. */
export const seebeckValidMaxC = 100;

/** Contact metals of connectors and terminal blocks: Seebeck coefficient against platinum near 0 °C, µV/°C (from memory). */
export const contactMetals = {
  copper: { name: "copper", resistivityMicroohmCm: 1.72, seebeckVsPlatinumMicrovoltsPerC: 6.5 },
  platinum: { name: "platinum", resistivityMicroohmCm: 10.6, seebeckVsPlatinumMicrovoltsPerC: 0 },
} as const;

/** The names of {@link contactMetals}. */
export type ContactMetalName = keyof typeof contactMetals;

// Deliberately alike: one line per alloy, the same shape with its own name and resistivity (data).
const chromel: WireAlloy = { name: "nickel-chromium (KP, EP)", resistivityMicroohmCm: 70.6 };
const alumel: WireAlloy = { name: "nickel-aluminium (KN)", resistivityMicroohmCm: 29.4 };
const constantan: WireAlloy = { name: "copper-nickel (JN, TN, EN)", resistivityMicroohmCm: 49 };
const iron: WireAlloy = { name: "iron (JP)", resistivityMicroohmCm: 10 };
const copper: WireAlloy = { name: "copper (TP)", resistivityMicroohmCm: 1.72 };
const nicrosil: WireAlloy = { name: "nickel-chromium-silicon (NP)", resistivityMicroohmCm: 93 };
const nisil: WireAlloy = { name: "nickel-silicon (NN)", resistivityMicroohmCm: 37 };
const platinum: WireAlloy = { name: "platinum (RN, SN)", resistivityMicroohmCm: 10.6 };
const ptRh10: WireAlloy = { name: "platinum-10 % rhodium (SP)", resistivityMicroohmCm: 18.9 };
const ptRh13: WireAlloy = { name: "platinum-13 % rhodium (RP)", resistivityMicroohmCm: 19.6 };
const ptRh30: WireAlloy = { name: "platinum-30 % rhodium (BP)", resistivityMicroohmCm: 17.5 };
const ptRh6: WireAlloy = { name: "platinum-6 % rhodium (BN)", resistivityMicroohmCm: 16 };

/** The legs of each thermocouple type (from memory). */
export const thermocoupleLegs: Readonly<Record<ThermocoupleType, ThermocoupleLegs>> = {
  K: { positive: chromel, negative: alumel, positiveSeebeckVsPlatinumMicrovoltsPerC: 25.8 },
  E: { positive: chromel, negative: constantan, positiveSeebeckVsPlatinumMicrovoltsPerC: 25.8 },
  J: { positive: iron, negative: constantan, positiveSeebeckVsPlatinumMicrovoltsPerC: 18.5 },
  T: { positive: copper, negative: constantan, positiveSeebeckVsPlatinumMicrovoltsPerC: 6.5 },
  N: { positive: nicrosil, negative: nisil, positiveSeebeckVsPlatinumMicrovoltsPerC: 12.2 },
  S: { positive: ptRh10, negative: platinum, positiveSeebeckVsPlatinumMicrovoltsPerC: 5.4 },
  R: { positive: ptRh13, negative: platinum, positiveSeebeckVsPlatinumMicrovoltsPerC: 5.3 },
  B: { positive: ptRh30, negative: ptRh6, positiveSeebeckVsPlatinumMicrovoltsPerC: 0 },
};
