/**
 * The point-first engine: the answer at one point (element, pH, E, temperature, threshold, ligand totals, ionic
 * strength) computed directly from the coefficient tables (species-tables.ts), with no system or polygon per row.
 *
 * Per metal atom, in volts, species i formed from metal, H2O, H+, e− and the ligand pivots L (coefficients ν):
 *
 *   g_i = [ΔG°r,i(T)/F + (RT/F)·(Σ_L ν_iL·ln a_L + ln a_i)]/x_i − (ν_H+,i/x_i)·k(T)·pH − (ν_e,i/x_i)·E
 *
 * with a_L the exact ligand activities at the point (ligand-speciation.ts), a_i = γ_i·threshold for dissolved
 * species (1 for solids) and k = RT ln10/F. The metal has g = 0; the dominant species is the argmin of g (ties go
 * to the lower index). γ from the Davies equation (activity-coefficients.ts), 1 without an ionic strength.
 */
import { FARADAY, GAS_CONSTANT, kelvin, nernstFactor, T0 } from "./constants";
import { Database } from "./database";
import { debyeHuckelA, lnGammaWithA } from "./activity-coefficients";
import { LigandAtPoint } from "./ligand-speciation";
import { LIGAND_BASIS, LigandTotals } from "./ligand-cells";
import type { SystemSpecies } from "./system";
import {
  ligandTable,
  NEEDS_CARBONATE,
  NEEDS_CHLORIDE,
  NEEDS_PHOSPHATE,
  NEEDS_SULFUR,
  rowGibbs,
  SpeciesTable,
  speciesTable,
} from "./species-tables";
import { correspondenceBasis } from "./criss-cobble";

// Built-ins held in module constants: in a sandboxed host each global lookup per row is slow.
const { log } = Math;
const INF = 1 / 0;
const NOT_A_NUMBER = 0 / 0;

/** The water of a point: temperature (°C), threshold molality of dissolved metal, ligand totals (mol/kg), I. */
export interface PointWater {
  readonly celsius: number;
  readonly activity: number;
  readonly carbonate: number;
  readonly chloride: number;
  readonly sulfur: number;
  readonly ionicStrength: number;
  /** Total orthophosphate, mol/kg as P (absent = none). */
  readonly phosphate?: number;
}

export class PointEngine {
  readonly table: SpeciesTable;
  private readonly carbonateSpeciation: LigandAtPoint;
  private readonly sulfurSpeciation: LigandAtPoint;
  private readonly phosphateSpeciation: LigandAtPoint;
  // per temperature: g = a + b·pH + c·E (+ ligand and activity terms scaled by r)
  private celsius = NOT_A_NUMBER;
  private readonly aUnit: Float64Array;
  private readonly b: Float64Array;
  private readonly c: Float64Array;
  private readonly r: Float64Array;
  /** aUnit plus the threshold-activity term of dissolved species, for the current (T, activity, I). */
  private readonly aThreshold: Float64Array;
  /** aThreshold must be redone (a new temperature). */
  private stale = true;
  private activity = NOT_A_NUMBER;
  /** Debye–Hückel A at the current temperature, found when an ionic strength first needs it. */
  private debyeHuckel = NOT_A_NUMBER;
  private f = 0;
  private dT = 0;
  private shape = 0;
  private k = 0;
  // per water
  private lnActivity = 0;
  private lnGamma1 = 0;
  private ionicStrength = 0;
  private present = 0;
  private lnCarbonate = 0;
  private lnChloride = 0;
  private lnSulfur = 0;
  private lnPhosphate = 0;
  // per point
  lnC = 0;
  lnS = 0;
  lnCl = 0;
  lnP = 0;

  constructor(db: Database, element: string) {
    this.table = speciesTable(db, element);
    this.carbonateSpeciation = new LigandAtPoint(ligandTable(db, LIGAND_BASIS.carbonate));
    this.sulfurSpeciation = new LigandAtPoint(ligandTable(db, LIGAND_BASIS.sulfur));
    this.phosphateSpeciation = new LigandAtPoint(ligandTable(db, LIGAND_BASIS.phosphate));
    const n = this.table.species.length;
    this.aUnit = new Float64Array(n);
    this.b = new Float64Array(n);
    this.c = new Float64Array(n);
    this.r = new Float64Array(n);
    this.aThreshold = new Float64Array(n);
  }

  get size(): number {
    return this.table.species.length;
  }

  /**
   * Sets the water for the next points; work that depends only on T (or T, threshold and I) is redone on change.
   * `phosphate` (total orthophosphate, mol/kg as P) comes last so that callers without it need not change.
   */
  setWater(
    celsius: number,
    activity: number,
    carbonate: number,
    chloride: number,
    sulfur: number,
    ionicStrength: number,
    phosphate = 0,
  ): void {
    if (celsius !== this.celsius) this.setTemperature(celsius);
    if (this.stale || activity !== this.activity || ionicStrength !== this.ionicStrength) {
      this.activity = activity;
      this.ionicStrength = ionicStrength;
      if (ionicStrength > 0 && this.debyeHuckel !== this.debyeHuckel) this.debyeHuckel = debyeHuckelA(celsius);
      this.lnGamma1 = lnGammaWithA(ionicStrength, this.debyeHuckel);
      this.lnActivity = log(activity);
      const { dissolved, chargeSquared } = this.table;
      const { aThreshold, aUnit, r, lnActivity, lnGamma1 } = this;
      for (let i = 0, n = aUnit.length; i < n; i++) {
        aThreshold[i] = aUnit[i] + (dissolved[i] ? r[i] * (lnActivity + chargeSquared[i] * lnGamma1) : 0);
      }
      this.stale = false;
    }
    this.present =
      (carbonate > 0 ? NEEDS_CARBONATE : 0) |
      (sulfur > 0 ? NEEDS_SULFUR : 0) |
      (chloride > 0 ? NEEDS_CHLORIDE : 0) |
      (phosphate > 0 ? NEEDS_PHOSPHATE : 0);
    this.lnCarbonate = carbonate > 0 ? log(carbonate) : 0;
    this.lnSulfur = sulfur > 0 ? log(sulfur) : 0;
    this.lnPhosphate = phosphate > 0 ? log(phosphate) : 0;
    this.lnChloride = chloride > 0 ? log(chloride) + this.lnGamma1 : 0; // Cl− is free: a = γ·total
  }

  setPointWater(w: PointWater): void {
    this.setWater(w.celsius, w.activity, w.carbonate, w.chloride, w.sulfur, w.ionicStrength, w.phosphate ?? 0);
  }

  private setTemperature(celsius: number): void {
    const t = this.table;
    const T = kelvin(celsius);
    const dT = T - T0;
    const shape = dT - T * log(T / T0);
    const k = nernstFactor(T);
    const rtOverF = (GAS_CONSTANT * T) / FARADAY;
    const { aUnit, b, c, r } = this;
    const { x, proton, electron } = t;
    const inverseF = 1 / FARADAY;
    const basis = correspondenceBasis(T);
    for (let i = 0, n = x.length; i < n; i++) {
      const perAtom = 1 / x[i];
      aUnit[i] = rowGibbs(t, i, dT, shape, basis) * perAtom * inverseF;
      b[i] = -proton[i] * k * perAtom;
      c[i] = -electron[i] * perAtom;
      r[i] = rtOverF * perAtom;
    }
    this.f = 1 / rtOverF;
    this.celsius = celsius;
    this.stale = true;
    this.debyeHuckel = NOT_A_NUMBER;
    this.dT = dT;
    this.shape = shape;
    this.k = k;
  }

  /** Exact ligand activities at (pH, E) into lnC, lnS, lnCl, lnP (HPO4²− from the α-fractions of orthophosphate). */
  ligandsAt(pH: number, E: number): void {
    const present = this.present;
    if (present & NEEDS_CARBONATE)
      this.lnC = this.carbonateSpeciation
        .at(this.celsius, this.dT, this.shape, this.k, this.f)
        .lnPivot(this.lnCarbonate, this.lnGamma1, pH, E);
    if (present & NEEDS_SULFUR)
      this.lnS = this.sulfurSpeciation
        .at(this.celsius, this.dT, this.shape, this.k, this.f)
        .lnPivot(this.lnSulfur, this.lnGamma1, pH, E);
    if (present & NEEDS_PHOSPHATE)
      this.lnP = this.phosphateSpeciation
        .at(this.celsius, this.dT, this.shape, this.k, this.f)
        .lnPivot(this.lnPhosphate, this.lnGamma1, pH, E);
    this.lnCl = this.lnChloride;
  }

  /** d ln a(SO4²−)/dE at the last point (0 without sulfur): the only potential dependence of the ligand terms. */
  get sulfurSlope(): number {
    return this.present & NEEDS_SULFUR ? this.sulfurSpeciation.slopeE : 0;
  }

  /** How far in E from the last point the sulfur term stays linear (INF without sulfur). */
  get sulfurStraightFor(): number {
    return this.present & NEEDS_SULFUR ? this.sulfurSpeciation.straightFor : INF;
  }

  get hasSulfur(): boolean {
    return (this.present & NEEDS_SULFUR) !== 0;
  }

  /** Whether species i can exist in this water (its ligands are present). */
  available(i: number): boolean {
    return (this.table.needs[i] & ~this.present) === 0;
  }

  /** g of species i at the last point's ligand activities; `unit` = dissolved species at unit activity. */
  g(i: number, pH: number, E: number, unit = false): number {
    const t = this.table;
    let g = (unit ? this.aUnit[i] : this.aThreshold[i]) + this.b[i] * pH + this.c[i] * E;
    if (t.needs[i])
      g +=
        this.r[i] *
        (t.carbonate[i] * this.lnC + t.sulfur[i] * this.lnS + t.chloride[i] * this.lnCl + t.phosphate[i] * this.lnP);
    return g;
  }

  /** dg_i/dE at the last point (the sulfur term bends it). */
  slopeE(i: number): number {
    return this.c[i] + this.r[i] * this.table.sulfur[i] * this.sulfurSlope;
  }

  /** Index of the dominant species at (pH, E): the exact argmin of g. */
  dominant(pH: number, E: number): number {
    this.ligandsAt(pH, E);
    const t = this.table;
    const { aThreshold, b, c, r } = this;
    const needs = t.needs;
    const absent = ~this.present;
    const lnC = this.lnC;
    const lnS = this.lnS;
    const lnCl = this.lnCl;
    const lnP = this.lnP;
    let best = -1;
    let bestG = INF;
    for (let i = 0, n = aThreshold.length; i < n; i++) {
      const need = needs[i];
      let g = aThreshold[i] + b[i] * pH + c[i] * E;
      if (need) {
        if (need & absent) continue;
        g += r[i] * (t.carbonate[i] * lnC + t.sulfur[i] * lnS + t.chloride[i] * lnCl + t.phosphate[i] * lnP);
      }
      if (g < bestG) {
        bestG = g;
        best = i;
      }
    }
    return best;
  }

  /** F/RT at the current temperature. */
  get fOverRT(): number {
    return this.f;
  }

  /** ln γ of species i (Davies; 0 for solids and neutral species). */
  lnGamma(i: number): number {
    return this.table.chargeSquared[i] * this.lnGamma1;
  }
}

const engines = new WeakMap<Database, Map<string, PointEngine>>();

/** The engine of `element`, one per database and element (its scratch state is reused point after point). */
export function pointEngine(db: Database, element: string): PointEngine {
  let byElement = engines.get(db);
  if (!byElement) engines.set(db, (byElement = new Map()));
  let engine = byElement.get(element);
  if (!engine) byElement.set(element, (engine = new PointEngine(db, element)));
  return engine;
}

/**
 * The dominant species at one point of a drawn system's water (its temperature, threshold and ligand totals, or
 * `ligands` of the sample's own), from the point engine: what SPECIES answers there. Returns the species record.
 */
export function dominantInWater(
  db: Database,
  system: {
    readonly element: string;
    readonly celsius: number;
    readonly activity: number;
    readonly ligandTotals?: LigandTotals;
  },
  pH: number,
  E: number,
  ligands?: LigandTotals,
): SystemSpecies {
  const water = ligands ?? system.ligandTotals ?? {};
  const engine = pointEngine(db, system.element);
  engine.setWater(
    system.celsius,
    system.activity,
    water.carbonate ?? 0,
    water.chloride ?? 0,
    water.sulfur ?? 0,
    0,
    water.phosphate ?? 0,
  );
  return engine.table.species[engine.dominant(pH, E)];
}
