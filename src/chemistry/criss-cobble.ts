/**
 * Heat capacities of aqueous ions above 100 °C by the correspondence principle of Criss, C.M., Cobble, J.W.,
 * "The thermodynamic properties of high temperature aqueous solutions. V. The calculation of ionic heat capacities
 * up to 200°", J. Am. Chem. Soc. 86, 5390 (1964).
 *
 * The entropy-mean heat capacity of an ion between 25 °C and t, c̄ = [S°(t) − S°(25 °C)] / ln(T/298.15), is
 * linear in its entropy at 25 °C on the absolute scale (S°abs(H+) = −5.0 cal mol⁻¹ K⁻¹, so S°abs = S°conv − 5.0·z):
 *
 *   c̄abs(t) = a(t) + b(t)·S°abs(298)        (cal mol⁻¹ K⁻¹), one pair (a, b) per class of ion
 *   c̄conv   = c̄abs − z·c̄abs(H+)             (conventional scale: H+ zero at every temperature)
 *
 * The paper tabulates a and b at 60, 100, 150 and 200 °C (values below from memory). Between 100 and 200 °C they
 * are interpolated linearly; from 200 to 300 °C they are extrapolated linearly from the 150 and 200 °C values —
 * beyond the paper's table, the least certain part of the model (README, Limits).
 *
 * Class of an ion, by its formula (a rule of this project following the paper's four classes): a cation (z > 0);
 * a simple anion (z < 0, no oxygen, and OH−); an oxy-anion XOₙ^z− (oxygen, no hydrogen); an acid oxy-anion
 * XOₙ(OH)ₘ^z− (oxygen and hydrogen, e.g. HCO3−, HSO4−, HFeO2−, Fe(OH)4−). Neutral aqueous species, solids, gases
 * and water keep their constant Cp° at 25 °C (thermo.ts).
 *
 * Joined to the constant-Cp model at 100 °C with equal ΔG° and ΔS° there (thermo.ts), so every answer is
 * continuous across 100 °C and unchanged below it.
 */
import type { Species } from "./database";
import { ZERO_CELSIUS } from "./constants";

export type IonClass = "cation" | "anion" | "oxyanion" | "acidOxyanion";
const CLASSES: readonly IonClass[] = ["cation", "anion", "oxyanion", "acidOxyanion"];

/** Calories to joules (thermochemical calorie). */
const CALORIE = 4.184;
/** S°abs(H+) of Criss & Cobble, cal mol⁻¹ K⁻¹. */
const HYDROGEN_ION_ABSOLUTE_ENTROPY = -5.0;
/** The temperature the correspondence takes over from the constant-Cp model, °C (and in kelvin). */
export const CORRESPONDENCE_FROM_CELSIUS = 100;
const T1 = CORRESPONDENCE_FROM_CELSIUS + ZERO_CELSIUS;

/**
 * Criss & Cobble (1964) table: a(t), b(t) at 100, 150 and 200 °C, cal mol⁻¹ K⁻¹ (from memory; the cation, anion
 * and oxy-anion rows are recalled with more confidence than the acid oxy-anion row at 150 and 200 °C, which should
 * be checked against the paper before an acid oxy-anion decides an answer above 100 °C).
 */
const TABLE_CELSIUS = [100, 150, 200];
const PARAMETERS: Readonly<Record<IonClass, { a: readonly number[]; b: readonly number[] }>> = {
  cation: { a: [46, 46, 50], b: [-0.55, -0.59, -0.63] },
  anion: { a: [-58, -61, -65], b: [0, -0.03, -0.04] },
  oxyanion: { a: [-138, -133, -145], b: [2.24, 2.27, 2.53] },
  acidOxyanion: { a: [-143, -143, -145], b: [3.95, 3.95, 3.95] },
};

/** The class of an ion, or null for species the correspondence does not cover (neutral, not dissolved, H+). */
export function ionClass(species: Species): IonClass | null {
  if (species.state !== "aq" || species.charge === 0 || species.formula === "H+") return null;
  if (species.charge > 0) return "cation";
  const hasOxygen = species.elements.O !== undefined;
  const hasHydrogen = species.elements.H !== undefined;
  if (!hasOxygen || species.formula === "OH-") return "anion";
  return hasHydrogen ? "acidOxyanion" : "oxyanion";
}

/** a(t) or b(t) of a class, cal mol⁻¹ K⁻¹: linear between the table's temperatures, linear beyond 200 °C. */
function parameterAt(values: readonly number[], celsius: number): number {
  const [t0, t1, t2] = TABLE_CELSIUS;
  if (celsius <= t1) return values[0] + ((values[1] - values[0]) * (celsius - t0)) / (t1 - t0);
  return values[1] + ((values[2] - values[1]) * (celsius - t1)) / (t2 - t1);
}

/** Number of weights a reaction carries for the correspondence: (a, b) per class, then the constant-Cp part. */
export const CORRESPONDENCE_TERMS = 2 * CLASSES.length + 1;
const CONSTANT_CP_TERM = 2 * CLASSES.length;

/**
 * Adds ν mol of `species` to a reaction's weights: ν for a(t) of its class, ν·S°abs for b(t), −ν·z for a(t) and
 * −ν·z·S°abs(H+) for b(t) of the cation class (the conversion to the conventional scale). Returns false when the
 * correspondence does not cover the species.
 */
export function addCorrespondence(weights: Float64Array, species: Species, nu: number): boolean {
  const cls = ionClass(species);
  if (cls === null || species.S === null) return false;
  const i = 2 * CLASSES.indexOf(cls);
  const absoluteEntropy = species.S / CALORIE + HYDROGEN_ION_ABSOLUTE_ENTROPY * species.charge;
  weights[i] += nu;
  weights[i + 1] += nu * absoluteEntropy;
  weights[0] -= nu * species.charge;
  weights[1] -= nu * species.charge * HYDROGEN_ION_ABSOLUTE_ENTROPY;
  return true;
}

/** Records the constant-Cp part of the covered species (J mol⁻¹ K⁻¹), which the correspondence replaces above 100 °C. */
export function setReplacedHeatCapacity(weights: Float64Array, dCp: number): void {
  weights[CONSTANT_CP_TERM] = dCp;
}

/** ∫ from T1 to T of g(T') dT' by Simpson's rule (g smooth between the table's temperatures; split there). */
function integrate(g: (kelvinT: number) => number, kelvinT: number): number {
  const knots = [
    T1,
    ...TABLE_CELSIUS.slice(1)
      .map((t) => t + ZERO_CELSIUS)
      .filter((k) => k < kelvinT),
    kelvinT,
  ];
  let total = 0;
  for (let j = 0; j + 1 < knots.length; j++) {
    const [lo, hi] = [knots[j], knots[j + 1]];
    const steps = 16;
    const h = (hi - lo) / steps;
    let sum = g(lo) + g(hi);
    for (let m = 1; m < steps; m++) sum += (m % 2 === 1 ? 4 : 2) * g(lo + m * h);
    total += (sum * h) / 3;
  }
  return total;
}

/** The basis at and below 100 °C (all terms 0); read only, like every basis handed out. */
export const NO_CORRESPONDENCE = new Float64Array(CORRESPONDENCE_TERMS);
const basisMemo = { kelvinT: Number.NaN, values: new Float64Array(CORRESPONDENCE_TERMS) };

/**
 * The functions the weights multiply at T (kelvin), so that ΔG°r(T) gains Σ wₖ·Bₖ(T) above 100 °C (0 below):
 *   Bₖ = −4.184·∫_{T1}^{T} [φₖ(T')·ln(T'/T0) − φₖ(T1)·ln(T1/T0)] dT'   (φₖ = a or b of a class)
 *   B_Cp = T·ln(T/T1) − (T − T1)                                        (removes the constant-Cp entropy gain)
 * from ΔS°(T) = ΔS°const(T1) + [S°CC(T) − S°CC(T1)] for the covered ions and ΔG°(T) = ΔG°(T1) − ∫ΔS° dT.
 */
export function correspondenceBasis(kelvinT: number): Float64Array {
  // at and below 100 °C every term is 0: one shared array, so that a column of new temperatures allocates nothing
  if (!(kelvinT > T1)) return NO_CORRESPONDENCE;
  if (basisMemo.kelvinT === kelvinT) return basisMemo.values;
  const values = new Float64Array(CORRESPONDENCE_TERMS);
  if (kelvinT > T1) {
    const T0 = 298.15;
    const lnAtT1 = Math.log(T1 / T0);
    CLASSES.forEach((cls, c) => {
      (["a", "b"] as const).forEach((key, k) => {
        const series = PARAMETERS[cls][key];
        const atT1 = parameterAt(series, CORRESPONDENCE_FROM_CELSIUS) * lnAtT1;
        values[2 * c + k] =
          -CALORIE * integrate((T) => parameterAt(series, T - ZERO_CELSIUS) * Math.log(T / T0) - atT1, kelvinT);
      });
    });
    values[CONSTANT_CP_TERM] = kelvinT * Math.log(kelvinT / T1) - (kelvinT - T1);
  }
  basisMemo.kelvinT = kelvinT;
  basisMemo.values = values;
  return values;
}

/** Σ wₖ·Bₖ(T): what the correspondence adds to ΔG°r at T (kelvin), J/mol; 0 at and below 100 °C. */
export function correspondenceGibbs(weights: Float64Array | null, kelvinT: number): number {
  if (weights === null || !(kelvinT > T1)) return 0;
  const basis = correspondenceBasis(kelvinT);
  let sum = 0;
  for (let k = 0; k < CORRESPONDENCE_TERMS; k++) sum += weights[k] * basis[k];
  return sum;
}
