/**
 * Convex polygons in the (pH, E) plane and their clipping by half-planes — the geometry behind the regions of a
 * diagram. A half-plane is the set where  a + b·pH + c·E ≤ 0.
 */

export type Point = readonly [pH: number, E: number];

export interface HalfPlane {
  readonly a: number;
  readonly b: number;
  readonly c: number;
}

export function rectangle(pHMin: number, pHMax: number, eMin: number, eMax: number): Point[] {
  return [
    [pHMin, eMin],
    [pHMax, eMin],
    [pHMax, eMax],
    [pHMin, eMax],
  ];
}

/** Keeps the part of a convex polygon where a + b·pH + c·E ≤ 0 (Sutherland–Hodgman, one edge). */
export function clipPolygon(polygon: readonly Point[], h: HalfPlane): Point[] {
  const out: Point[] = [];
  const n = polygon.length;
  if (n === 0) return out;
  const value = (p: Point) => h.a + h.b * p[0] + h.c * p[1];
  for (let i = 0; i < n; i++) {
    const p = polygon[i];
    const q = polygon[(i + 1) % n];
    const vp = value(p);
    const vq = value(q);
    if (vp <= 0) out.push(p);
    if ((vp < 0 && vq > 0) || (vp > 0 && vq < 0)) {
      const t = vp / (vp - vq);
      out.push([p[0] + t * (q[0] - p[0]), p[1] + t * (q[1] - p[1])]);
    }
  }
  return out;
}

/** Signed area by the shoelace formula (positive counter-clockwise). */
export function polygonArea(polygon: readonly Point[]): number {
  let twice = 0;
  for (let i = 0, n = polygon.length; i < n; i++) {
    const p = polygon[i];
    const q = polygon[(i + 1) % n];
    twice += p[0] * q[1] - q[0] * p[1];
  }
  return twice / 2;
}

/** Whether a point satisfies every half-plane (with a small tolerance). */
export function insideAll(halfPlanes: readonly HalfPlane[], pH: number, E: number, tolerance = 1e-12): boolean {
  for (const h of halfPlanes) if (h.a + h.b * pH + h.c * E > tolerance) return false;
  return true;
}

/** The interval of E on the vertical line at pH that satisfies every half-plane, or null when empty. */
export function intervalOnVertical(
  halfPlanes: readonly HalfPlane[],
  pH: number,
  eLow: number,
  eHigh: number,
): [number, number] | null {
  let lo = eLow;
  let hi = eHigh;
  for (const h of halfPlanes) {
    const rest = h.a + h.b * pH; // rest + c·E ≤ 0
    if (h.c === 0) {
      if (rest > 0) return null;
    } else if (h.c > 0) hi = Math.min(hi, -rest / h.c);
    else lo = Math.max(lo, -rest / h.c);
  }
  return lo <= hi ? [lo, hi] : null;
}
