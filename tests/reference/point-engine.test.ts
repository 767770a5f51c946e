/**
 * The point engine against hand computations with the data's own constants (reactionLogK of balanced reactions,
 * worked here independently of the engine's coefficient tables), the Davies equation against textbook values, and
 * equilibrium lead solubility in carbonate water against a published curve.
 */
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { kelvin, nernstFactor } from "../../src/chemistry/constants";
import { daviesGamma, debyeHuckelA } from "../../src/chemistry/activity-coefficients";
import { getDatabase } from "../../src/chemistry/database";
import { ionicStrengthFrom } from "../../src/chemistry/ionic-strength";
import { dissolvedAtPoint, dissolvedEquilibrium } from "../../src/chemistry/point-dissolved";
import { pointEngine } from "../../src/chemistry/point-engine";
import { reactionLogK } from "../../src/chemistry/reaction";
import { loadReferenceFixture } from "../../test-support/reference-fixture";

const db = getDatabase();
const logK = (r: Record<string, number>, celsius = 25) => reactionLogK(db, r, celsius);
const water = (
  w: Partial<{
    celsius: number;
    activity: number;
    carbonate: number;
    chloride: number;
    sulfur: number;
    ionicStrength: number;
  }>,
) => ({
  celsius: 25,
  activity: 1e-6,
  carbonate: 0,
  chloride: 0,
  sulfur: 0,
  ionicStrength: 0,
  ...w,
});

describe("exact carbonate activity (α-fraction of HCO3− at the pH)", () => {
  // hand computation: K1 = CO2(aq) + H2O = H+ + HCO3−, K2 = HCO3− = H+ + CO3²−, α1 = 1/(1 + [H+]/K1 + K2/[H+])
  const K1 = 10 ** logK({ "CO2(aq)": -1, "H2O(l)": -1, "H+": 1, "HCO3-": 1 });
  const K2 = 10 ** logK({ "HCO3-": -1, "H+": 1, "CO32-": 1 });
  const pK1 = -Math.log10(K1);
  const pK2 = -Math.log10(K2);
  const total = 2e-3;
  const engine = pointEngine(db, "Pb");
  for (const pH of [pK1, pK1 - 0.3, pK1 + 0.3, pK2, pK2 - 0.3, pK2 + 0.3, 8.3]) {
    it(`pH ${pH.toFixed(3)}: a(HCO3−) = total·α1 to 1e-12 relative`, () => {
      const h = 10 ** -pH;
      const alpha1 = 1 / (1 + h / K1 + K2 / h);
      engine.setWater(25, 1e-6, total, 0, 0, 0);
      engine.ligandsAt(pH, 0.2);
      expect(Math.exp(engine.lnC) / (total * alpha1)).toBeCloseTo(1, 12);
    });
  }
  it("at pK1 half the total is HCO3− (the predominance treatment took all of it: 0.3 log units off)", () => {
    engine.setWater(25, 1e-6, total, 0, 0, 0);
    engine.ligandsAt(pK1, 0);
    expect(Math.log10(Math.exp(engine.lnC) / total)).toBeCloseTo(Math.log10(1 / (2 + K2 / K1)), 10);
  });
});

describe("exact sulfur activity over its redox forms", () => {
  // hand computation at pH, E: every species relative to SO4²−, a_j/a_SO4 = K_j·a_H+^h·a_e^n with a_e = 10^(−E/k)
  const k = nernstFactor(kelvin(25));
  const forms: { formula: string; reaction: Record<string, number>; h: number; n: number }[] = [
    { formula: "SO42-", reaction: {}, h: 0, n: 0 },
    { formula: "HSO4-", reaction: { "SO42-": -1, "H+": -1, "HSO4-": 1 }, h: 1, n: 0 },
    { formula: "H2S(aq)", reaction: { "SO42-": -1, "H+": -10, "e-": -8, "H2S(aq)": 1, "H2O(l)": 4 }, h: 10, n: 8 },
    { formula: "HS-", reaction: { "SO42-": -1, "H+": -9, "e-": -8, "HS-": 1, "H2O(l)": 4 }, h: 9, n: 8 },
    { formula: "S2-", reaction: { "SO42-": -1, "H+": -8, "e-": -8, "S2-": 1, "H2O(l)": 4 }, h: 8, n: 8 },
  ];
  const ratio = (pH: number, E: number) =>
    forms
      .map((f) => (f.h === 0 && f.n === 0 ? 1 : 10 ** (logK(f.reaction) - f.h * pH - (f.n * E) / k)))
      .reduce((s, x) => s + x, 0);
  const logKSulfur = logK({ "SO42-": -1, "H+": -8, "e-": -6, "S(s)": 1, "H2O(l)": 4 });
  // the sulfate/sulfide boundary at pH 8 (equal SO4²− and HS−): E = k·(log K_HS − 9·pH)/8
  const pH = 8;
  const eBoundary = (k * (logK(forms[3].reaction) - 9 * pH)) / 8;
  const engine = pointEngine(db, "Fe");
  for (const dE of [0, -0.01, 0.01, -0.05, 0.05]) {
    it(`pH 8, E = boundary ${dE >= 0 ? "+" : ""}${dE * 1000} mV: a(SO4²−) = total / Σ ratios`, () => {
      const E = eBoundary + dE;
      const total = 1e-4;
      const hand = total / ratio(pH, E);
      // elemental sulfur would not saturate here (checked by hand)
      expect(Math.log10(hand) + logKSulfur - 8 * pH - (6 * E) / k).toBeLessThan(0);
      engine.setWater(25, 1e-6, 0, 0, total, 0);
      engine.ligandsAt(pH, E);
      expect(Math.exp(engine.lnS) / hand).toBeCloseTo(1, 10);
    });
  }
  it("S(s) saturates at pH 4, −0.01 V, 1E-2 mol/kg: a(SO4²−) is capped at a_S(s) = 1", () => {
    const E = -0.01;
    const total = 1e-2;
    const cap = 10 ** (-logKSulfur + 8 * 4 + (6 * E) / k);
    expect(total / ratio(4, E)).toBeGreaterThan(cap); // unsaturated speciation would exceed the solid's solubility
    engine.setWater(25, 1e-6, 0, 0, total, 0);
    engine.ligandsAt(4, E);
    expect(Math.exp(engine.lnS) / cap).toBeCloseTo(1, 10);
  });
});

describe("Davies activity coefficients", () => {
  it("A(T) against tabulated Debye–Hückel constants (Helgeson 1969, Am. J. Sci. 267:729, Table 1; from memory)", () => {
    const table = loadReferenceFixture(
      new URL("./fixtures/activity/debye-huckel-a.json", import.meta.url),
      z.strictObject({ celsius: z.number() }),
      { ceiling: () => 0.005 },
    );
    expect(table).toHaveLength(4);
    for (const c of table) expect(Math.abs(debyeHuckelA(c.inputs.celsius) - c.value), c.id).toBeLessThan(c.tolerance);
  });
  it("γ by hand from the Davies equation at I = 0.01 and 0.1", () => {
    for (const I of [0.01, 0.1]) {
      for (const z of [1, 2, 3]) {
        const hand = 10 ** (-debyeHuckelA(25) * z * z * (Math.sqrt(I) / (1 + Math.sqrt(I)) - 0.3 * I));
        expect(daviesGamma(z, I, 25)).toBeCloseTo(hand, 12);
      }
    }
  });
  const [divalent] = loadReferenceFixture(
    new URL("./fixtures/activity/davies-gamma.json", import.meta.url),
    z.strictObject({ charge: z.number(), ionicStrength: z.number() }),
    { ceiling: () => 0.005 },
  );
  it(`${divalent.id} has γ ≈ ${divalent.value} (${divalent.source})`, () => {
    const { charge, ionicStrength } = divalent.inputs;
    expect(Math.abs(daviesGamma(charge, ionicStrength, 25) - divalent.value)).toBeLessThan(divalent.tolerance);
    expect(daviesGamma(0, 0.3, 25)).toBe(1);
  });
  it("ionic strength from conductance and TDS (Russell 1976; Langelier 1936)", () => {
    expect(ionicStrengthFrom(500, "uS/cm")).toBeCloseTo(8e-3, 12);
    expect(ionicStrengthFrom(400, "mg/L")).toBeCloseTo(1e-2, 12);
  });
});

describe("DISSOLVED against an independent controlling-solid computation", () => {
  // Pb in carbonate water at pH 8, E 0.3 V (Pb(II) field): the Pb2+ activity each solid allows, by hand from
  // dissolution constants; the lowest is the controlling solid; the total adds every complex by its β.
  const pH = 8;
  const dic = 1e-3;
  const K1 = 10 ** logK({ "CO2(aq)": -1, "H2O(l)": -1, "H+": 1, "HCO3-": 1 });
  const K2 = 10 ** logK({ "HCO3-": -1, "H+": 1, "CO32-": 1 });
  const h = 10 ** -pH;
  const aCO3 = (dic * K2) / h / (1 + h / K1 + K2 / h);
  const logCO3 = Math.log10(aCO3);
  const solids: Record<string, number> = {
    "PbCO3(s)": logK({ "PbCO3(s)": -1, "Pb2+": 1, "CO32-": 1 }) - logCO3,
    "Pb3(CO3)2(OH)2(s)":
      (logK({ "Pb3(CO3)2(OH)2(s)": -1, "H+": -2, "Pb2+": 3, "CO32-": 2, "H2O(l)": 2 }) - 2 * pH - 2 * logCO3) / 3,
    "PbO(s)": logK({ "PbO(s)": -1, "H+": -2, "Pb2+": 1, "H2O(l)": 1 }) - 2 * pH,
  };
  const controlling = Object.entries(solids).sort((a, b) => a[1] - b[1])[0];
  const logPb = controlling[1];
  const complexes: Record<string, number>[] = [
    { "Pb2+": -1, "H2O(l)": -1, "PbOH+": 1, "H+": 1 },
    { "Pb2+": -1, "H2O(l)": -2, "Pb(OH)2(aq)": 1, "H+": 2 },
    { "Pb2+": -1, "H2O(l)": -2, "HPbO2-": 1, "H+": 3 },
    { "Pb2+": -1, "CO32-": -1, "PbCO3(aq)": 1 },
    { "Pb2+": -1, "CO32-": -2, "Pb(CO3)22-": 1 },
  ];
  const protons = [1, 2, 3, 0, 0];
  const carbonates = [0, 0, 0, 1, 2];
  const total =
    10 ** logPb *
    (1 + complexes.reduce((s, r, i) => s + 10 ** (logK(r) - protons[i] * -pH + carbonates[i] * logCO3), 0));
  it(`controlling solid ${controlling[0]}, total dissolved lead within 1e-9 relative`, () => {
    const answer = dissolvedEquilibrium(db, "Pb", pH, 0.3, water({ carbonate: dic }));
    expect(answer.controllingSolid).toBe(controlling[0]);
    expect(answer.total! / total).toBeCloseTo(1, 9);
  });
  it("the threshold activity does not change it", () => {
    const engine = pointEngine(db, "Pb");
    const results = [1e-9, 1e-6, 1e-2].map((a) => {
      engine.setWater(25, a, dic, 0, 0, 0);
      return dissolvedAtPoint(engine, pH, 0.3).total;
    });
    expect(results[0]).toBe(results[1]);
    expect(results[2]).toBe(results[1]);
  });
  it("the case that answered #N/A before: Pb, pH 7, 0.4 V, 1E-3 mol/kg carbonate gives a few hundred µg/L", () => {
    const answer = dissolvedEquilibrium(db, "Pb", 7, 0.4, water({ carbonate: 1e-3 }));
    const ugPerL = answer.total! * 207.2e6;
    expect(ugPerL).toBeGreaterThan(100);
    expect(ugPerL).toBeLessThan(1000);
  });
});

describe("equilibrium lead solubility in carbonate water against Schock 1980", () => {
  // Schock, M.R., "Response of lead solubility to dissolved carbonate in drinking water", J. AWWA 72:695 (1980),
  // figure of total soluble Pb against pH at 25 °C for several DIC: values read from the figure, from memory
  // (uncertain by about a factor of 2; fixtures/lead/schock-1980-curve.json). Tolerance 0.5 log units: the hydrocerussite constant alone is uncertain by
  // about 1.3 log units in the literature (data/species/carbonate.json, TL84) and divides by 3 in log Pb.
  // With Schock's own pair in the records (data/species/carbonate.json, S80) the curve at pH 7–8 is matched; at
  // pH 9.5 the records' hydrocerussite holds 0.6 log units more lead than the figure reading: pinned below as a
  // documented disagreement (the hydroxo- and carbonato-complexes there are from other compilations than Schock's).
  const points = loadReferenceFixture(
    new URL("./fixtures/lead/schock-1980-curve.json", import.meta.url),
    z.strictObject({ dicMgC: z.number(), pH: z.number(), potential: z.number() }),
    { ceiling: () => 0.5 },
  );
  for (const p of points) {
    const { dicMgC, pH, potential } = p.inputs;
    it(`DIC ${dicMgC} mg C/L, pH ${pH}: about ${p.value} mg/L`, () => {
      const answer = dissolvedEquilibrium(db, "Pb", pH, potential, water({ carbonate: dicMgC / 12011 }));
      const mgPerL = answer.total! * 207.2e3;
      expect(Math.abs(Math.log10(mgPerL / p.value))).toBeLessThan(p.tolerance);
    });
  }
  it("DIC 4.8 mg C/L, pH 9.5: the figure reads about 0.03 mg/L; the records give 0.5–0.8 log units more (hydrocerussite; documented)", () => {
    const answer = dissolvedEquilibrium(db, "Pb", 9.5, 0.3, water({ carbonate: 4.8 / 12011 }));
    expect(answer.controllingSolid).toBe("Pb3(CO3)2(OH)2(s)");
    const off = Math.log10((answer.total! * 207.2e3) / 0.03);
    expect(off).toBeGreaterThan(0.5);
    expect(off).toBeLessThan(0.8);
  });
});
