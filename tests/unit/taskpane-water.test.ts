/**
 * The pane's water: water columns found by header, row values converted to ligand totals, the diagram's and each
 * sample's totals, and the samples' species and regime checked against REDOX.SPECIES / REDOX.REGIME given the
 * same totals.
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { getDatabase } from "../../src/chemistry/database";
import { dicFromAlkalinity } from "../../src/chemistry/alkalinity";
import { buildLigandSystem } from "../../src/chemistry/ligand-system";
import { buildSystem } from "../../src/chemistry/system";
import { regimeAt, speciesAt } from "../../src/functions/stability-functions";
import { dicAt } from "../../src/functions/carbonate-functions";
import { matchHeaders, matchWaterColumns, waterColumnAt } from "../../src/tables";
import {
  formatTotals,
  PURE_WATER,
  resolveWater,
  roundTotal,
  rowTotal,
  waterCaption,
  WaterSettings,
} from "../../src/taskpane/ligand-inputs";
import {
  defaultWindow,
  displayScale,
  plotSamples,
  SampleInput,
  shownRegions,
  shownWaterLines,
} from "../../src/diagram/diagram-model";
import { diagramLayout, renderDiagram, sampleText } from "../../src/diagram/diagram-svg";
import { makeAxes } from "../../src/diagram/axes";
import { touchingGroups } from "../../src/diagram/label-placement";
import { readSamples } from "../../src/taskpane/sample-table";
import { rowLigand } from "../../src/taskpane/sample-answers";
import { EMPTY_MAPPING } from "../../src/tables";

const db = getDatabase();

describe("water columns by header", () => {
  it("finds the invented demo log's alkalinity column and leaves the main mapping as it was", () => {
    const headers =
      "site,pipe_material,pipe_metal,sample_id,date,pH,ORP_mV_AgCl_sat,temp_C,alkalinity_mg_L_CaCO3,Fe_ug_L,Cu_ug_L,Pb_ug_L,note".split(
        ",",
      );
    const { mapping } = matchHeaders(headers, "Pb", "lead");
    expect(matchWaterColumns(headers, mapping)).toEqual({ alkalinity: { index: 8, unit: "mg/L CaCO3" } });
  });

  it("reads realistic spellings and their units", () => {
    const headers = [
      "Sample ID",
      "pH",
      "ORP (mV)",
      "Total alkalinity (mg/L as CaCO3)",
      "Chloride (mg/L)",
      "Sulphate, mg/L",
    ];
    expect(matchWaterColumns(headers, matchHeaders(headers).mapping)).toEqual({
      alkalinity: { index: 3, unit: "mg/L CaCO3" },
      chloride: { index: 4, unit: "mg/L" },
      sulfate: { index: 5, unit: "mg/L SO4" },
    });
    expect(matchWaterColumns(["Alk (meq/L)", "Cl- [mmol/L]", "SO4-S (mg/L)"])).toEqual({
      alkalinity: { index: 0, unit: "meq/L" },
      chloride: { index: 1, unit: "mmol/L" },
      sulfate: { index: 2, unit: "mg/L S" },
    });
    expect(matchWaterColumns(["Alkalinity (mg/L as CaCO3)", "Cl (ug/L)", "SO4 (mg/L)"])).toMatchObject({
      alkalinity: { unit: "mg/L CaCO3" },
      chloride: { unit: "ug/L" },
      sulfate: { unit: "mg/L SO4" },
    });
    expect(waterColumnAt("sulfate", ["x", "sulfate as S, mg/L"], 1)).toEqual({ index: 1, unit: "mg/L S" });
  });

  it("does not take chlorine residual for chloride, nor a column the main mapping uses", () => {
    expect(matchWaterColumns(["Free chlorine (mg/L)", "Cl2 residual", "Total chlorine"])).toEqual({});
    expect(matchWaterColumns(["alkalinity"], { ...EMPTY_MAPPING, id: 0 })).toEqual({});
  });
});

describe("row values → ligand totals", () => {
  const alk = { index: 0, unit: "mg/L CaCO3" } as const;
  it("alkalinity gives REDOX.DIC's value, rounded to 0.01 in log10", () => {
    const expected = dicAt(120, 7.8, 12)[0][0] as number;
    const got = rowTotal(db, "carbonate", alk, "120", 7.8, 12) as number;
    expect(got).toBe(roundTotal(expected));
    expect(Math.abs(Math.log10(got / expected))).toBeLessThanOrEqual(0.005 + 1e-12);
    // meq/L: 1 meq/L = 50.04 mg/L as CaCO3 (half the molar mass of CaCO3, 100.087 g/mol — common practice)
    expect(rowTotal(db, "carbonate", { index: 0, unit: "meq/L" }, 2, 7.8, 12)).toBe(
      roundTotal(dicFromAlkalinity(2 * 50.0435, 7.8, 12)),
    );
  });

  it('bicarbonate gives REDOX.DIC\'s value with basis "bicarbonate" (mg/L as HCO3, or mmol/L × 61.016)', () => {
    const expected = dicAt(183, 7.4, 11, "bicarbonate")[0][0] as number;
    expect(rowTotal(db, "carbonate", { index: 0, unit: "mg/L HCO3" }, "183", 7.4, 11)).toBe(roundTotal(expected));
    expect(rowTotal(db, "carbonate", { index: 0, unit: "mmol/L HCO3" }, 3, 7.4, 11)).toBe(
      roundTotal(dicAt(3 * 61.016, 7.4, 11, "bicarbonate")[0][0] as number),
    );
    // not the alkalinity reading of the same number (183 mg/L as CaCO3 is 3.66 meq/L, as HCO3 3.00 mmol/L)
    expect(expected / (dicAt(183, 7.4, 11)[0][0] as number)).toBeLessThan(0.85);
    const far = rowTotal(db, "carbonate", { index: 0, unit: "mg/L HCO3" }, 100, 13.5, 25);
    expect(far).toMatchObject({ problem: expect.stringMatching(/bicarbonate/) });
    // the pane's per-row answers pass the basis on to REDOX.DIC
    expect(rowLigand("carbonate", { index: 4, unit: "mg/L HCO3" })).toMatchObject({
      kind: "alkalinity",
      basis: "bicarbonate",
    });
    expect(rowLigand("carbonate", { index: 4, unit: "mg/L CaCO3" })).toMatchObject({ basis: "alkalinity" });
  });

  it("chloride and sulfate by their molar masses (hand calculation, atomic weights of data/elements.json)", () => {
    // 35.45 mg/L Cl ÷ 35.45 g/mol = 1.000 mmol/L ≈ 1e-3 mol/kg in dilute water
    expect(rowTotal(db, "chloride", { index: 0, unit: "mg/L" }, 35.45, 7, 25)).toBeCloseTo(1e-3, 9);
    expect(rowTotal(db, "chloride", { index: 0, unit: "ug/L" }, 35450, 7, 25)).toBeCloseTo(1e-3, 9);
    // SO4: 32.06 + 4 × 15.999 = 96.056 g/mol
    const so4 = 32.06 + 4 * (db.element("O")?.atomicWeight ?? NaN);
    expect(rowTotal(db, "sulfur", { index: 0, unit: "mg/L SO4" }, so4, 7, 25)).toBeCloseTo(1e-3, 9);
    expect(rowTotal(db, "sulfur", { index: 0, unit: "mg/L S" }, 32.06, 7, 25)).toBeCloseTo(1e-3, 9);
    expect(rowTotal(db, "sulfur", { index: 0, unit: "mmol/L" }, 0.5, 7, 25)).toBe(roundTotal(5e-4)); // 10^-3.30
    expect(rowTotal(db, "chloride", { index: 0, unit: "mg/L" }, 0, 7, 25)).toBe(0);
  });

  it("blank, text, negative and impossible values give a reason, never a number", () => {
    for (const cell of [null, "", "  ", "<5", "n/a", -3, "1,5"])
      expect(typeof rowTotal(db, "carbonate", alk, cell, 7.5, 20)).toBe("object");
    // hydroxide alone exceeds 1 mg/L as CaCO3 at pH 12
    expect(rowTotal(db, "carbonate", alk, 1, 12, 25)).toHaveProperty("problem");
  });

  it("rounding keeps the total within 2.3 % and is stable", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-7, max: 5, noNaN: true }), (x) => {
        const r = roundTotal(x);
        // half a step of 0.01 in log10, plus the 6-figure rounding of the result (≤ 5e-6 relative: 2.2e-6 in log10)
        expect(Math.abs(Math.log10(r / x))).toBeLessThanOrEqual(0.005 + 2.2e-6);
        expect(roundTotal(r)).toBe(r);
      }),
    );
  });
});

describe("the diagram's and each sample's water", () => {
  it("pure water stays pure", () => {
    const r = resolveWater(PURE_WATER, [{}, {}]);
    expect(r.diagram).toEqual({});
    expect(r.fromColumns).toEqual([]);
    expect(waterCaption(r)).toBe("");
  });

  it("typed totals apply to every sample; a column gives each sample its own and the diagram the median", () => {
    const settings: WaterSettings = {
      carbonate: { kind: "column", column: { index: 3, unit: "mg/L CaCO3" } },
      chloride: { kind: "typed", total: 5e-4 },
      sulfur: { kind: "typed", total: null },
      phosphate: { kind: "typed", total: null },
    };
    const r = resolveWater(settings, [
      { carbonate: 1e-3 },
      { carbonate: { problem: "blank" } },
      { carbonate: 3e-3 },
      { carbonate: 2e-3 },
    ]);
    expect(r.diagram).toEqual({ carbonate: roundTotal(2e-3), chloride: 5e-4 }); // median of 1, 2, 3 mmol/kg
    expect(r.perSample.map((t) => t.carbonate)).toEqual([1e-3, roundTotal(2e-3), 3e-3, 2e-3]);
    expect(r.perSample.every((t) => t.chloride === 5e-4)).toBe(true);
    expect(r.fallbacks).toEqual({ carbonate: 1 });
    expect(formatTotals(r.diagram)).toBe("DIC 2, Cl 0.5 mmol/kg");
    expect(waterCaption(r)).toMatch(
      /^Water: DIC 2, Cl 0\.5 mmol\/kg \(DIC is the median of the rows' totals from their alkalinity.*\); each ligand is speciated exactly at every point/,
    );
    // the caption names what the column holds: a bicarbonate or a DIC column is not called alkalinity
    const from = (unit: "mg/L HCO3" | "mmol/L") =>
      waterCaption(
        resolveWater({ ...settings, carbonate: { kind: "column", column: { index: 0, unit } } }, [{ carbonate: 1e-3 }]),
      );
    expect(from("mg/L HCO3")).toMatch(/DIC is the median of the rows' totals from their bicarbonate/);
    expect(from("mmol/L")).toMatch(/DIC is the median of the rows' totals from their DIC/);
    const none = resolveWater(settings, [{ carbonate: { problem: "blank" } }]);
    expect(none.unusable).toEqual(["carbonate"]);
    expect(none.diagram).toEqual({ chloride: 5e-4 });
  });

  it("readSamples reads each row's alkalinity at the row's own pH and temperature", () => {
    const table = {
      headers: ["pH", "Eh (V)", "Temp", "Alkalinity (mg/L as CaCO3)"],
      rows: [
        ["7.4", "0.3", "8", "95"],
        ["8.1", "0.2", "", "140"],
        ["7.0", "0.4", "15", ""],
      ],
      rowNumbers: [2, 3, 4],
      source: "test",
    };
    const mapping = matchHeaders(table.headers).mapping;
    const read = readSamples(table, {
      mapping,
      electrode: "SHE",
      unit: "V",
      temperatureUnit: "C",
      celsius: 21,
      waterColumns: { carbonate: { index: 3, unit: "mg/L CaCO3" } },
    });
    expect(read.rowTotals).toEqual([
      { carbonate: roundTotal(dicFromAlkalinity(95, 7.4, 8)) },
      { carbonate: roundTotal(dicFromAlkalinity(140, 8.1, 21)) },
      { carbonate: { problem: "blank" } },
    ]);
    expect(
      readSamples(table, { mapping, electrode: "SHE", unit: "V", temperatureUnit: "C", celsius: 21 }).rowTotals,
    ).toEqual([{}, {}, {}]);
  });
});

describe("samples in a water with ligands", () => {
  it("species and regime of every sample equal REDOX.SPECIES and REDOX.REGIME given the same totals", () => {
    const scale = displayScale("SHE", "V", 15);
    const waters = [
      { carbonate: 2e-3 },
      { carbonate: 6e-4, chloride: 1e-3 },
      { carbonate: 1e-3, sulfur: 2e-4 },
      { chloride: 3e-3 },
      {},
    ];
    for (const metal of ["Pb", "Cu", "Fe"]) {
      const diagram = buildLigandSystem(db, metal, { celsius: 15, activity: 1e-6 }, waters[0]);
      const systems = new Map(
        waters.map((w) => [JSON.stringify(w), buildLigandSystem(db, metal, { celsius: 15, activity: 1e-6 }, w)]),
      );
      fc.assert(
        fc.property(
          fc.array(
            fc.tuple(
              fc.double({ min: 3, max: 11, noNaN: true }),
              fc.double({ min: -0.7, max: 1.1, noNaN: true }),
              fc.nat(waters.length - 1),
            ),
            { minLength: 1, maxLength: 20 },
          ),
          (points) => {
            const inputs: SampleInput[] = points.map(([pH, e, w], i) => ({
              row: i + 2,
              id: "",
              pH,
              eSHE: e,
              ligands: waters[w],
            }));
            const plotted = plotSamples(diagram, inputs, scale, (s) => systems.get(JSON.stringify(s.ligands))!);
            plotted.forEach((p, i) => {
              const w = waters[points[i][2]];
              const args = [
                metal,
                p.pH,
                p.eSHE,
                15,
                1e-6,
                w.carbonate ?? null,
                w.chloride ?? null,
                w.sulfur ?? null,
              ] as const;
              expect(p.formula).toBe(speciesAt(...args)[0][0]);
              expect(p.regime).toBe(regimeAt(...args)[0][0]);
              expect(p.ligands).toBe(w);
            });
          },
        ),
        { numRuns: 30 },
      );
    }
  });

  it("the hover text names the water; pure-water text is unchanged", () => {
    const system = buildSystem(db, "Pb", { celsius: 25, activity: 1e-6 });
    const scale = displayScale("SHE", "V", 25);
    const [pure] = plotSamples(system, [{ row: 5, id: "A", pH: 7.5, eSHE: 0.4 }], scale);
    expect(sampleText(pure, "V")).not.toMatch(/water DIC/);
    expect(sampleText(pure, "V")).toMatch(/water margin \+0\.\d\d V inside the water window$/);
    const [wet] = plotSamples(system, [{ row: 5, id: "A", pH: 7.5, eSHE: 0.4, ligands: { carbonate: 1.5e-3 } }], scale);
    expect(sampleText(wet, "V")).toMatch(/, water DIC 1\.5 mmol\/kg;/);
  });

  it("labels every species of a diagram split along ligand boundaries", () => {
    const system = buildLigandSystem(db, "Pb", { celsius: 25, activity: 1e-6 }, { carbonate: 2e-3, sulfur: 1e-4 });
    const scale = displayScale("SHE", "V", 25);
    const window = defaultWindow(scale);
    const regions = shownRegions(system, window, scale);
    const formulas = new Set(regions.map((r) => r.formula));
    expect(regions.length).toBeGreaterThan(formulas.size); // some species are split by a ligand boundary
    const drawn = renderDiagram({
      system,
      window,
      regions,
      samples: [],
      water: shownWaterLines(25, scale),
      axisTitle: scale.axisTitle,
      unit: "V",
      width: 800,
      height: 650,
    });
    const svg = drawn.svg;
    // each species: its formula in place, or a number in place with the formula in the key, or the key alone
    const inPlace = [...svg.matchAll(/class="rc-label[^"]*" data-formula="([^"]+)"/g)].map((m) =>
      m[1].replace(/&amp;/g, "&"),
    );
    const labelled = new Set([...inPlace, ...drawn.key.map((k) => k.formula)]);
    for (const f of formulas) expect(labelled.has(f), f).toBe(true);
    // touching pieces of one species read as one region and carry one label
    const labels = inPlace.length + drawn.key.filter((k) => !k.marked).length;
    expect(labels).toBeLessThan(regions.length);
    const axes = makeAxes(window, diagramLayout(800, 650, 0));
    expect(labels).toBe(
      new Set(
        touchingGroups(
          regions.map((r) => ({ key: r.formula, pixels: r.vertices.map(([x, y]) => [axes.x(x), axes.y(y)] as const) })),
        ),
      ).size,
    );
  });

  it("groups touching pieces of the same species only", () => {
    const square = (x: number, y: number) =>
      [
        [x, y],
        [x + 10, y],
        [x + 10, y + 10],
        [x, y + 10],
      ] as const;
    const groups = touchingGroups([
      { key: "A", pixels: square(0, 0) },
      { key: "A", pixels: square(10, 0) }, // shares an edge with the first
      { key: "B", pixels: square(20, 0) }, // touches the second but is another species
      { key: "A", pixels: square(40, 0) }, // same species, apart
      { key: "A", pixels: square(30, 0) }, // bridges B's neighbour… only to the fourth
    ]);
    expect(groups[0]).toBe(groups[1]);
    expect(groups[2]).not.toBe(groups[1]);
    expect(groups[3]).toBe(groups[4]);
    expect(groups[3]).not.toBe(groups[0]);
  });
});
