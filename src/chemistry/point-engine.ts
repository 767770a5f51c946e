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
import { DOUBLE_ZERO } from "./double-zero";
import { FARADAY, GAS_CONSTANT, kelvin, nernstFactor, T0 } from "./constants";
import { Database } from "./database";
import { debyeHuckelA, lnGammaWithA } from "./activity-coefficients";
import { LigandAtPoint } from "./ligand-speciation";
import { LIGAND_BASIS } from "./ligand-cells";
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
import { correspondenceBasis, NO_CORRESPONDENCE } from "./criss-cobble";
import { SpeciesPruning } from "./species-pruning";

// Built-ins held in module constants: in a sandboxed host each global lookup per row is slow.
const { log } = Math;
const INF = 1 / 0;
const NOT_A_NUMBER = 0 / 0;
/** Bits of PointEngine.due: aUnit, b and r (a new temperature); aThreshold (a new temperature, threshold or I). */
const TEMPERATURE_DUE = 1;
const THRESHOLD_DUE = 2;
/** The ligands whose activity at a point needs their speciation (chloride is free: its activity is γ·total). */
const SPECIATED = NEEDS_CARBONATE | NEEDS_SULFUR | NEEDS_PHOSPHATE;
/** Allowance for rounding between a species' ligand bound and its exact g, V (both ~1e-15 V apart at most). */
const BOUND_MARGIN = 1e-9;
/** Coefficients per species in PointEngine.directRow (11 used, padded to 12). */
const DIRECT_WIDTH = 12;
const DIRECT_FEATURES = 11;

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
  // per species, fixed: ΔG°r(25 °C), ΔS°r and ΔCp°r per metal atom and per faraday (V, V/K), H+ per atom, 1/x
  private readonly g0PerAtom: Float64Array;
  private readonly sPerAtom: Float64Array;
  private readonly cpPerAtom: Float64Array;
  private readonly protonPerAtom: Float64Array;
  private readonly perAtom: Float64Array;
  /**
   * Per species, DIRECT_WIDTH coefficients of the row features (directFeatures) whose sum is g: ΔG°r(25 °C), −ΔS°r and
   * ΔCp°r per atom and faraday; −ν_H+/x; −ν_e/x; 1/x and z²/x for dissolved species (0 for solids); ν_L/x per ligand.
   */
  private readonly directRow: Float64Array;
  /** The row features: 1, dT, shape, k·pH, E, (RT/F)·(ln threshold, ln γ1, ln a of carbonate, sulfur, chloride, P). */
  private readonly feature = new Float64Array(DIRECT_WIDTH);
  /** Per set of ligands present (bits), the species its rows need evaluate (species-pruning.ts), made when first met. */
  private readonly pruning: (SpeciesPruning | undefined)[] = [];
  /** How many species of its list the last point evaluated (rowSpecies). */
  private listed = 0;
  /** ligandArgmin's scratch, per candidate (a species speciated only if it could win): its index and bound. */
  private readonly candidates: Int32Array;
  private readonly bounds: Float64Array;
  /** ln of the largest activity each pivot can have: ln total, plus ln γ where γ would exceed 1 (I beyond Davies). */
  private boundLnC = DOUBLE_ZERO;
  private boundLnS = DOUBLE_ZERO;
  private boundLnP = DOUBLE_ZERO;
  /** Where lnC, lnS and lnP were last worked out, and which of them are of that point (SPECIATED bits). */
  private ligandPH = NOT_A_NUMBER;
  private ligandE = NOT_A_NUMBER;
  private ligandFresh = 0;
  /** linesAt's answers: g and dg/dE per species, the lowest line and its gap to the next lowest (V). */
  readonly lineG: Float64Array;
  readonly lineSlope: Float64Array;
  /**
   * The species the current water allows (its ligands present), ascending, in lineSpecies[0 … lineCount − 1]: the
   * only lines linesAt draws and its readers need (the others stay +∞ with slope 0 until the ligands change).
   */
  readonly lineSpecies: Int32Array;
  lineCount = 0;
  /** The ligands (present bits) lineSpecies was made for; −1 before the first lines. */
  private linesPresent = -1;
  lineLowest = -1;
  lineGap = DOUBLE_ZERO;
  /** Where the lines were last drawn (NaN: not reusable), at unit activity or not, and in which water. */
  private linesPH = NOT_A_NUMBER;
  private linesE = NOT_A_NUMBER;
  private linesUnit = false;
  private linesStamp = -1;
  /** Which per-species columns are out of date (TEMPERATURE_DUE, THRESHOLD_DUE bits); filled when first needed. */
  private due = 0;
  /** Rows in a row set with this temperature, threshold and ionic strength (0: this row brought new ones). */
  private repeats = 0;
  /** Whether the current temperature needs the correspondence terms (above 100 °C). */
  private correspondence = false;
  /** aUnit plus the threshold-activity term of dissolved species, for the current (T, activity, I). */
  private readonly aThreshold: Float64Array;
  private activity = NOT_A_NUMBER;
  /** Debye–Hückel A at the current temperature, found when an ionic strength first needs it. */
  private debyeHuckel = NOT_A_NUMBER;
  private f = DOUBLE_ZERO;
  private dT = DOUBLE_ZERO;
  private shape = DOUBLE_ZERO;
  private k = DOUBLE_ZERO;
  // per water: the totals as given, and a count of the waters set (linesAt's reuse)
  private carbonate = NOT_A_NUMBER;
  private chloride = NOT_A_NUMBER;
  private sulfur = NOT_A_NUMBER;
  private phosphate = NOT_A_NUMBER;
  private waterStamp = 0;
  private lnActivity = DOUBLE_ZERO;
  private lnGamma1 = DOUBLE_ZERO;
  private ionicStrength = DOUBLE_ZERO;
  private present = 0;
  private lnCarbonate = DOUBLE_ZERO;
  private lnChloride = DOUBLE_ZERO;
  private lnSulfur = DOUBLE_ZERO;
  private lnPhosphate = DOUBLE_ZERO;
  // per point
  lnC = DOUBLE_ZERO;
  lnS = DOUBLE_ZERO;
  lnCl = DOUBLE_ZERO;
  lnP = DOUBLE_ZERO;

  constructor(db: Database, element: string) {
    this.table = speciesTable(db, element);
    this.carbonateSpeciation = new LigandAtPoint(ligandTable(db, LIGAND_BASIS.carbonate));
    this.sulfurSpeciation = new LigandAtPoint(ligandTable(db, LIGAND_BASIS.sulfur));
    this.phosphateSpeciation = new LigandAtPoint(ligandTable(db, LIGAND_BASIS.phosphate));
    const n = this.table.species.length;
    consumesLigands(this.table);
    this.aUnit = new Float64Array(n);
    this.b = new Float64Array(n);
    this.c = new Float64Array(n);
    this.r = new Float64Array(n);
    this.aThreshold = new Float64Array(n);
    this.candidates = new Int32Array(n);
    this.bounds = new Float64Array(n);
    this.lineG = new Float64Array(n);
    this.lineSlope = new Float64Array(n);
    this.lineSpecies = new Int32Array(n);
    const t = this.table;
    const per = (column: ArrayLike<number>, scale = 1) => Float64Array.from(t.x, (x, i) => (column[i] * scale) / x);
    this.g0PerAtom = per(t.g0, 1 / FARADAY);
    this.sPerAtom = per(t.s, 1 / FARADAY);
    this.cpPerAtom = per(t.cp, 1 / FARADAY);
    this.protonPerAtom = per(t.proton, -1);
    this.perAtom = Float64Array.from(t.x, (x) => 1 / x);
    t.electron.forEach((e, i) => (this.c[i] = -e / t.x[i])); // dg/dE does not depend on temperature
    this.directRow = directCoefficients(t, this.g0PerAtom, this.sPerAtom, this.cpPerAtom, this.protonPerAtom, this.c);
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
    if (
      celsius === this.celsius &&
      activity === this.activity &&
      ionicStrength === this.ionicStrength &&
      carbonate === this.carbonate &&
      chloride === this.chloride &&
      sulfur === this.sulfur &&
      phosphate === this.phosphate
    ) {
      this.repeats++; // the same water as the last point: everything worked out for it still holds
      return;
    }
    this.waterStamp++;
    this.carbonate = carbonate;
    this.chloride = chloride;
    this.sulfur = sulfur;
    this.phosphate = phosphate;
    const newTemperature = celsius !== this.celsius;
    if (newTemperature) this.setTemperature(celsius);
    if (newTemperature || activity !== this.activity || ionicStrength !== this.ionicStrength) {
      if (activity !== this.activity) this.lnActivity = log(activity);
      this.activity = activity;
      this.ionicStrength = ionicStrength;
      if (ionicStrength > 0 && this.debyeHuckel !== this.debyeHuckel) this.debyeHuckel = debyeHuckelA(celsius);
      this.lnGamma1 = lnGammaWithA(ionicStrength, this.debyeHuckel);
      this.due |= newTemperature ? TEMPERATURE_DUE | THRESHOLD_DUE : THRESHOLD_DUE;
      this.repeats = 0;
    } else this.repeats++;
    this.present =
      (carbonate > 0 ? NEEDS_CARBONATE : 0) |
      (sulfur > 0 ? NEEDS_SULFUR : 0) |
      (chloride > 0 ? NEEDS_CHLORIDE : 0) |
      (phosphate > 0 ? NEEDS_PHOSPHATE : 0);
    this.lnCarbonate = carbonate > 0 ? log(carbonate) : 0;
    this.lnSulfur = sulfur > 0 ? log(sulfur) : 0;
    this.lnPhosphate = phosphate > 0 ? log(phosphate) : 0;
    this.lnChloride = chloride > 0 ? log(chloride) + this.lnGamma1 : 0; // Cl− is free: a = γ·total
    this.lnCl = this.lnChloride; // the same at every point of this water
    const over = this.lnGamma1 > 0 ? this.lnGamma1 : 0; // γ ≤ 1 up to the Davies limit; beyond it allow for γ > 1
    this.boundLnC = this.lnCarbonate + over; // HCO3−, z = 1
    this.boundLnS = this.lnSulfur + 4 * over; // SO4²−, z = 2
    this.boundLnP = this.lnPhosphate + 4 * over; // HPO4²−, z = 2
    this.ligandFresh = 0; // a new water: no ligand activity of the last point holds
  }

  /** The scalars of a new temperature: dT, the ΔCp shape term, k = RT ln10/F and F/RT. */
  private setTemperature(celsius: number): void {
    const T = kelvin(celsius);
    this.dT = T - T0;
    this.shape = this.dT - T * log(T / T0);
    this.k = nernstFactor(T);
    this.f = 1 / ((GAS_CONSTANT * T) / FARADAY);
    this.correspondence = correspondenceBasis(T) !== NO_CORRESPONDENCE;
    this.celsius = celsius;
    this.debyeHuckel = NOT_A_NUMBER;
  }

  /**
   * Per species: a = ΔG°r(T)/(x·F) (aUnit; with RT/F·(ln threshold + z²·ln γ1)/x for dissolved species in
   * aThreshold), b = −ν_H+·k/x and r = (RT/F)/x, in one pass, for what `due` says is out of date.
   */
  private ensureColumns(): void {
    if (this.due === 0) return;
    const newTemperature = (this.due & TEMPERATURE_DUE) !== 0;
    this.due = 0;
    const { aUnit, aThreshold, b, r, dT, shape, k, lnActivity, lnGamma1 } = this;
    const { g0PerAtom, sPerAtom, cpPerAtom, protonPerAtom, perAtom } = this;
    const { dissolved, chargeSquared } = this.table;
    if (newTemperature && this.correspondence) this.fillAboveCorrespondence();
    const rtOverF = 1 / this.f;
    const plain = newTemperature && !this.correspondence;
    for (let i = 0, n = aUnit.length; i < n; i++) {
      if (plain) {
        aUnit[i] = g0PerAtom[i] - sPerAtom[i] * dT + cpPerAtom[i] * shape; // ΔG°r(T), constant ΔCp°r (thermo.ts)
        b[i] = protonPerAtom[i] * k;
        r[i] = rtOverF * perAtom[i];
      }
      aThreshold[i] = dissolved[i] ? aUnit[i] + r[i] * (lnActivity + chargeSquared[i] * lnGamma1) : aUnit[i];
    }
  }

  /** aUnit, b and r above 100 °C, where ΔG°r(T) has the Criss–Cobble terms (criss-cobble.ts). */
  private fillAboveCorrespondence(): void {
    const t = this.table;
    const basis = correspondenceBasis(this.dT + T0);
    const rtOverF = 1 / this.f;
    for (let i = 0, n = this.aUnit.length; i < n; i++) {
      this.aUnit[i] = (rowGibbs(t, i, this.dT, this.shape, basis) * this.perAtom[i]) / FARADAY;
      this.b[i] = this.protonPerAtom[i] * this.k;
      this.r[i] = rtOverF * this.perAtom[i];
    }
  }

  /** Exact ligand activities at (pH, E) into lnC, lnS, lnCl, lnP (HPO4²− from the α-fractions of orthophosphate). */
  ligandsAt(pH: number, E: number): void {
    this.ligandsFor(SPECIATED, pH, E);
  }

  /** The same for the ligands among `bits` that the water holds (the others keep their last values). */
  private ligandsFor(bits: number, pH: number, E: number): void {
    const wanted = bits & this.present;
    if (wanted & NEEDS_CARBONATE)
      this.lnC = this.carbonateSpeciation
        .at(this.celsius, this.dT, this.shape, this.k, this.f)
        .lnPivot(this.lnCarbonate, this.lnGamma1, pH, E);
    if (wanted & NEEDS_SULFUR)
      this.lnS = this.sulfurSpeciation
        .at(this.celsius, this.dT, this.shape, this.k, this.f)
        .lnPivot(this.lnSulfur, this.lnGamma1, pH, E);
    if (wanted & NEEDS_PHOSPHATE)
      this.lnP = this.phosphateSpeciation
        .at(this.celsius, this.dT, this.shape, this.k, this.f)
        .lnPivot(this.lnPhosphate, this.lnGamma1, pH, E);
    this.lnCl = this.lnChloride;
    const samePoint = pH === this.ligandPH && E === this.ligandE;
    this.ligandFresh = samePoint ? this.ligandFresh | bits : bits;
    this.ligandPH = pH;
    this.ligandE = E;
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
    this.ensureColumns();
    const t = this.table;
    const speciated = t.needs[i] & SPECIATED;
    if (speciated && (pH !== this.ligandPH || E !== this.ligandE || speciated & ~this.ligandFresh))
      this.ligandsFor(speciated, pH, E); // dominant may have left this species' ligands unworked
    let g = (unit ? this.aUnit[i] : this.aThreshold[i]) + this.b[i] * pH + this.c[i] * E;
    if (t.needs[i])
      g +=
        this.r[i] *
        (t.carbonate[i] * this.lnC + t.sulfur[i] * this.lnS + t.chloride[i] * this.lnCl + t.phosphate[i] * this.lnP);
    return g;
  }

  /**
   * g and dg/dE of every species at (pH, E) into lineG and lineSlope (+∞ and 0 where the water lacks a ligand the
   * species needs): the tangent lines a boundary search follows, in one pass. `unit`: dissolved species at unit
   * activity (the controlling solid's equilibrium, point-dissolved.ts). The lowest line (ties to the lower index) goes
   * to lineLowest, and the gap from it to the next lowest to lineGap.
   */
  linesAt(pH: number, E: number, unit = false): void {
    // the same lines again (a boundary below after the one above, in the same water): without sulfur nothing in them
    // depends on E but E itself (carbonate and orthophosphate speciate with pH only), and pH, E and water are the same
    const reusable = !(this.present & NEEDS_SULFUR);
    if (
      reusable &&
      pH === this.linesPH &&
      E === this.linesE &&
      unit === this.linesUnit &&
      this.linesStamp === this.waterStamp
    )
      return;
    this.ligandsAt(pH, E);
    this.ensureColumns();
    if (this.present !== this.linesPresent) this.allowLines();
    const t = this.table;
    const { b, c, r, lineG, lineSlope, lineSpecies, lineCount } = this;
    const a = unit ? this.aUnit : this.aThreshold;
    const { needs, sulfur } = t;
    const { lnC, lnS, lnCl, lnP } = this;
    const sulfurSlope = this.sulfurSlope;
    let lowest = -1;
    let gLowest = INF;
    let gNext = INF;
    for (let k = 0; k < lineCount; k++) {
      const i = lineSpecies[k];
      const need = needs[i];
      let g = a[i] + b[i] * pH + c[i] * E;
      if (need) g += r[i] * (t.carbonate[i] * lnC + sulfur[i] * lnS + t.chloride[i] * lnCl + t.phosphate[i] * lnP);
      lineG[i] = g;
      lineSlope[i] = c[i] + r[i] * sulfur[i] * sulfurSlope;
      if (g < gLowest) {
        gNext = gLowest;
        gLowest = g;
        lowest = i;
      } else if (g < gNext) gNext = g;
    }
    this.lineLowest = lowest;
    this.lineGap = gNext - gLowest;
    this.linesPH = reusable ? pH : NOT_A_NUMBER;
    this.linesE = E;
    this.linesUnit = unit;
    this.linesStamp = this.waterStamp;
  }

  /** lineSpecies for the current water: the species whose ligands it holds; the others' lines +∞ with slope 0. */
  private allowLines(): void {
    const { needs } = this.table;
    const absent = ~this.present;
    let count = 0;
    for (let i = 0; i < needs.length; i++) {
      if (needs[i] & absent) {
        this.lineG[i] = INF;
        this.lineSlope[i] = 0;
      } else this.lineSpecies[count++] = i;
    }
    this.lineCount = count;
    this.linesPresent = this.present;
  }

  /** dg_i/dE at the last point (the sulfur term bends it). */
  slopeE(i: number): number {
    this.ensureColumns();
    return this.c[i] + this.r[i] * this.table.sulfur[i] * this.sulfurSlope;
  }

  /**
   * Index of the dominant species at (pH, E): the exact argmin of g (ties to the lower index). The speciation of a
   * ligand (an exp and a log per form) is worked out only when a species containing it could win: its g is at least
   * the bound with the ligand's pivot at its total, a_pivot ≤ total (α ≤ 1, γ ≤ 1; the ligand is consumed, ν ≤ 0).
   * A row with a water of its own evaluates only the species not beaten everywhere in its rows' range (pruning);
   * a `probe` (a point searched along a boundary or across a diagram, not a row) does not widen that range.
   */
  dominant(pH: number, E: number, probe = false): number {
    const direct = this.due !== 0 && this.repeats === 0 && !this.correspondence; // a row with its own T, threshold or I
    if (!direct) this.ensureColumns();
    // no ligand to speciate (pure water, chloride only): one pass
    if (!(this.present & SPECIATED)) return direct ? this.directArgmin(pH, E, probe) : this.filledArgmin(pH, E);
    return this.ligandArgmin(pH, E, direct, probe);
  }

  /** The argmin in one pass over the filled columns, for a water without carbonate, sulfur or orthophosphate. */
  private filledArgmin(pH: number, E: number): number {
    const t = this.table;
    const { aThreshold, b, c, r } = this;
    const { needs, chloride } = t;
    const absent = ~this.present;
    const lnCl = this.lnCl;
    let best = -1;
    let bestG = INF;
    for (let i = 0, n = aThreshold.length; i < n; i++) {
      const need = needs[i];
      if (need & absent) continue;
      let g = aThreshold[i] + b[i] * pH + c[i] * E;
      if (need) g += r[i] * (chloride[i] * lnCl);
      if (g < bestG) {
        bestG = g;
        best = i;
      }
    }
    return best;
  }

  /**
   * The same from the fixed coefficient rows (constant ΔCp°r, at and below 100 °C), nothing stored: g_i is the sum of
   * its row times the row features (directFeatures), the ligands at their activities (chloride only here: exact).
   */
  private directArgmin(pH: number, E: number, probe: boolean): number {
    const { needs } = this.table;
    const { directRow, feature } = this;
    this.directFeatures(pH, E);
    const list = this.rowSpecies(probe);
    let best = -1;
    let bestG = INF;
    for (let m = 0, n = this.listed; m < n; m++) {
      const i = list[m];
      const need = needs[i];
      const g = rowDot(directRow, i * DIRECT_WIDTH, feature, need !== 0);
      if (g < bestG) {
        bestG = g;
        best = i;
      }
    }
    return best;
  }

  /**
   * The argmin where the water holds a ligand to speciate, in one pass over the species (g from the filled columns,
   * or from the coefficient rows for a `direct` row, as in filledArgmin and directArgmin). Species with chloride only
   * are exact at once (Cl− is free); those with carbonate, sulfur or orthophosphate first get their bound, and only
   * the ligands of the species whose bound could beat the best are speciated (ligandsFor).
   */
  private ligandArgmin(pH: number, E: number, direct: boolean, probe: boolean): number {
    const t = this.table;
    const { aThreshold, b, c, r, candidates, bounds, directRow, feature } = this;
    const { needs, carbonate, sulfur, chloride, phosphate } = t;
    const rtOverF = 1 / this.f;
    const { boundLnC, boundLnS, boundLnP } = this;
    const lnCl = this.lnChloride;
    this.directFeatures(pH, E);
    const list = this.rowSpecies(probe);
    const listed = this.listed;
    let best = -1;
    let bestG = INF;
    let count = 0;
    let reach = 0; // the ligands of the candidates whose bound does not yet lose to the best
    for (let q = 0; q < listed; q++) {
      const i = list[q];
      const need = needs[i];
      let g: number;
      if (direct) g = rowDot(directRow, i * DIRECT_WIDTH, feature, need !== 0);
      else {
        g = aThreshold[i] + b[i] * pH + c[i] * E;
        // the bound with each pivot at its total: g ≥ bound (each ν ≤ 0 and ln a ≤ ln total)
        if (need)
          g += r[i] * (carbonate[i] * boundLnC + sulfur[i] * boundLnS + chloride[i] * lnCl + phosphate[i] * boundLnP);
      }
      if (need & SPECIATED) {
        candidates[count] = i;
        bounds[count++] = g;
        continue;
      }
      if (g < bestG) {
        bestG = g;
        best = i;
      }
    }
    for (let m = 0; m < count; m++) if (bounds[m] - BOUND_MARGIN <= bestG) reach |= needs[candidates[m]];
    reach &= SPECIATED;
    if (reach === 0) return best;
    this.ligandsFor(reach, pH, E);
    // exact g = bound + (RT/F)·Σ (ν_L/x)·(ln a_L − its bound), over the speciated ligands
    const dC = rtOverF * (this.lnC - boundLnC);
    const dS = rtOverF * (this.lnS - boundLnS);
    const dP = rtOverF * (this.lnP - boundLnP);
    for (let m = 0; m < count; m++) {
      if (bounds[m] - BOUND_MARGIN > bestG) continue;
      const i = candidates[m];
      const row = i * DIRECT_WIDTH;
      const g = bounds[m] + directRow[row + 7] * dC + directRow[row + 8] * dS + directRow[row + 10] * dP;
      if (g < bestG || (g === bestG && i < best)) {
        bestG = g;
        best = i;
      }
    }
    return best;
  }

  /**
   * The species this point evaluates (the first `listed`), its features already in `feature`: those left by the
   * pruning inside its settled box, else every species the water allows (above 100 °C always: the box's planes are
   * those of constant ΔCp°r).
   */
  private rowSpecies(probe: boolean): Int32Array {
    const pruning = this.availableHere();
    const pruned = !this.correspondence && pruning.admit(this.feature, !probe);
    this.listed = pruned ? pruning.count : pruning.all.length;
    return pruned ? pruning.list : pruning.all;
  }

  /** The pruning of the current water's ligand set (its `all`: the species the water allows). */
  private availableHere(): SpeciesPruning {
    const present = this.present;
    let pruning = this.pruning[present];
    if (!pruning) {
      const { needs } = this.table;
      const available: number[] = [];
      for (let i = 0; i < needs.length; i++) if ((needs[i] & ~present) === 0) available.push(i);
      const exact = available.map((i) => (needs[i] & SPECIATED) === 0);
      pruning = new SpeciesPruning(this.directRow, DIRECT_WIDTH, DIRECT_FEATURES, available, exact);
      this.pruning[present] = pruning;
    }
    return pruning;
  }

  /** The row features of directRow at (pH, E) for the current water, the ligands at their bounds (chloride exact). */
  private directFeatures(pH: number, E: number): void {
    const f = this.feature;
    const rtOverF = 1 / this.f;
    f[0] = 1;
    f[1] = this.dT;
    f[2] = this.shape;
    f[3] = this.k * pH;
    f[4] = E;
    f[5] = rtOverF * this.lnActivity;
    f[6] = rtOverF * this.lnGamma1;
    f[7] = rtOverF * this.boundLnC;
    f[8] = rtOverF * this.boundLnS;
    f[9] = rtOverF * this.lnChloride;
    f[10] = rtOverF * this.boundLnP;
  }

  /** How many species the last point with a water of its own evaluated (the others proved unable to win there). */
  get evaluatedSpecies(): number {
    return this.listed;
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

/**
 * Throws unless every species consumes its ligand pivots (ν_L ≤ 0 in its formation from metal and pivots): the
 * argmin's bounds rest on it (g only grows as a pivot's activity falls below its total).
 */
export function consumesLigands(t: SpeciesTable): void {
  for (let i = 0; i < t.species.length; i++)
    for (const column of [t.carbonate, t.sulfur, t.chloride, t.phosphate])
      if (column[i] > 0) throw new Error(`species ${t.species[i].formula} releases a ligand pivot in its formation`);
}

/** Σ_k row_k·feature_k over the first 7 features, and the 4 ligand ones where the species has a ligand. */
function rowDot(m: Float64Array, at: number, f: Float64Array, ligands: boolean): number {
  let g = m[at] + m[at + 1] * f[1] + m[at + 2] * f[2] + m[at + 3] * f[3] + m[at + 4] * f[4];
  g += m[at + 5] * f[5] + m[at + 6] * f[6];
  if (ligands) g += m[at + 7] * f[7] + m[at + 8] * f[8] + m[at + 9] * f[9] + m[at + 10] * f[10];
  return g;
}

/**
 * PointEngine.directRow from the per-atom columns: g_i = ΔG°r(T)/(xF) − (ν_H+/x)·k·pH − (ν_e/x)·E + (RT/F)/x·(ln
 * threshold + z²·ln γ1 + Σ ν_L·ln a_L), with ΔG°r(T) = ΔG°r − ΔS°r·dT + ΔCp°r·shape (constant ΔCp°r, thermo.ts).
 */
function directCoefficients(
  t: SpeciesTable,
  g0PerAtom: Float64Array,
  sPerAtom: Float64Array,
  cpPerAtom: Float64Array,
  protonPerAtom: Float64Array,
  c: Float64Array,
): Float64Array {
  const m = new Float64Array(t.species.length * DIRECT_WIDTH);
  for (let i = 0; i < t.species.length; i++) {
    const at = i * DIRECT_WIDTH;
    const perAtom = 1 / t.x[i];
    const dissolved = t.dissolved[i] ? perAtom : 0;
    const row = [g0PerAtom[i], -sPerAtom[i], cpPerAtom[i], protonPerAtom[i], c[i], dissolved];
    row.push(dissolved * t.chargeSquared[i], t.carbonate[i] * perAtom, t.sulfur[i] * perAtom);
    row.push(t.chloride[i] * perAtom, t.phosphate[i] * perAtom);
    m.set(row, at);
  }
  return m;
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
