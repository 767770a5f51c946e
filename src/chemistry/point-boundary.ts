/**
 * The nearest stability boundary above or below a point at its pH, from the point engine. Without sulfur every g_i
 * is linear in E at fixed pH (carbonate and chloride activities do not depend on E), so the boundary is the nearest
 * crossing of the dominant species' line by a line that falls faster in that direction — exact, one pass. With
 * sulfur the ligand term bends g_i(E) where sulfate turns to sulfide: the walk follows tangent lines to the next
 * predicted crossing (at most MAX_STEP at a time), checks the species there and brackets the change by bisection
 * to BOUNDARY_TOLERANCE.
 */
import { PointEngine } from "./point-engine";

/** Potentials searched for boundaries, V vs SHE (#N/A when none in −3…+3 V). */
export const BOUNDARY_SEARCH_LOW = -3;
export const BOUNDARY_SEARCH_HIGH = 3;
/** Largest step of the walk where sulfur bends the lines, V. */
export const MAX_STEP = 0.05;
/** Width of the final bracket around a bent boundary, V (0.0001 mV). */
export const BOUNDARY_TOLERANCE = 1e-7;

export interface PointCrossing {
  /** Potential of the boundary, V vs SHE. */
  readonly E: number;
  /** Species (indices in the engine's table) dominant just below and just above. */
  readonly below: number;
  readonly above: number;
}

const TIE = 1e-12;

/** The species dominant just past E in direction d (ties at E go to the one that stays lowest), with the ligands at E. */
function speciesPast(engine: PointEngine, pH: number, E: number, d: 1 | -1): number {
  const first = engine.dominant(pH, E);
  const gFirst = engine.g(first, pH, E);
  let best = first;
  let bestSlope = d * engine.slopeE(first);
  for (let i = 0; i < engine.size; i++) {
    if (i === best || !engine.available(i)) continue;
    if (engine.g(i, pH, E) - gFirst > TIE) continue;
    const s = d * engine.slopeE(i);
    if (s < bestSlope - TIE || (Math.abs(s - bestSlope) <= TIE && i < best)) {
      best = i;
      bestSlope = s;
    }
  }
  return best;
}

/** Distance (in direction d) to the nearest crossing of the tangent lines of `here` by another species; the taker. */
function tangentCrossing(engine: PointEngine, here: number, pH: number, E: number, d: 1 | -1): { distance: number; next: number } {
  const gHere = engine.g(here, pH, E);
  const sHere = d * engine.slopeE(here);
  let distance = Infinity;
  let next = -1;
  let nextSlope = Infinity;
  for (let j = 0; j < engine.size; j++) {
    if (j === here || !engine.available(j)) continue;
    const sj = d * engine.slopeE(j);
    if (sj >= sHere) continue; // never overtakes in this direction
    const t = Math.max(0, (engine.g(j, pH, E) - gHere) / (sHere - sj));
    if (t < distance - TIE || (Math.abs(t - distance) <= TIE && sj < nextSlope)) {
      distance = t;
      next = j;
      nextSlope = sj;
    }
  }
  return { distance, next };
}

/** The nearest boundary above (d = 1) or below (−1) the point at its pH, or null when none lies in −3…+3 V. */
export function pointBoundary(engine: PointEngine, pH: number, E: number, d: 1 | -1): PointCrossing | null {
  const limit = d > 0 ? BOUNDARY_SEARCH_HIGH : BOUNDARY_SEARCH_LOW;
  let current = d > 0 ? Math.max(E, BOUNDARY_SEARCH_LOW) : Math.min(E, BOUNDARY_SEARCH_HIGH);
  if (d * (limit - current) <= 0) return null;
  let here = speciesPast(engine, pH, current, d);
  if (!engine.hasSulfur) {
    const { distance, next } = tangentCrossing(engine, here, pH, current, d);
    const at = current + d * distance;
    if (next < 0 || d * (limit - at) <= 0) return null;
    return crossing(at, here, next, d);
  }
  for (let step = 0; step < 10000; step++) {
    const { distance } = tangentCrossing(engine, here, pH, current, d);
    const reach = Math.min(distance, MAX_STEP, d * (limit - current));
    const probe = current + d * (reach + BOUNDARY_TOLERANCE / 4);
    const there = engine.dominant(pH, probe);
    if (there === here) {
      if (d * (limit - probe) <= 0) return null;
      current = probe;
      here = speciesPast(engine, pH, current, d);
      continue;
    }
    return bisect(engine, pH, current, probe, here, d);
  }
  return null;
}

/** Narrows [inside, outside] (species `here` at inside, another at outside) to BOUNDARY_TOLERANCE. */
function bisect(engine: PointEngine, pH: number, inside: number, outside: number, here: number, d: 1 | -1): PointCrossing {
  let other = engine.dominant(pH, outside);
  while (Math.abs(outside - inside) > BOUNDARY_TOLERANCE) {
    const middle = 0.5 * (inside + outside);
    const s = engine.dominant(pH, middle);
    if (s === here) inside = middle;
    else {
      outside = middle;
      other = s;
    }
  }
  return crossing(0.5 * (inside + outside), here, other, d);
}

function crossing(E: number, here: number, next: number, d: 1 | -1): PointCrossing {
  return d > 0 ? { E, below: here, above: next } : { E, below: next, above: here };
}
