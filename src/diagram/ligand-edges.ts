/**
 * Names of the ligand boundaries of a diagram: where the water's dominant form of one ligand changes (the plane
 * cells of a ligand system differ in one ligand's basis species), as "HCO3− | CO3²−". Pure water has none.
 */
import { type MetalSystem } from "../chemistry";
import { formulaSegments } from "./formula-markup";

const SUB = "₀₁₂₃₄₅₆₇₈₉";
const SUP: Record<string, string> = {
  "0": "⁰",
  "1": "¹",
  "2": "²",
  "3": "³",
  "4": "⁴",
  "5": "⁵",
  "6": "⁶",
  "7": "⁷",
  "8": "⁸",
  "9": "⁹",
  "+": "⁺",
  "-": "⁻",
  "\u2212": "⁻",
};

/** A formula in plain Unicode text: HCO₃⁻, CO₃²⁻ (for HTML legends, where SVG tspans are not available). */
export function formulaUnicode(formula: string, charge: number): string {
  return formulaSegments(formula, charge)
    .map((s) =>
      s.kind === "sub"
        ? s.text.replace(/[0-9]/g, (d) => SUB[Number(d)])
        : s.kind === "sup"
          ? [...s.text].map((c) => SUP[c] ?? c).join("")
          : s.text,
    )
    .join("");
}

export function ligandEdges(system: MetalSystem): string[] {
  const cells = system.cells;
  const out = new Set<string>();
  const name = (s: { formula: string; charge: number }) => formulaUnicode(s.formula, s.charge);
  for (let i = 0; i < cells.length; i++) {
    for (let j = i + 1; j < cells.length; j++) {
      const a = cells[i].ligands;
      const b = cells[j].ligands;
      if (a.length !== b.length || a.length === 0) continue;
      const differ = a.map((l, k) => (l.species.formula === b[k].species.formula ? -1 : k)).filter((k) => k >= 0);
      if (differ.length !== 1) continue;
      const k = differ[0];
      const pair = [name(a[k].species), name(b[k].species)].sort();
      out.add(`${pair[0]} | ${pair[1]}`);
    }
  }
  return [...out];
}
