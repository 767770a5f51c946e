/**
 * The lower envelope of a cell's species planes as convex polygons: species i's region is the cell's polygon
 * clipped by g_i ≤ g_j for every other species j. Shared by the diagram (predominance.ts) and by the pruning of
 * species that are never dominant (system.ts).
 */
import { clipPolygon, HalfPlane, Point, polygonArea } from "./halfplane";
import type { PlaneCell } from "./system";

export interface EnvelopePiece {
  readonly species: number;
  readonly vertices: Point[];
}

/** Regions of the species of `cell` inside the convex polygon `area`; pieces smaller than `minArea` are dropped. */
export function envelopeRegions(cell: PlaneCell, area: readonly Point[], minArea: number): EnvelopePiece[] {
  const pieces: EnvelopePiece[] = [];
  const n = cell.a.length;
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(cell.a[i])) continue;
    let polygon: Point[] = area as Point[];
    for (let j = 0; j < n && polygon.length > 2; j++) {
      if (j === i || !Number.isFinite(cell.a[j])) continue;
      const h: HalfPlane = { a: cell.a[i] - cell.a[j], b: cell.b[i] - cell.b[j], c: cell.c[i] - cell.c[j] };
      if (h.b === 0 && h.c === 0) {
        // parallel planes: the lower one wins everywhere; on a tie the lower index keeps the region (as argmin does)
        if (h.a > 0 || (h.a === 0 && j < i)) polygon = [];
        continue;
      }
      polygon = clipPolygon(polygon, h);
    }
    if (polygon.length > 2 && Math.abs(polygonArea(polygon)) > minArea) pieces.push({ species: i, vertices: polygon });
  }
  return pieces;
}
