/**
 * The boundary equations of a drawn diagram, E = a + b·pH (V vs SHE), between regions that share an edge: the
 * line where the two species' planes meet (system.ts pairBoundary), the form in which handbooks tabulate them
 * (Pourbaix 1974, Atlas of Electrochemical Equilibria in Aqueous Solutions). Vertical boundaries (no electron
 * exchanged) are pH = constant.
 */
import { diagramRegions, pairBoundary, type DiagramWindow, type MetalSystem } from "../chemistry";
import { polygonsTouch } from "./label-placement";

export interface BoundaryEquation {
  readonly first: string;
  readonly second: string;
  /** E = intercept + slope·pH (V vs SHE), or pH = intercept when vertical. */
  readonly intercept: number;
  readonly slope: number;
  readonly vertical: boolean;
}

/** Whether two convex polygons share an edge (two vertices of one within `tolerance` of the other's boundary). */
function shareEdge(
  a: readonly (readonly [number, number])[],
  b: readonly (readonly [number, number])[],
  tolerance: number,
): boolean {
  const near = (p: readonly [number, number], poly: readonly (readonly [number, number])[]) =>
    polygonsTouch([p], poly, tolerance);
  const count = a.filter((p) => near(p, b)).length + b.filter((p) => near(p, a)).length;
  return count >= 2 && polygonsTouch(a, b, tolerance);
}

/** Equations of every boundary drawn in `window` (pH, V vs SHE), ordered by the first species' pH position. */
export function boundaryEquations(system: MetalSystem, window: DiagramWindow): BoundaryEquation[] {
  const regions = diagramRegions(system, window);
  const out: BoundaryEquation[] = [];
  const seen = new Set<string>();
  for (let i = 0; i < regions.length; i++) {
    for (let j = i + 1; j < regions.length; j++) {
      const [a, b] = [regions[i], regions[j]];
      if (a.formula === b.formula || !shareEdge(a.vertices, b.vertices, 1e-6)) continue;
      const key = [a.formula, b.formula].sort().join("|");
      if (seen.has(key)) continue;
      seen.add(key);
      const line = pairBoundary(system, a.formula, b.formula);
      if (!line) continue;
      out.push(
        line.kind === "line"
          ? { first: a.formula, second: b.formula, intercept: line.intercept, slope: line.slope, vertical: false }
          : { first: a.formula, second: b.formula, intercept: line.pH, slope: 0, vertical: true },
      );
    }
  }
  return out;
}

/** "E = 0.771 − 0.1773·pH" or "pH = 9.52" with 4 significant decimals. */
export function equationText(e: BoundaryEquation): string {
  const n = (v: number) => Number(v.toFixed(4)).toString().replace("-", "\u2212");
  if (e.vertical) return `pH = ${n(e.intercept)}`;
  if (Math.abs(e.slope) < 5e-5) return `E = ${n(e.intercept)}`;
  return `E = ${n(e.intercept)} ${e.slope < 0 ? "\u2212" : "+"} ${n(Math.abs(e.slope))}\u00b7pH`;
}
