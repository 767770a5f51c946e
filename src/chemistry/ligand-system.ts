/**
 * A metal's system in a water with ligands: the ligand cells (ligand-cells.ts) handed to buildSystem, so every
 * metal species containing carbon, sulfur or chlorine is formed from the metal, water, H+, e− and the cell's basis
 * species. With no ligand present this is exactly buildSystem without cells.
 */
import { MAX_CELSIUS, MIN_CELSIUS } from "./constants";
import { Database } from "./database";
import { hasLigands, ligandCells, LigandTotals } from "./ligand-cells";
import { buildSystem, MetalSystem, SystemError, SystemOptions } from "./system";

/** Largest ligand total accepted, mol/kg (beyond it the ideal-solution treatment is meaningless). */
export const MAX_LIGAND_TOTAL = 10;

export function buildLigandSystem(
  db: Database,
  element: string,
  options: SystemOptions,
  totals: LigandTotals,
): MetalSystem {
  if (!hasLigands(totals)) return buildSystem(db, element, options);
  for (const [name, value] of Object.entries(totals)) {
    if (value === undefined) continue;
    if (!(value >= 0 && value <= MAX_LIGAND_TOTAL))
      throw new SystemError(`${name}: total ${value} mol/kg is outside 0–${MAX_LIGAND_TOTAL}`);
  }
  if (!(options.celsius >= MIN_CELSIUS && options.celsius <= MAX_CELSIUS)) return buildSystem(db, element, options); // lets buildSystem report the range
  return { ...buildSystem(db, element, options, ligandCells(db, totals, options.celsius)), ligandTotals: totals };
}
