/**
 * Which temperatures a metal's answers can be given at. Water is modelled from 0 to 300 °C (water-properties.ts);
 * a metal's species above 100 °C need S° at 25 °C (the temperature dependence of ΔG°r starts from ΔS°r, and the
 * Criss–Cobble correspondence for ions needs S° as well). Records without S° keep ΔG°r constant, acceptable near
 * 25 °C but not at boiler temperatures, so above 100 °C a metal whose species lack S° is refused with their names.
 */
import { MAX_CELSIUS, MIN_CELSIUS } from "./constants";
import { Database } from "./database";
import { NEEDS_CARBONATE, NEEDS_CHLORIDE, NEEDS_PHOSPHATE, NEEDS_SULFUR, speciesTable } from "./species-tables";

/** Highest temperature a species without S° may be used at, °C (the range the data were fitted near, 1 bar). */
export const CONSTANT_GIBBS_MAX_CELSIUS = 100;

const LIGAND_NAMES: readonly [number, string][] = [
  [NEEDS_CARBONATE, "carbonate"],
  [NEEDS_SULFUR, "sulfur"],
  [NEEDS_CHLORIDE, "chloride"],
  [NEEDS_PHOSPHATE, "phosphate"],
];

/** Formulas of the species of `element` lacking S° that take part in a water with the `present` ligand bits. */
export function speciesWithoutEntropy(db: Database, element: string, present: number): string[] {
  const table = speciesTable(db, element);
  return table.species
    .filter((s, i) => s.species.S === null && (table.needs[i] & ~present) === 0)
    .map((s) => s.formula);
}

/** Why `element` cannot be answered at `celsius` with the `present` ligands, or null when it can. */
export function temperatureProblem(db: Database, element: string, celsius: number, present = 0): string | null {
  if (!(celsius >= MIN_CELSIUS && celsius <= MAX_CELSIUS))
    return `temperature ${celsius} °C is outside ${MIN_CELSIUS}–${MAX_CELSIUS} °C`;
  if (celsius <= CONSTANT_GIBBS_MAX_CELSIUS) return null;
  const missing = speciesWithoutEntropy(db, element, present);
  if (missing.length === 0) return null;
  const ligands = LIGAND_NAMES.filter(([bit]) => present & bit).map(([, name]) => name);
  const water = ligands.length ? ` with ${ligands.join(", ")}` : "";
  return `temperature ${celsius} °C: ${element}${water} is modelled 0–${CONSTANT_GIBBS_MAX_CELSIUS} °C only; above ${CONSTANT_GIBBS_MAX_CELSIUS} °C the records lack S° for ${missing.join(", ")}`;
}

/** Ligand bits of a water from its totals. */
export function presentLigands(carbonate = 0, chloride = 0, sulfur = 0, phosphate = 0): number {
  const bits =
    (carbonate > 0 ? NEEDS_CARBONATE : 0) | (sulfur > 0 ? NEEDS_SULFUR : 0) | (chloride > 0 ? NEEDS_CHLORIDE : 0);
  return bits | (phosphate > 0 ? NEEDS_PHOSPHATE : 0);
}
