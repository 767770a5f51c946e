/**
 * The words a diagram uses for a water's ligand totals (captions, hover text, tables): "DIC 1.35, Cl 2 mmol/kg".
 */
import { LIGAND_ORDER, LigandName, LigandTotals } from "../chemistry";

export const LIGAND_WORDS: Readonly<Record<LigandName, string>> = {
  carbonate: "DIC",
  chloride: "Cl",
  sulfur: "S",
  phosphate: "P",
};

/** "DIC 1.35, Cl 2 mmol/kg" — totals in mmol/kg with three significant figures; "" without ligands. */
export function formatTotals(totals: LigandTotals): string {
  const parts = LIGAND_ORDER.filter((l) => (totals[l] ?? 0) > 0).map(
    (l) => `${LIGAND_WORDS[l]} ${Number(((totals[l] ?? 0) * 1000).toPrecision(3))}`,
  );
  return parts.length === 0 ? "" : `${parts.join(", ")} mmol/kg`;
}
