/**
 * Answers drawn from a system's planes: boundaries along the pH line of a point, the diagram's regions as convex
 * polygons (the cells of the lower envelope of the planes), and the dissolved metal in equilibrium with a solid.
 */
import { BOUNDARY_SEARCH_HIGH, BOUNDARY_SEARCH_LOW } from "./domain";
import { FARADAY, GAS_CONSTANT } from "./constants";
import { envelopeRegions } from "./envelope";
import { clipPolygon, intervalOnVertical, Point, polygonArea, rectangle } from "./halfplane";
import { cellAt, dominantSpecies, MetalSystem, PlaneCell, PRUNE_PH_MAX, PRUNE_PH_MIN } from "./system";

export interface BoundaryCrossing {
  /** Potential of the boundary, V vs SHE. */
  readonly E: number;
  /** Species dominant just below and just above. */
  readonly below: number;
  readonly above: number;
}

/** Lower envelope of the lines g_i(E) = a_i + c_i·E on [lo, hi] for one cell at fixed pH. */
function envelopeOnLine(
  cell: PlaneCell,
  pH: number,
  lo: number,
  hi: number,
): { from: number; to: number; species: number }[] {
  const n = cell.a.length;
  const offset = new Float64Array(n);
  for (let i = 0; i < n; i++) offset[i] = cell.a[i] + cell.b[i] * pH;
  // start: lowest g at lo; among ties the one falling fastest with E (lowest c) takes over first
  let current = -1;
  let bestG = Infinity;
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(offset[i])) continue;
    const g = offset[i] + cell.c[i] * lo;
    if (current < 0 || g < bestG - 1e-12 || (Math.abs(g - bestG) <= 1e-12 && cell.c[i] < cell.c[current])) {
      current = i;
      bestG = g;
    }
  }
  const segments: { from: number; to: number; species: number }[] = [];
  if (current < 0) return segments;
  let from = lo;
  for (;;) {
    let next = -1;
    let nextE = Infinity;
    for (let j = 0; j < n; j++) {
      if (!Number.isFinite(offset[j]) || cell.c[j] >= cell.c[current]) continue;
      const crossing = (offset[j] - offset[current]) / (cell.c[current] - cell.c[j]);
      if (crossing < nextE - 1e-12 || (Math.abs(crossing - nextE) <= 1e-12 && cell.c[j] < cell.c[next])) {
        nextE = crossing;
        next = j;
      }
    }
    if (next < 0 || nextE >= hi) {
      segments.push({ from, to: hi, species: current });
      return segments;
    }
    const at = Math.max(nextE, from);
    segments.push({ from, to: at, species: current });
    from = at;
    current = next;
  }
}

/** Every species change along the vertical line at pH between `lo` and `hi`, ascending in E. */
export function boundariesAtPH(
  system: MetalSystem,
  pH: number,
  lo = BOUNDARY_SEARCH_LOW,
  hi = BOUNDARY_SEARCH_HIGH,
): BoundaryCrossing[] {
  const segments: { from: number; to: number; species: number }[] = [];
  for (const cell of system.cells) {
    const interval = intervalOnVertical(cell.region, pH, lo, hi);
    if (!interval || interval[1] - interval[0] <= 0) continue;
    segments.push(...envelopeOnLine(cell, pH, interval[0], interval[1]));
  }
  segments.sort((p, q) => p.from - q.from);
  // merge: drop zero-length pieces, join neighbours of the same species
  const merged: { from: number; to: number; species: number }[] = [];
  for (const seg of segments) {
    if (seg.to - seg.from <= 1e-12) continue;
    const last = merged[merged.length - 1];
    if (last && last.species === seg.species) last.to = seg.to;
    else merged.push({ ...seg });
  }
  const crossings: BoundaryCrossing[] = [];
  for (let i = 1; i < merged.length; i++) {
    crossings.push({ E: merged[i].from, below: merged[i - 1].species, above: merged[i].species });
  }
  return crossings;
}

/**
 * The nearest boundary above (direction 1) or below (−1) the point at its pH, or null when none lies in
 * −3…+3 V. A point exactly on a boundary looks past it.
 */
export function nearestBoundary(
  system: MetalSystem,
  pH: number,
  E: number,
  direction: 1 | -1,
): BoundaryCrossing | null {
  const quick = nearestBoundaryInOneCell(system, pH, E, direction);
  if (quick !== undefined) return quick;
  const crossings = boundariesAtPH(system, pH);
  if (direction > 0) {
    for (const c of crossings) if (c.E > E) return c;
    return null;
  }
  for (let i = crossings.length - 1; i >= 0; i--) if (crossings[i].E < E) return crossings[i];
  return null;
}

/**
 * The same answer without walking the whole line, for a system of one cell and a point strictly inside a region:
 * the species dominant at the point stays lowest until the first plane that falls faster with E (direction 1) or
 * slower (−1) crosses it, so the boundary is the nearest such crossing. Returns undefined — "use the general walk"
 * — for several cells, outside the pruning window, or when the point lies on a boundary or at a tie (there the
 * walk's tie rules decide).
 */
function nearestBoundaryInOneCell(
  system: MetalSystem,
  pH: number,
  E: number,
  direction: 1 | -1,
): BoundaryCrossing | null | undefined {
  if (
    system.cells.length !== 1 ||
    !(pH >= PRUNE_PH_MIN && pH <= PRUNE_PH_MAX) ||
    !(E >= BOUNDARY_SEARCH_LOW && E <= BOUNDARY_SEARCH_HIGH)
  )
    return undefined;
  const cell = system.cells[0];
  const { a, b, c } = cell;
  const active = cell.active ?? allSpecies(cell); // every species is a candidate until the cell has found its active ones
  const here = dominantSpecies(system, pH, E);
  const offsetHere = a[here] + b[here] * pH;
  const gHere = offsetHere + c[here] * E;
  let next = -1;
  let nextE = direction > 0 ? Infinity : -Infinity;
  let tie = false;
  for (let k = 0, n = active.length; k < n; k++) {
    const j = active[k];
    if (j === here) continue;
    const gj = a[j] + b[j] * pH + c[j] * E;
    if (gj - gHere <= 1e-12) return undefined; // a tie at the point itself
    const dc = c[here] - c[j];
    if (direction > 0 ? dc <= 0 : dc >= 0) continue; // never overtakes in this direction
    const crossing = (a[j] + b[j] * pH - offsetHere) / dc;
    const distance = direction > 0 ? crossing - nextE : nextE - crossing;
    if (Math.abs(distance) <= 1e-12) tie = true;
    else if (distance < 0) {
      nextE = crossing;
      next = j;
      tie = false;
    }
  }
  if (tie) return undefined; // several planes cross at once: the walk's tie rules pick the species
  const limit = direction > 0 ? BOUNDARY_SEARCH_HIGH : BOUNDARY_SEARCH_LOW;
  if (next < 0 || (direction > 0 ? nextE >= limit : nextE <= limit)) return null;
  return direction > 0 ? { E: nextE, below: here, above: next } : { E: nextE, below: next, above: here };
}

/** Indices 0…n−1 of a cell's species. */
function allSpecies(cell: PlaneCell): Int32Array {
  const all = new Int32Array(cell.a.length);
  for (let i = 0; i < all.length; i++) all[i] = i;
  return all;
}

export interface Region {
  readonly species: number;
  readonly formula: string;
  /** Convex polygon, counter-clockwise, in (pH, E) coordinates. */
  readonly vertices: Point[];
}

export interface DiagramWindow {
  pHMin: number;
  pHMax: number;
  eMin: number;
  eMax: number;
}

/**
 * The diagram's regions inside a rectangle: for every cell and species, the rectangle clipped by the cell's
 * region and by g_i ≤ g_j for every other species j. Regions of one species in several cells are returned
 * separately. Together they tile the rectangle.
 */
export function diagramRegions(system: MetalSystem, window: DiagramWindow): Region[] {
  const regions: Region[] = [];
  const box = rectangle(window.pHMin, window.pHMax, window.eMin, window.eMax);
  const scale = Math.abs(polygonArea(box));
  for (const cell of system.cells) {
    let cellPolygon: Point[] = box;
    for (const h of cell.region) cellPolygon = clipPolygon(cellPolygon, h);
    if (Math.abs(polygonArea(cellPolygon)) <= scale * 1e-15) continue;
    for (const piece of envelopeRegions(cell, cellPolygon, scale * 1e-15)) {
      regions.push({
        species: piece.species,
        formula: system.species[piece.species].formula,
        vertices: piece.vertices,
      });
    }
  }
  return regions;
}

/**
 * Total dissolved metal (mol/kg, ideal activities) in equilibrium with the solid `solid` at (pH, E):
 * for each dissolved species i,  ln a_i = x_i·F·(g_S − g_i°)/(RT), total Σ x_i·a_i (docs/method.md, Dissolved metal).
 */
export function dissolvedTotal(
  system: MetalSystem,
  solid: number,
  pH: number,
  E: number,
): { total: number; parts: { species: number; molality: number }[] } {
  const cell = cellAt(system, pH, E);
  const gSolid = cell.a[solid] + cell.b[solid] * pH + cell.c[solid] * E;
  const fOverRT = FARADAY / (GAS_CONSTANT * system.kelvin);
  let total = 0;
  const parts: { species: number; molality: number }[] = [];
  system.species.forEach((s, i) => {
    if (!s.dissolved || !Number.isFinite(cell.aUnit[i])) return;
    const gUnit = cell.aUnit[i] + cell.b[i] * pH + cell.c[i] * E;
    const molality = s.metalAtoms * Math.exp(s.metalAtoms * fOverRT * (gSolid - gUnit));
    parts.push({ species: i, molality });
    total += molality;
  });
  return { total, parts };
}

/** The dominant species and, where it is a solid (the metal included), the dissolved total in equilibrium with it. */
export function dissolvedAtPoint(system: MetalSystem, pH: number, E: number): { solid: number; total: number } | null {
  const dominant = dominantSpecies(system, pH, E);
  if (system.species[dominant].dissolved) return null;
  return { solid: dominant, total: dissolvedTotal(system, dominant, pH, E).total };
}
