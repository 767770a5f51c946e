// The slope of ln a(SO4²−) in E from the sulfur speciation: defined (0) before any point; 0 where sulfate holds the
// total (ln a = ln total, flat in E); 8·F/RT where hydrogen sulfide does (SO4²− + 9H+ + 8e− → HS− + 4H2O, so
// a(SO4²−) ∝ exp(8FE/RT) at fixed HS−: the Nernst equation; the stoichiometry is common practice).
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { FARADAY, GAS_CONSTANT, kelvin, nernstFactor, T0 } from "../../src/chemistry/constants";
import { LIGAND_BASIS } from "../../src/chemistry/ligand-cells";
import { LigandAtPoint } from "../../src/chemistry/ligand-speciation";
import { ligandTable } from "../../src/chemistry/species-tables";

const T = kelvin(25);
const F_OVER_RT = FARADAY / (GAS_CONSTANT * T);

/** The sulfur speciation at 25 °C, asked at (pH, E) for a total of 1E-4 mol/kg when a point is given. */
function sulfurAt(point?: { pH: number; E: number }): LigandAtPoint {
  const s = new LigandAtPoint(ligandTable(getDatabase(), LIGAND_BASIS.sulfur));
  const dT = T - T0;
  s.at(25, dT, dT - T * Math.log(T / T0), nernstFactor(T), F_OVER_RT);
  if (point) s.lnPivot(Math.log(1e-4), 0, point.pH, point.E);
  return s;
}

describe("sulfur speciation: d ln a(SO4²−)/dE", () => {
  it("is 0 before any point has been worked out", () => {
    expect(sulfurAt().slopeE).toBe(0);
  });

  it("is 0 where sulfate holds the total (pH 8, +0.5 V)", () => {
    expect(sulfurAt({ pH: 8, E: 0.5 }).slopeE / F_OVER_RT).toBeCloseTo(0, 6);
  });

  it("is 8·F/RT where HS− holds it (pH 8, −0.5 V)", () => {
    expect(sulfurAt({ pH: 8, E: -0.5 }).slopeE / F_OVER_RT).toBeCloseTo(8, 3);
  });
});
