/**
 * 100 to 300 °C on the saturation curve: continuity across 100 °C, answers below 100 °C unchanged, the Criss &
 * Cobble (1964) correspondence against IAPWS R11-07 and against the silver chloride electrode measured to 275 °C,
 * magnetite near the hydrogen line at boiler temperatures, and the refusals where the records lack S°.
 */
import { describe, expect, it } from "vitest";
import { z } from "zod";
import fixture from "../fixtures/iapws-water.json";
import { GAS_CONSTANT, kelvin, nernstFactor, T0 } from "../../src/chemistry/constants";
import { getDatabase } from "../../src/chemistry/database";
import { formationFromBasis, formationGibbsAt } from "../../src/chemistry/formation";
import { reactionLogK, standardPotential } from "../../src/chemistry/reaction";
import { correspondenceBasis, ionClass } from "../../src/chemistry/criss-cobble";
import { rowGibbs, speciesTable } from "../../src/chemistry/species-tables";
import { ELECTRON, gibbsAt } from "../../src/chemistry/thermo";
import { neutralPH, recordsPKw, waterLine } from "../../src/chemistry/water";
import { CellError } from "../../src/functions/cell-values";
import { coupleAt, speciesAt } from "../../src/functions/stability-functions";
import { neutralPHAt, waterLineAt } from "../../src/functions/water-functions";
import { loadReferenceFixture } from "../../test-support/reference-fixture";

const db = getDatabase();
const withEntropy = db.allSpecies().filter((s) => s.S !== null);

describe("continuity across 100 °C and nothing changed below it", () => {
  it("every species' ΔG°f(T) and its slope −ΔS°f are continuous at 100 °C (second difference under 0.01 J/mol at ±1 mK)", () => {
    const h = 1e-3;
    let checked = 0;
    for (const s of withEntropy) {
      const below = formationGibbsAt(db, s, 100 - h);
      const at = formationGibbsAt(db, s, 100);
      const above = formationGibbsAt(db, s, 100 + h);
      if (below === null || at === null || above === null) continue;
      // a step in ΔG°f or in its slope at 100 °C would show in the second difference; the curvature term is ~1e-6 J/mol
      expect(Math.abs(above - 2 * at + below)).toBeLessThan(0.01);
      checked++;
    }
    expect(checked).toBeGreaterThan(60);
  });

  it("the correspondence adds nothing at or below 100 °C: ΔG°r is the constant-Cp form (thermo.ts header)", () => {
    for (const T of [T0, 333.15, 373.15]) expect([...correspondenceBasis(T)].every((v) => v === 0)).toBe(true);
    expect([...correspondenceBasis(kelvin(150))].some((v) => v !== 0)).toBe(true);
  });

  it("25 °C answers: E°(Fe2+/Fe) −0.409 V and E°(Cu2+/Cu) +0.339 V from the NBS records, as before", () => {
    // Wagman et al. 1982 (NBS tables): ΔfG°(Fe2+) = −78.90 kJ/mol, ΔfG°(Cu2+) = +65.49 kJ/mol (from memory; the records)
    expect(standardPotential(db, "Fe2+", "Fe(s)", 25)).toBeCloseTo(-78900 / (2 * 96485.33212), 4);
    expect(standardPotential(db, "Cu2+", "Cu(s)", 25)).toBeCloseTo(65490 / (2 * 96485.33212), 3);
  });

  it("water functions are continuous at 100 °C: neutral pH within 0.002, water lines within 1 mV", () => {
    expect(Math.abs(neutralPH(100 - 1e-6) - neutralPH(100))).toBeLessThan(0.002);
    for (const gas of ["O2", "H2"] as const)
      expect(Math.abs(waterLine(7, 100 - 1e-6, gas) - waterLine(7, 100, gas))).toBeLessThan(1e-3);
  });

  it("the engine's coefficient tables give the same ΔG°r as the reactions at 250 °C (point path = reaction path)", () => {
    const T = kelvin(250);
    const dT = T - T0;
    const shape = dT - T * Math.log(T / T0);
    const basisFor = (element: string) => {
      const metal = db.require(`${element}(s)`);
      return [
        metal,
        db.require("H2O(l)"),
        db.require("H+"),
        ELECTRON,
        db.require("HCO3-"),
        db.require("SO42-"),
        db.require("Cl-"),
        db.require("HPO42-"),
      ] as const;
    };
    for (const element of ["Fe", "Cu", "Ni", "Zn"]) {
      const table = speciesTable(db, element);
      const basis = basisFor(element);
      const columns = correspondenceBasis(T);
      table.species.forEach((row, i) => {
        const formation = formationFromBasis(db, row.species, basis)!;
        expect(rowGibbs(table, i, dT, shape, columns)).toBeCloseTo(gibbsAt(formation.properties, T), 6);
      });
    }
  });
});

describe("Criss & Cobble (1964) correspondence against published high-temperature values", () => {
  it("classes the ions as the paper does (cations, simple anions and OH−, oxy-anions, acid oxy-anions)", () => {
    expect(ionClass(db.require("Fe2+"))).toBe("cation");
    expect(ionClass(db.require("Cl-"))).toBe("anion");
    expect(ionClass(db.require("OH-"))).toBe("anion");
    expect(ionClass(db.require("SO42-"))).toBe("oxyanion");
    expect(ionClass(db.require("HCO3-"))).toBe("acidOxyanion");
    expect(ionClass(db.require("H+"))).toBeNull();
    expect(ionClass(db.require("Fe3O4(s)"))).toBeNull();
  });

  // pKw from the species records (OH− by the correspondence) against IAPWS R11-07 on the saturation curve
  const r1107 = (celsius: number) => fixture.rows.find((r) => r.celsius === celsius)!.pKw;
  for (const celsius of [125, 150, 175, 200]) {
    it(`pKw from the records at ${celsius} °C is within 0.06 of IAPWS R11-07 (${r1107(celsius).toFixed(3)}; fixture)`, () => {
      expect(Math.abs(recordsPKw(celsius) - r1107(celsius))).toBeLessThan(0.06);
    });
  }

  it("the check forces the correspondence: with constant ΔCp the records miss R11-07 at 200 °C by more than the 0.06 allowed", () => {
    const [water, hydroxide] = [db.require("H2O(l)"), db.require("OH-")];
    const T = kelvin(200);
    const dS = hydroxide.S! - water.S!;
    const dCp = hydroxide.Cp! - water.Cp!;
    const dG = hydroxide.dGf - water.dGf - dS * (T - T0) + dCp * (T - T0 - T * Math.log(T / T0));
    expect(Math.abs(dG / (GAS_CONSTANT * T * Math.LN10) - r1107(200))).toBeGreaterThan(0.06);
  });

  it("beyond the paper's 200 °C the extrapolation degrades: pKw from the records misses R11-07 by 0.1–0.5 at 250–300 °C (README, Limits)", () => {
    for (const celsius of [250, 300]) {
      const miss = Math.abs(recordsPKw(celsius) - r1107(celsius));
      expect(miss).toBeGreaterThan(0.1);
      expect(miss).toBeLessThan(0.5);
    }
  });

  // E°(AgCl/Ag): Bates & Bower 1954 to 95 °C (data/electrodes.json) and Greeley, Smith, Stoughton & Lietzke 1960,
  // measured to 275 °C: fixtures/high-temperature/silver-chloride.json
  const silverChloride = (celsius: number) =>
    nernstFactor(kelvin(celsius)) * reactionLogK(db, { "AgCl(s)": -1, "e-": -1, "Ag(s)": 1, "Cl-": 1 }, celsius);
  const silverChlorideChecks = loadReferenceFixture(
    new URL("./fixtures/high-temperature/silver-chloride.json", import.meta.url),
    z.strictObject({ celsius: z.number() }),
    { ceiling: (c) => (c.inputs.celsius <= 100 ? 0.003 : c.inputs.celsius <= 200 ? 0.01 : 0.025) },
  );
  for (const c of silverChlorideChecks) {
    it(`${c.id} within ${c.tolerance * 1000} mV: ${c.value} V (${c.source})`, () => {
      expect(Math.abs(silverChloride(c.inputs.celsius) - c.value)).toBeLessThan(c.tolerance);
    });
  }
});

describe("iron at boiler temperatures (Cowan & Staehle 1971; Beverskog & Puigdomenech 1996: magnetite stable near the hydrogen line at 250–300 °C)", () => {
  /** pH where the Fe3O4/Fe2+ line (a(Fe2+) = 1e-6) meets the hydrogen line at 1 bar H2. */
  function magnetiteMeetsHydrogenLine(celsius: number): number {
    const k = nernstFactor(kelvin(celsius));
    // Fe3O4 + 8 H+ + 2 e− → 3 Fe2+ + 4 H2O:  E = E° − (3k/2)·log a(Fe2+) − 4k·pH; hydrogen line E = −k·pH
    return (standardPotential(db, "Fe3O4(s)", "Fe2+", celsius) - 1.5 * k * Math.log10(1e-6)) / (3 * k);
  }

  for (const celsius of [250, 300]) {
    it(`${celsius} °C: at neutral pH the hydrogen line lies in magnetite's field (above Fe/Fe3O4, below Fe3O4/Fe2O3, beyond Fe2+)`, () => {
      const pH = neutralPH(celsius);
      const hydrogen = waterLine(pH, celsius, "H2");
      const k = nernstFactor(kelvin(celsius));
      // Fe/Fe3O4 and Fe3O4/Fe2O3 lines both fall by k per pH unit, like the hydrogen line
      expect(standardPotential(db, "Fe3O4(s)", "Fe(s)", celsius) - k * pH).toBeLessThan(hydrogen);
      expect(standardPotential(db, "Fe2O3(s)", "Fe3O4(s)", celsius) - k * pH).toBeGreaterThan(hydrogen);
      expect(magnetiteMeetsHydrogenLine(celsius)).toBeLessThan(pH - 1);
    });
  }

  it("25 °C, the counter-check: on the hydrogen line at neutral pH Fe2+ (1e-6) is stable, not magnetite (common practice: iron corrodes in neutral water)", () => {
    expect(magnetiteMeetsHydrogenLine(25)).toBeGreaterThan(neutralPH(25));
  });
});

describe("functions at 100–300 °C", () => {
  it("REDOX.NEUTRALPH and REDOX.WATERLINE answer at 300 °C", () => {
    expect(neutralPHAt(300)[0][0] as number).toBeCloseTo(11.339 / 2, 2); // IAPWS R11-07 (fixture)
    expect(typeof waterLineAt(7, 300, "H2")[0][0]).toBe("number");
  });

  it("REDOX.SPECIES above 100 °C is #VALUE! for a metal whose species lack S°, naming them and the range 0–100 °C (lead: PbOH+)", () => {
    const out = speciesAt("Pb", 6, 0, 250)[0][0] as CellError;
    expect(out).toBeInstanceOf(CellError);
    expect(out.code).toBe("#VALUE!");
    expect(out.message).toMatch(/^temperature 250 °C: Pb is modelled 0–100 °C only;.*PbOH\+/);
    expect(typeof speciesAt("Pb", 6, 0, 100)[0][0]).toBe("string");
    // iron and copper opened when their hydroxo-complexes got S° (tests/reference/boiler-metals.test.ts)
    expect(typeof speciesAt("Fe", 6, -0.5, 250)[0][0]).toBe("string");
    expect(typeof speciesAt("Cu", 6, 0, 250)[0][0]).toBe("string");
  });

  it("REDOX.COUPLE answers above 100 °C for couples whose records carry S°, and refuses the others by name", () => {
    expect(coupleAt("Fe2+", "Fe", 0, 250, 1)[0][0] as number).toBeCloseTo(
      standardPotential(db, "Fe2+", "Fe(s)", 250),
      12,
    );
    expect(typeof coupleAt("FeOH+", "Fe", 0, 250, 1)[0][0]).toBe("number");
    expect(typeof coupleAt("Cu2(OH)22+", "Cu", 0, 250, 1)[0][0]).toBe("number");
    const refused = coupleAt("PbOH+", "Pb", 0, 250, 1)[0][0] as CellError;
    expect(refused.code).toBe("#VALUE!");
    expect(refused.message).toMatch(/lack S° for PbOH\+/);
  });

  it("copper with sulfur is answered above 100 °C (Cu2S, CuS and the sulfur forms carry S°), with chloride refused by name", () => {
    // chalcocite at strongly reducing potential in sulfide-bearing water, as at 25 °C (common practice: copper
    // sulfide films form in sulfidic waters); 1e-3 mol/kg sulfur, pH 7, −0.6 V
    for (const celsius of [25, 150, 250])
      expect(speciesAt("Cu", 7, -0.6, celsius, 1e-6, 0, 0, 1e-3)[0][0]).toBe("Cu2S(s)");
    const refused = speciesAt("Cu", 7, -0.6, 150, 1e-6, 0, 1e-3)[0][0] as CellError;
    expect(refused.code).toBe("#VALUE!");
    expect(refused.message).toMatch(/Cu with chloride is modelled 0–100 °C only;.*CuCl\+/);
  });

  it("temperatures beyond 300 °C are refused", () => {
    expect(neutralPHAt(301)[0][0]).toBeInstanceOf(CellError);
  });
});
