/**
 * Where to write a region's label: the point of a convex polygon (pixel coordinates) where a text box of the
 * given size has the most room — the box's distance to the nearest edge is largest. For a point box this is the
 * polygon's pole of inaccessibility, the centre of its largest inscribed circle (Garcia-Castellanos & Lombardo 2007).
 *
 * For an edge with inward unit normal n through vertex v, a box of half-size (w, h) centred at p stays inside
 * when  n·(p − v) ≥ |n_x|·w + |n_y|·h.  The room at p is the smallest such margin over all edges: a minimum of
 * affine functions, hence concave, so a grid search refined around its best point converges to the maximum.
 */

export type Pixel = readonly [x: number, y: number];

export interface LabelPlacement {
  readonly x: number;
  readonly y: number;
  /** Smallest margin (px) between the box and an edge at the chosen point; negative when it does not fit. */
  readonly room: number;
  readonly fits: boolean;
}

interface Edge {
  nx: number;
  ny: number;
  offset: number; // n·v
  need: number; // |nx|·w/2 + |ny|·h/2
}

function edgesOf(polygon: readonly Pixel[], width: number, height: number): Edge[] {
  let twiceArea = 0;
  const n = polygon.length;
  for (let i = 0; i < n; i++) {
    const p = polygon[i];
    const q = polygon[(i + 1) % n];
    twiceArea += p[0] * q[1] - q[0] * p[1];
  }
  const orientation = twiceArea >= 0 ? 1 : -1;
  const edges: Edge[] = [];
  for (let i = 0; i < n; i++) {
    const p = polygon[i];
    const q = polygon[(i + 1) % n];
    const dx = q[0] - p[0];
    const dy = q[1] - p[1];
    const length = Math.hypot(dx, dy);
    if (length < 1e-9) continue;
    // inward normal: left of the edge for a counter-clockwise polygon (positive shoelace area)
    const nx = (-dy / length) * orientation;
    const ny = (dx / length) * orientation;
    edges.push({
      nx,
      ny,
      offset: nx * p[0] + ny * p[1],
      need: (Math.abs(nx) * width) / 2 + (Math.abs(ny) * height) / 2,
    });
  }
  return edges;
}

/** Room (px) for a box of size (width, height) centred at (x, y) inside the polygon. */
export function roomAt(polygon: readonly Pixel[], width: number, height: number, x: number, y: number): number {
  let room = Infinity;
  for (const e of edgesOf(polygon, width, height)) room = Math.min(room, e.nx * x + e.ny * y - e.offset - e.need);
  return room;
}

/** Best centre for a width × height label inside a convex polygon given in pixels. */
export function placeLabel(polygon: readonly Pixel[], width: number, height: number): LabelPlacement {
  if (polygon.length === 0) return { x: 0, y: 0, room: -Infinity, fits: false };
  const edges = edgesOf(polygon, width, height);
  const roomOf = (x: number, y: number) => {
    let room = Infinity;
    for (const e of edges) room = Math.min(room, e.nx * x + e.ny * y - e.offset - e.need);
    return room;
  };
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (const [x, y] of polygon) {
    minX = Math.min(minX, x);
    maxX = Math.max(maxX, x);
    minY = Math.min(minY, y);
    maxY = Math.max(maxY, y);
  }
  if (edges.length === 0) return { x: minX, y: minY, room: -Infinity, fits: false };
  let cx = (minX + maxX) / 2;
  let cy = (minY + maxY) / 2;
  let halfW = (maxX - minX) / 2;
  let halfH = (maxY - minY) / 2;
  let best = { x: cx, y: cy, room: roomOf(cx, cy) };
  const steps = 10;
  for (let round = 0; round < 14 && (halfW > 1e-3 || halfH > 1e-3); round++) {
    for (let i = 0; i <= steps; i++) {
      for (let j = 0; j <= steps; j++) {
        const x = cx - halfW + (2 * halfW * i) / steps;
        const y = cy - halfH + (2 * halfH * j) / steps;
        const room = roomOf(x, y);
        if (room > best.room) best = { x, y, room };
      }
    }
    cx = best.x;
    cy = best.y;
    halfW *= 0.35;
    halfH *= 0.35;
  }
  return { ...best, fits: best.room >= 0 };
}

/** Distance from point p to the segment a–b, px. */
function segmentDistance(p: Pixel, a: Pixel, b: Pixel): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const length2 = dx * dx + dy * dy;
  const t = length2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / length2));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}

/** Whether two convex polygons touch: a vertex of either lies within `tolerance` px of the other's boundary. */
export function polygonsTouch(a: readonly Pixel[], b: readonly Pixel[], tolerance = 0.75): boolean {
  const near = (p: Pixel, polygon: readonly Pixel[]) =>
    polygon.some((v, i) => segmentDistance(p, v, polygon[(i + 1) % polygon.length]) <= tolerance);
  return a.some((p) => near(p, b)) || b.some((p) => near(p, a));
}

/**
 * Groups of pieces that form one visible region: pieces with the same key (a species' formula) that touch,
 * directly or through each other. A species split by a ligand boundary into adjacent pieces is then labelled
 * once. Returns a group number per piece (pieces alone get their own).
 */
export function touchingGroups(
  pieces: readonly { readonly key: string; readonly pixels: readonly Pixel[] }[],
): number[] {
  const parent = pieces.map((_, i) => i);
  const root = (i: number): number => (parent[i] === i ? i : (parent[i] = root(parent[i])));
  for (let i = 0; i < pieces.length; i++) {
    for (let j = i + 1; j < pieces.length; j++) {
      if (pieces[i].key !== pieces[j].key || root(i) === root(j)) continue;
      if (polygonsTouch(pieces[i].pixels, pieces[j].pixels)) parent[root(j)] = root(i);
    }
  }
  return pieces.map((_, i) => root(i));
}
