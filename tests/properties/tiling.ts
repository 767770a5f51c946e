/**
 * The tiling property shared by the engine's property tests: a diagram's regions cover the rectangle with no gap
 * or overlap (their areas sum to it within 1e-9 relative), and each point lies in the region of its dominant
 * species (points on an edge may touch two regions, one of them the dominant species').
 */
import { expect } from "vitest";
import { Point, polygonArea } from "../../src/chemistry/halfplane";
import { DiagramWindow, diagramRegions } from "../../src/chemistry/predominance";
import { dominantSpecies, MetalSystem } from "../../src/chemistry/system";

export const TILING_WINDOW: DiagramWindow = { pHMin: -2, pHMax: 16, eMin: -2.5, eMax: 2.5 };

/** Whether p lies in a convex counter-clockwise polygon (as clipping produces); on an edge counts as inside. */
export function insideConvex(polygon: readonly Point[], p: Point): boolean {
  for (let i = 0; i < polygon.length; i++) {
    const a = polygon[i];
    const b = polygon[(i + 1) % polygon.length];
    if ((b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0]) < -1e-9) return false;
  }
  return true;
}

export function expectRegionsTile(
  system: MetalSystem,
  points: readonly { pH: number; E: number }[],
  window = TILING_WINDOW,
): void {
  const regions = diagramRegions(system, window);
  const total = regions.reduce((sum, r) => sum + Math.abs(polygonArea(r.vertices)), 0);
  const box = (window.pHMax - window.pHMin) * (window.eMax - window.eMin);
  expect(Math.abs(total - box) / box).toBeLessThan(1e-9);
  for (const { pH, E } of points) {
    const containing = regions.filter((r) => insideConvex(r.vertices, [pH, E]));
    expect(containing.length).toBeGreaterThanOrEqual(1);
    const dominant = dominantSpecies(system, pH, E);
    if (containing.length === 1) expect(containing[0].species).toBe(dominant);
    else expect(containing.map((r) => r.species)).toContain(dominant);
  }
}
