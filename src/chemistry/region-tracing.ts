/**
 * Diagram regions of a water with ligands from the point engine itself, so that a drawn region agrees with SPECIES
 * everywhere: the species along vertical lines (columns) of the window are found with the engine's boundaries
 * (exact where straight, bracketed to 10⁻⁷ V where sulfur bends them); between two columns with the same sequence
 * of species each region is the trapezoid joining their boundary points. Columns are added by halving the pH step
 * until neighbours have the same sequence and the middle column lies within TRACE_TOLERANCE_E of the straight
 * join, or the step is below TRACE_TOLERANCE_PH (a vertical boundary: each side then keeps its own sequence up to
 * the middle). Pure-water diagrams keep their exact polygons (predominance.ts).
 */
import { Database } from "./database";
import type { Point } from "./halfplane";
import type { LigandTotals } from "./ligand-cells";
import { pointBoundary } from "./point-boundary";
import type { PointEngine } from "./point-engine";
import { engineInWater, waterOf } from "./point-service";
import type { DiagramWindow, Region } from "./predominance";
import type { MetalSystem } from "./system";

/** Largest gap, V, between a traced boundary and the drawn edge at the middle of a strip (0.1 mV). */
export const TRACE_TOLERANCE_E = 1e-4;
/** Narrowest strip, pH units, where a vertical boundary is located. */
export const TRACE_TOLERANCE_PH = 1e-3;
const FIRST_STEP = 0.25;

interface Column {
  readonly pH: number;
  readonly species: readonly number[];
  /** Boundaries between consecutive species, ascending (length species − 1). */
  readonly edges: readonly number[];
}

function column(engine: PointEngine, pH: number, w: DiagramWindow): Column {
  const species = [engine.dominant(pH, w.eMin, true)]; // a probe of the diagram, not a row
  const edges: number[] = [];
  let from = w.eMin;
  for (let k = 0; k < 200; k++) {
    const next = pointBoundary(engine, pH, from, 1);
    if (!next || next.E >= w.eMax) break;
    edges.push(next.E);
    species.push(next.above);
    from = next.E + 1e-6; // past the bracket of the boundary just found
  }
  return { pH, species, edges };
}

const sameSequence = (a: Column, b: Column) =>
  a.species.length === b.species.length && a.species.every((s, i) => s === b.species[i]);

/** The traced regions of `system`'s water (its ligand totals) inside the window, species indexed as in `system`. */
export function tracedRegions(
  db: Database,
  system: MetalSystem & { readonly ligandTotals?: LigandTotals },
  w: DiagramWindow,
): Region[] {
  const engine = engineInWater(db, system.element, waterOf(system.celsius, system.activity, system.ligandTotals ?? {}));
  const toSystem = engine.table.species.map((s) => system.species.findIndex((t) => t.formula === s.formula));
  const regions: Region[] = [];
  const emit = (left: Column, right: Column, leftPH: number, rightPH: number) => {
    left.species.forEach((s, k) => {
      const lo = (c: Column) => (k === 0 ? w.eMin : c.edges[k - 1]);
      const hi = (c: Column) => (k === c.species.length - 1 ? w.eMax : c.edges[k]);
      const vertices: Point[] = [
        [leftPH, lo(left)],
        [rightPH, lo(right)],
        [rightPH, hi(right)],
        [leftPH, hi(left)],
      ];
      regions.push({ species: toSystem[s], formula: engine.table.species[s].formula, vertices });
    });
  };
  const strip = (left: Column, right: Column) => {
    const middle = column(engine, 0.5 * (left.pH + right.pH), w);
    const straight =
      sameSequence(left, right) &&
      sameSequence(left, middle) &&
      middle.edges.every((e, k) => Math.abs(e - 0.5 * (left.edges[k] + right.edges[k])) <= TRACE_TOLERANCE_E);
    if (straight) return emit(left, right, left.pH, right.pH);
    if (right.pH - left.pH <= TRACE_TOLERANCE_PH) {
      emit(left, left, left.pH, middle.pH);
      emit(right, right, middle.pH, right.pH);
      return;
    }
    strip(left, middle);
    strip(middle, right);
  };
  const count = Math.max(1, Math.ceil((w.pHMax - w.pHMin) / FIRST_STEP));
  let previous = column(engine, w.pHMin, w);
  for (let i = 1; i <= count; i++) {
    const next = column(engine, w.pHMin + ((w.pHMax - w.pHMin) * i) / count, w);
    strip(previous, next);
    previous = next;
  }
  return regions;
}
