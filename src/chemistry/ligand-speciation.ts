/**
 * Exact speciation of a ligand at fixed total at one point (pH, E, T, ionic strength): the activity of its pivot
 * species from the mass balance over all its dissolved species (Stumm, W., Morgan, J.J., Aquatic Chemistry, 3rd ed.,
 * 1996, ch. 3 (α-fractions) and ch. 8 (redox speciation)):
 *
 *   each species j (one ligand atom) is in equilibrium with the pivot P:  a_j = a_P·exp(−F·g_j/RT),
 *   g_j = [ΔG°r,j(T) − c_H,j·RT ln10·pH ... ]/F  the formation of j from P, H2O, H+, e− (volts);
 *   total = Σ_j a_j/γ_j   ⇒   ln a_P = ln total − ln Σ_j exp(−F·g_j/RT − ln γ_j)
 *
 * For carbonate (HCO3− pivot, CO2(aq) and CO3²−) this is the α-fraction of HCO3− at the pH; for sulfur (SO4²− pivot;
 * HSO4−, H2S(aq), HS−, S²−) the distribution over its redox forms at pH and E. Where elemental sulfur would exceed
 * unit activity (a_S(s) = a_P·exp(−F·g_S/RT) > 1) it is saturated: a_P is capped at exp(F·g_S/RT) and the rest
 * of the total is taken as the solid. Ligand bound in complexes of the trace metal is neglected (metal totals are
 * far below ligand totals in waters).
 */
import { DOUBLE_ZERO } from "./double-zero";
import { FARADAY, T0 } from "./constants";
import { correspondenceBasis, NO_CORRESPONDENCE } from "./criss-cobble";
import { LigandTable, rowGibbs } from "./species-tables";

// Built-ins held in module constants: in a sandboxed host each global lookup per row is slow.
const { abs, exp, log, max, min } = Math;
const INF = 1 / 0;
/**
 * Log-gap below which a minor form is taken as absent for the straightness of ln a_P: ln a_P then departs from its
 * line by at most ln(1 + 5·e^−20) ≈ 1e-8, a few 1e-10 V in g — far inside the boundary tolerance (1e-7 V).
 */
const MIXING_GAP = 20;
const NOT_A_NUMBER = 0 / 0;
/** Log-gap past which a form adds nothing to a sum of at least 1 in double precision (six forms of e^−40 < 2^−53). */
const NEGLIGIBLE_GAP = -40;

export class LigandAtPoint {
  private celsius = NOT_A_NUMBER;
  private f = DOUBLE_ZERO;
  /** Per species at the current temperature: g_j = g[j] + b[j]·pH + e[j]·E, volts. */
  private readonly g: Float64Array;
  private readonly b: Float64Array;
  private readonly e: Float64Array;
  /** The last point's exponents u_j (one per species). */
  private readonly u: Float64Array;
  /** The last point's weights exp(u_j − max u) and their sum. */
  private readonly w: Float64Array;
  private sum = NOT_A_NUMBER;
  /** Whether the solid was saturated at the last point. */
  saturated = false;
  /** The largest u_j at the last point, and the pH and E it was taken at. */
  private top = DOUBLE_ZERO;
  private lastPH = DOUBLE_ZERO;
  private lastE = DOUBLE_ZERO;
  /** d ln a_P/dE at the last point, once asked for (slopeKnown). A flag, not NaN: minifiers turn 0/0 into the global. */
  private slope = DOUBLE_ZERO;
  private slopeKnown = false;
  /** The last call's other inputs and answer (lastLn), and whether any form differs in electrons (E matters). */
  private lastLnTotal = DOUBLE_ZERO;
  private lastLnGamma1 = DOUBLE_ZERO;
  private lastCelsius = NOT_A_NUMBER;
  private lastLn = DOUBLE_ZERO;
  private readonly redox: boolean;
  /** ΔG°r(25 °C), ΔS°r and ΔCp°r per faraday (V, V/K), and −ν_H+, per species. */
  private readonly g0PerF: Float64Array;
  private readonly sPerF: Float64Array;
  private readonly cpPerF: Float64Array;
  private readonly minusProton: Float64Array;
  /** ln a_P before the saturation cap. */
  private lnUnsaturated = DOUBLE_ZERO;

  constructor(private readonly table: LigandTable) {
    const n = table.species.length;
    this.redox = table.electron.some((x) => x !== 0);
    this.g0PerF = table.g0.map((x) => x / FARADAY);
    this.sPerF = table.s.map((x) => x / FARADAY);
    this.cpPerF = table.cp.map((x) => x / FARADAY);
    this.minusProton = table.proton.map((x) => -x);
    this.g = new Float64Array(n);
    this.b = new Float64Array(n);
    this.e = new Float64Array(n);
    this.u = new Float64Array(n);
    this.w = new Float64Array(n);
    table.electron.forEach((x, j) => (this.e[j] = -x)); // dg_j/dE does not depend on temperature
  }

  /**
   * This speciation at `celsius` (columns redone only on change); dT = T − T0, shape = dT − T·ln(T/T0), k(T) and
   * f = F/RT come from the caller, which has them for the temperature already.
   */
  at(celsius: number, dT: number, shape: number, k: number, f: number): this {
    if (celsius !== this.celsius) this.setTemperature(celsius, dT, shape, k, f);
    return this;
  }

  private setTemperature(celsius: number, dT: number, shape: number, k: number, f: number): void {
    const t = this.table;
    const basis = correspondenceBasis(dT + T0);
    const plain = basis === NO_CORRESPONDENCE; // at and below 100 °C: constant ΔCp°r, from the per-faraday columns
    const { g, b, g0PerF, sPerF, cpPerF, minusProton } = this;
    for (let j = 0; j < g.length; j++) {
      g[j] = plain ? g0PerF[j] - sPerF[j] * dT + cpPerF[j] * shape : rowGibbs(t, j, dT, shape, basis) / FARADAY;
      b[j] = minusProton[j] * k;
    }
    this.f = f;
    this.celsius = celsius;
  }

  /** ln a(pivot) at (pH, E) for a total (ln, mol/kg) and ln γ of a unit charge; sets saturated. */
  lnPivot(lnTotal: number, lnGamma1: number, pH: number, E: number): number {
    // a ligand without redox forms (carbonate, phosphate) is asked again at one pH along a boundary search
    if (
      pH === this.lastPH &&
      lnTotal === this.lastLnTotal &&
      lnGamma1 === this.lastLnGamma1 &&
      this.celsius === this.lastCelsius &&
      (E === this.lastE || !this.redox)
    )
      return this.lastLn;
    const { g, b, e, u, w, f } = this;
    const z2 = this.table.chargeSquared;
    const solid = this.table.solidIndex;
    const n = g.length;
    let top = -INF;
    for (let j = 0; j < n; j++) {
      const uj = j === solid ? -INF : -f * (g[j] + b[j] * pH + e[j] * E) - z2[j] * lnGamma1;
      u[j] = uj;
      if (uj > top) top = uj;
    }
    let sum = 0;
    for (let j = 0; j < n; j++) {
      const gapToTop = u[j] - top; // the solid's u is −∞
      const wj = gapToTop === 0 ? 1 : gapToTop > NEGLIGIBLE_GAP ? exp(gapToTop) : 0;
      w[j] = wj;
      sum += wj;
    }
    this.sum = sum;
    // ln a_P = ln total − LSE(u)
    let ln = lnTotal - top - log(sum);
    this.lnUnsaturated = ln;
    this.saturated = false;
    if (solid >= 0) {
      const cap = f * (g[solid] + b[solid] * pH + e[solid] * E); // a_S(s) = 1
      if (ln > cap) {
        ln = cap;
        this.saturated = true;
      }
    }
    this.top = top;
    this.lastPH = pH;
    this.lastE = E;
    this.lastLnTotal = lnTotal;
    this.lastLnGamma1 = lnGamma1;
    this.lastCelsius = this.celsius;
    this.lastLn = ln;
    this.slopeKnown = false;
    return ln;
  }

  /** d ln a_P / dE at the last point (for boundary tracing): f·Σ w_j·e_j / Σ w_j, or the solid's slope if saturated. */
  get slopeE(): number {
    if (!this.slopeKnown) {
      this.slope = this.saturated ? this.f * this.e[this.table.solidIndex] : this.unsaturatedSlope();
      this.slopeKnown = true;
    }
    return this.slope;
  }

  /** f·Σ w_j·e_j / Σ w_j at the last point (u_j = −f·g_j − …, dg_j/dE = e_j). */
  private unsaturatedSlope(): number {
    const { e, w } = this;
    let slope = 0;
    for (let j = 0; j < w.length; j++) slope += w[j] * e[j];
    return this.sum > 0 ? (this.f * slope) / this.sum : 0; // before any point (sum unset): no slope
  }

  /**
   * Distance in E (V, either way) over which ln a_P stays linear in E to 5·e^−20 from the last point: one form carries
   * the total (or the solid saturates) and no saturation edge is crossed. Where it is 0 the forms mix (a bend).
   */
  get straightFor(): number {
    const { g, b, e, u, f, top } = this;
    const solid = this.table.solidIndex;
    let leader = -1;
    for (let j = 0; j < u.length; j++) if (u[j] === top) leader = j;
    // how far the leading form keeps the others below e^−20 (their log-gap closes at f·|e_j − e_leader| per volt)
    let straight = INF;
    for (let j = 0; j < u.length; j++) {
      if (j === solid || j === leader) continue;
      const rate = f * abs(e[j] - e[leader]);
      if (rate > 0) straight = min(straight, max(0, (top - u[j] - MIXING_GAP) / rate));
    }
    if (solid >= 0) {
      const cap = f * (g[solid] + b[solid] * this.lastPH + e[solid] * this.lastE);
      const closing = abs(f * e[solid] - this.unsaturatedSlope());
      if (closing > 0) straight = min(straight, abs(cap - this.lnUnsaturated) / closing); // the saturation edge: a kink
    }
    return straight;
  }
}
