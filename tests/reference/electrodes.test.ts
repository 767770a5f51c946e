// Reference electrode potentials vs SHE at 25 °C and at one other temperature, each against a named source, plus
// the name look-up, the conversions and the load-time validation. No internet was available: every published
// value here is recalled ("from memory"). The published values live in fixtures/electrodes/potentials.json, where
// `roundTrip` marks checks whose reference value comes from the same published formula as the record (they prove
// the record and the code reproduce that formula, not the formula).
import { describe, expect, it } from "vitest";
import { z } from "zod";
import electrodesJson from "../../data/electrodes.json";
import { ElectrodeError, ElectrodeTable, fromSHE, getElectrodes, toSHE } from "../../src/chemistry/electrodes";
import { CellError } from "../../src/functions/cell-values";
import { fromSHEAt, toSHEAt } from "../../src/functions/electrode-functions";
import { loadReferenceFixture, ReferenceCheck } from "../../test-support/reference-fixture";

const table = getElectrodes();
const byId = (id: string) => {
  const found = table.lookup(id);
  if ("error" in found) throw new Error(found.error);
  return found.electrode;
};

// E°(AgCl/Ag) of Bates & Bower 1954 (from memory), written out here so the cross-checks do not read the data file
const agclStandard = (t: number) => 0.23659 - 4.8564e-4 * t - 3.4205e-6 * t * t + 5.869e-9 * t ** 3;
// E°(Hg2Cl2/Hg) = 0.26808 V at 25 °C (Bard, Parsons & Jordan 1985, from memory) with dE°/dT = −0.30 mV/K from the
// NBS 1982 entropies of Hg(l), Cl−, Hg2Cl2(s) and H2(g) (Wagman et al. 1982, from memory)
const calomelStandard = (t: number) => 0.26808 - 0.3e-3 * (t - 25);
// SCE polynomial of Sawyer, Sobkowiak & Roberts 1995 (from memory)
const sceSawyer = (t: number) => 0.2412 - 6.61e-4 * (t - 25) - 1.75e-6 * (t - 25) ** 2 - 9.0e-10 * (t - 25) ** 3;
const nernst = (celsius: number) => (8.314462618 * (celsius + 273.15) * Math.LN10) / 96485.33212;

const electrodePoint = z.strictObject({ electrode: z.string(), celsius: z.number(), pH: z.number().optional() });
type Case = ReferenceCheck<z.infer<typeof electrodePoint>>;

/** Published potentials: within 3 mV at 25 °C, 5 mV at another temperature (DEVELOPERS.md, reference electrodes). */
const published: Case[] = loadReferenceFixture(
  new URL("./fixtures/electrodes/potentials.json", import.meta.url),
  electrodePoint,
  { ceiling: (c) => (c.inputs.celsius === 25 ? 0.003 : 0.005) },
);

/** Potentials derived here from several published formulas (written out above), so the arithmetic shows. */
const derived = (electrode: string, celsius: number, value: number, tolerance: number, source: string): Case => ({
  id: `${electrode} at ${celsius} °C`,
  inputs: { electrode, celsius },
  value,
  tolerance,
  unit: "V vs SHE",
  source,
});

const derivedCases: Case[] = [
  derived(
    "AgCl-sat",
    25,
    agclStandard(25) + sceSawyer(25) - calomelStandard(25),
    0.003,
    "derived: the saturated-KCl chloride term is the same for SCE and Ag/AgCl, so E = E°(AgCl/Ag) [Bates & Bower 1954] + E(SCE) [Sawyer et al. 1995] − E°(Hg2Cl2/Hg) [Bard, Parsons & Jordan 1985] (all from memory)",
  ),
  derived(
    "AgCl-1M",
    25,
    agclStandard(25) - nernst(25) * Math.log10(1.033 * 0.604),
    0.003,
    "derived: E°(AgCl/Ag) of Bates & Bower 1954 with a(Cl−) = m·γ±, 1 mol/L KCl = 1.033 mol/kg, γ± = 0.604 (Robinson & Stokes, Electrolyte Solutions 1959) (from memory)",
  ),
  derived(
    "AgCl-EPB",
    25,
    agclStandard(25) - nernst(25) * Math.log10(0.1 * 0.77),
    0.003,
    "derived: at 25 °C (no thermal junction) the pressure-balanced electrode is Ag/AgCl in 0.1 mol/kg KCl: E°(AgCl/Ag) of Bates & Bower 1954 with a(Cl−) = 0.1·γ±, γ± = 0.770 (Robinson & Stokes, Electrolyte Solutions 1959) (from memory)",
  ),
  derived(
    "AgCl-sat",
    40,
    agclStandard(40) + sceSawyer(40) - calomelStandard(40),
    0.005,
    "derived as at 25 °C from Bates & Bower 1954, Sawyer et al. 1995 and Bard, Parsons & Jordan 1985 (from memory)",
  ),
  derived(
    "AgCl-1M",
    50,
    agclStandard(50) - nernst(50) * Math.log10(1.033 * 0.6),
    0.005,
    "derived: Bates & Bower 1954 E° at 50 °C with γ±(KCl, 1 mol/kg, 50 °C) = 0.600 (Harned & Owen, The Physical Chemistry of Electrolytic Solutions 1958) (from memory)",
  ),
];

const cases = [...published, ...derivedCases];

describe("reference electrodes vs SHE", () => {
  for (const c of cases) {
    const { electrode, celsius, pH } = c.inputs;
    it(`${c.id}${pH === undefined ? "" : `, pH ${pH}`} is ${c.value.toFixed(4)} V within ${c.tolerance * 1000} mV (${c.source})`, () => {
      const got = table.potential(byId(electrode), celsius, pH);
      expect(Math.abs(got - c.value)).toBeLessThanOrEqual(c.tolerance);
    });
  }

  // No published value at a second temperature was at hand for these; their temperature dependence is derived
  // (see the records' notes) and is not checked against an outside source.
  it.todo("AgCl-3M at a second temperature against a published table");
  it.todo("AgCl-sea at a second temperature against cathodic-protection practice");

  it("prints the residuals", () => {
    const lines = cases.map(({ inputs, value, roundTrip }) => {
      const r = table.potential(byId(inputs.electrode), inputs.celsius, inputs.pH) - value;
      return `${inputs.electrode}@${inputs.celsius}°C: ${(r * 1000).toFixed(1)} mV${roundTrip ? " (same formula)" : ""}`;
    });
    console.log(lines.join("\n"));
    expect(lines.length).toBe(published.length + derivedCases.length);
  });

  it("every electrode of README's electrode table is in the data, each citing its sources", () => {
    const ids = [
      "SHE",
      "SCE",
      "AgCl-sat",
      "AgCl-3.5M",
      "AgCl-3M",
      "AgCl-1M",
      "AgCl-sea",
      "CSE",
      "MSE",
      "HgO-1M",
      "AgCl-EPB",
      "RHE",
    ];
    expect(
      table
        .all()
        .map((e) => e.id)
        .sort(),
    ).toEqual([...ids].sort());
    for (const e of table.all()) {
      expect(e.citation.length).toBeGreaterThan(10);
      expect(e.temperatureCitation.length).toBeGreaterThan(10);
    }
  });
});

describe("names", () => {
  it.each([
    ["sce", "SCE"],
    ["Calomel", "SCE"],
    ["Ag/AgCl sat", "AgCl-sat"],
    ["ag/agcl SAT KCl", "AgCl-sat"],
    ["SSC", "AgCl-sat"],
    ["Ag/AgCl 3 M", "AgCl-3M"],
    ["agcl-3.5m", "AgCl-3.5M"],
    ["Ag/AgCl seawater", "AgCl-sea"],
    ["copper sulfate", "CSE"],
    ["Cu/CuSO4", "CSE"],
    ["Hg/Hg2SO4", "MSE"],
    ["Hg/HgO", "HgO-1M"],
    ["nhe", "SHE"],
    ["rhe", "RHE"],
    ["EPBRE", "AgCl-EPB"],
    ["Ag/AgCl EPB", "AgCl-EPB"],
  ])("%s → %s", (name, id) => {
    const found = table.lookup(name);
    expect("electrode" in found && found.electrode.id).toBe(id);
  });

  it("a bare Ag/AgCl is ambiguous and the message lists the fillings", () => {
    const found = table.lookup("Ag/AgCl");
    expect("error" in found && found.error).toContain("AgCl-3M");
  });
});

describe("conversions", () => {
  it("toSHE and fromSHE are inverse and use the electrode offset", () => {
    expect(toSHE(-0.5, "SCE", 25)).toBeCloseTo(-0.5 + 0.2412, 12);
    expect(fromSHE(toSHE(-0.72, "CSE", 12), "CSE", 12)).toBeCloseTo(-0.72, 12);
    expect(fromSHE(0, "RHE", 25, 14)).toBeCloseTo(14 * 0.059159, 5);
  });

  it("−0.85 V vs CSE is about −0.53 V vs SHE and −0.78 V vs Ag/AgCl/seawater", () => {
    // source: common practice in cathodic protection: −0.85 V CSE ≈ −0.80 V Ag/AgCl(seawater) within a few tens of mV
    const she = toSHE(-0.85, "CSE");
    expect(she).toBeCloseTo(-0.534, 3);
    expect(Math.abs(fromSHE(she, "AgCl-sea") - -0.8)).toBeLessThan(0.03);
  });

  it("REDOX.TOSHE / FROMSHE: RHE without pH is #VALUE! naming pH", () => {
    const out = toSHEAt(0.1, "RHE")[0][0] as CellError;
    expect(out.code).toBe("#VALUE!");
    expect(out.message).toMatch(/^pH:/);
    expect(toSHEAt(0.1, "RHE", 25, 7)[0][0] as number).toBeCloseTo(0.1 - 0.414, 3);
  });

  it("REDOX.TOSHE: temperature outside an electrode's range is #VALUE! naming temperature, the electrode and its range", () => {
    const out = toSHEAt(0.1, "SCE", 90)[0][0] as CellError;
    expect(out.code).toBe("#VALUE!");
    expect(out.message).toMatch(/^temperature:.*SCE \(0 to 60 °C\)/);
    const hot = toSHEAt(0.1, "AgCl-3M", 250)[0][0] as CellError;
    expect(hot.code).toBe("#VALUE!");
    expect(hot.message).toMatch(/AgCl-3M \(0 to 95 °C\)/);
  });

  it("SHE and RHE hold at every temperature of the range, by their definition (IUPAC convention): 0 and −k(T)·pH", () => {
    expect(toSHEAt(0.1, "SHE", 300)[0][0] as number).toBeCloseTo(0.1, 12);
    // k(300 °C) = R·573.15·ln10/F = 0.1137252 V (CODATA 2018 R, F)
    expect(toSHEAt(0, "RHE", 300, 5.7)[0][0] as number).toBeCloseTo(-0.1137252 * 5.7, 6);
  });

  it("REDOX.FROMSHE: unknown electrode is #VALUE! naming electrode; ranges broadcast", () => {
    const bad = fromSHEAt(0.1, "XYZ")[0][0] as CellError;
    expect(bad.code).toBe("#VALUE!");
    expect(bad.message).toMatch(/^electrode:/);
    const grid = fromSHEAt([[0.5], [0.6]], [["SCE", "AgCl-3M", "CSE"]]);
    expect(grid.length).toBe(2);
    expect(grid[1].length).toBe(3);
    expect(grid[1][2] as number).toBeCloseTo(0.6 - 0.316, 12);
  });
});

describe("validation at load", () => {
  const clone = () => JSON.parse(JSON.stringify(electrodesJson));

  it("accepts the shipped file", () => {
    expect(() => new ElectrodeTable(clone())).not.toThrow();
  });

  it("rejects a record without its 25 °C potential, naming the field", () => {
    const bad = clone();
    delete bad.electrodes[1].e25;
    expect(() => new ElectrodeTable(bad)).toThrow(/electrodes\.1\.e25/);
  });

  it("rejects a name shared by two electrodes", () => {
    const bad = clone();
    bad.electrodes[2].aliases.push("calomel");
    expect(() => new ElectrodeTable(bad)).toThrow(ElectrodeError);
  });

  it("rejects a source key missing from references", () => {
    const bad = clone();
    bad.electrodes[0].source = "nowhere";
    expect(() => new ElectrodeTable(bad)).toThrow(/nowhere/);
  });
});
