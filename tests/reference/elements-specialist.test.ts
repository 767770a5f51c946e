/**
 * Reference checks for the vanadium, tungsten, bismuth, gold and platinum records (data/species/v.json, w.json,
 * bi.json, au.json, pt.json and their sulfides and chloro-complexes in the ligand files):
 *   1. standard potentials against Bard, Parsons & Jordan (1985) and the CRC electrochemical series, within 10 mV,
 *      and where compilations disagree, which one the data follow;
 *   2. boundary equations at 25 °C and activity 1e-6 against Pourbaix's Atlas (1974);
 *   3. the dominant species at a few points the trade knows.
 *
 * No copy of these publications was at hand: every check value is recalled from memory and says so. Gold's ions
 * and platinum's ions, oxides and chloro-complexes were themselves derived from CRC/Atlas potentials (their
 * records say so): those checks are labelled as arithmetic round trips, and platinum has no independent check.
 *
 * Check values, tolerances and sources: fixtures/elements-specialist/*.json, validated on load.
 */
import { describe, expect, it } from "vitest";
import { getDatabase } from "../../src/chemistry/database";
import { ligandCells } from "../../src/chemistry/ligand-cells";
import { buildSystem, dominantSpecies } from "../../src/chemistry/system";
import {
  checkConstants,
  checkDisagreements,
  checkPotentials,
  loadConstants,
  loadPotentialDisagreements,
  loadPotentials,
} from "./compilation-checks";
import {
  checkDiagramDisagreements,
  checkDiagramLines,
  loadDiagramDisagreements,
  loadDiagramLines,
} from "./element-checks";

const db = getDatabase();

const potentials = loadPotentials(new URL("./fixtures/elements-specialist/potentials.json", import.meta.url));

checkPotentials("specialist elements: standard potentials (25 °C) within 10 mV of the tabulated values", potentials);

const disagreements = loadPotentialDisagreements(
  new URL("./fixtures/elements-specialist/potential-disagreements.json", import.meta.url),
);

checkDisagreements("specialist elements: documented disagreements between compilations", disagreements);

const constants = loadConstants(new URL("./fixtures/elements-specialist/constants.json", import.meta.url));

// Only round trips: no independent hydrolysis constant of these elements was recalled with confidence.
checkConstants("specialist elements: hydrolysis constants (derivation round trips)", constants, ["V", "Bi"], true);

const lines = loadDiagramLines(new URL("./fixtures/elements-specialist/diagram-lines.json", import.meta.url));

checkDiagramLines("specialist elements: boundary equations at 25 °C, activity 1e-6, against Pourbaix's Atlas", lines);

const lineDisagreements = loadDiagramDisagreements(
  new URL("./fixtures/elements-specialist/diagram-disagreements.json", import.meta.url),
);

checkDiagramDisagreements(
  "specialist elements: Atlas lines the data do not reproduce, with the reason",
  lineDisagreements,
);

describe("specialist elements: dominant species at 25 °C, activity 1e-6", () => {
  const at = (element: string, pH: number, E: number, totals = {}) => {
    const system = buildSystem(db, element, { celsius: 25, activity: 1e-6 }, ligandCells(db, totals, 25));
    return system.species[dominantSpecies(system, pH, E)];
  };
  it("gold is immune across the water window at pH 7 in pure water (common practice)", () => {
    for (const E of [-0.8, 0, 0.8]) expect(at("Au", 7, E).regime).toBe("immunity");
  });
  it("gold dissolves as AuCl4- in oxidising brine (0.5 mol/kg chloride, pH 1, 1.1 V: the principle of chlorine leaching, common practice)", () => {
    expect(at("Au", 1, 1.1, { chloride: 0.5 }).formula).toBe("AuCl4-");
  });
  it("platinum is immune below its oxide line (0.98 − 0.059 pH V, Atlas) and covered above it", () => {
    expect(at("Pt", 7, 0.5).regime).toBe("immunity");
    expect(at("Pt", 7, 0.9).regime).toBe("passivation");
  });
  it("vanadate in oxic neutral water, vanadyl in mildly reducing acid water (Wehrli & Stumm 1989, Geochim. Cosmochim. Acta 53, 69, from memory)", () => {
    expect(at("V", 7, 0.6).formula).toBe("H2VO4-");
    expect(at("V", 3, 0.3).formula).toBe("VO^2+");
  });
  it("tungstate WO4 2- in neutral and alkaline oxic water (common practice)", () => {
    expect(at("W", 8, 0.4).formula).toBe("WO42-");
  });
  it("bismuthinite in sulfidic water, bismuth oxychloride in oxic chloride water (Brookins 1988, from memory)", () => {
    expect(at("Bi", 4, -0.1, { sulfur: 1e-3 }).formula).toBe("Bi2S3(s)");
    expect(at("Bi", 2, 0.6, { chloride: 1e-2 }).formula).toBe("BiOCl(s)");
  });
});
