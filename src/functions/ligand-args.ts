/**
 * Optional per-row ligand totals shared by SPECIES, REGIME, BOUNDARY and DISSOLVED: [carbonate], [chloride],
 * [sulfur] in mol/kg. Blank (or 0) means the ligand is absent; with all three absent the functions take exactly the
 * ligand-free path.
 */
import { MAX_LIGAND_TOTAL } from "../chemistry/ligand-system";
import { numberArg } from "./broadcast";

const totalArg = (name: string) => numberArg(name, { min: 0, max: MAX_LIGAND_TOTAL, unit: "mol/kg", optional: true, defaultValue: 0 });

export const carbonateArg = totalArg("carbonate");
export const chlorideArg = totalArg("chloride");
export const sulfurArg = totalArg("sulfur");
