/**
 * The nearest stability boundary above or below a point at its pH, from the point engine. Without sulfur every g_i
 * is linear in E at fixed pH (carbonate and chloride activities do not depend on E), so the boundary is the nearest
 * crossing of the dominant species' line by a line that falls faster in that direction — exact, one pass. With
 * sulfur the ligand term bends g_i(E) where sulfate turns to sulfide (and kinks where elemental sulfur saturates):
 * the walk follows tangent lines to the next predicted crossing — in one step where the sulfur term is linear, at
 * most MAX_STEP at a time inside a bend — checks the species there and brackets a change by bisection to
 * BOUNDARY_TOLERANCE.
 */
import { BOUNDARY_SEARCH_HIGH, BOUNDARY_SEARCH_LOW } from "./domain";
import { PointEngine } from "./point-engine";

// Built-ins held in module constants: in a sandboxed host each global lookup per row is slow.
const { abs, max, min } = Math;
const INF = 1 / 0;

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

/** The species dominant just past E in direction d (ties at E go to the one that stays lowest); leaves linesAt(E). */
function speciesPast(engine: PointEngine, pH: number, E: number, d: 1 | -1): number {
  engine.linesAt(pH, E);
  return pastOnLines(engine, engine.lineLowest, d);
}

/** Among the species tied with `first` on the last lines, the one that stays lowest going in direction d. */
function pastOnLines(engine: PointEngine, first: number, d: 1 | -1): number {
  const { lineG, lineSlope, lineSpecies, lineCount } = engine;
  if (first === engine.lineLowest && engine.lineGap > TIE) return first; // no other line within TIE of it
  const gFirst = lineG[first];
  let best = first;
  let bestSlope = d * lineSlope[first];
  for (let k = 0; k < lineCount; k++) {
    const i = lineSpecies[k];
    if (i === best || lineG[i] - gFirst > TIE) continue;
    const s = d * lineSlope[i];
    if (s < bestSlope - TIE || (abs(s - bestSlope) <= TIE && i < best)) {
      best = i;
      bestSlope = s;
    }
  }
  return best;
}

/**
 * Distance (in direction d) to the nearest crossing of the tangent lines of `here` by another species; the taker.
 * Reads the lines of the engine's last linesAt (speciesPast at the same point).
 */
function tangentCrossing(engine: PointEngine, here: number, d: 1 | -1): { distance: number; next: number } {
  const { lineG, lineSlope, lineSpecies, lineCount } = engine;
  const gHere = lineG[here];
  const sHere = d * lineSlope[here];
  let distance = INF;
  let next = -1;
  let nextSlope = INF;
  for (let k = 0; k < lineCount; k++) {
    const j = lineSpecies[k];
    if (j === here || lineG[j] === INF) continue;
    const sj = d * lineSlope[j];
    if (sj >= sHere) continue; // never overtakes in this direction
    const t = max(0, (lineG[j] - gHere) / (sHere - sj));
    if (t < distance - TIE || (abs(t - distance) <= TIE && sj < nextSlope)) {
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
  let current = d > 0 ? max(E, BOUNDARY_SEARCH_LOW) : min(E, BOUNDARY_SEARCH_HIGH);
  if (d * (limit - current) <= 0) return null;
  let here = speciesPast(engine, pH, current, d);
  if (!engine.hasSulfur) {
    const { distance, next } = tangentCrossing(engine, here, d);
    const at = current + d * distance;
    if (next < 0 || d * (limit - at) <= 0) return null;
    return crossing(at, here, next, d);
  }
  for (let step = 0; step < 10000; step++) {
    const { distance, next } = tangentCrossing(engine, here, d);
    // tangents are exact as far as the sulfur term stays linear; inside a bend, steps of at most MAX_STEP
    const straight = engine.sulfurStraightFor;
    const toLimit = d * (limit - current);
    if (min(distance, toLimit) <= straight) {
      // every line straight up to the crossing (or the search limit): the tangent crossing is exact, as without sulfur
      if (next < 0 || distance >= toLimit) return null;
      return crossing(current + d * distance, here, next, d);
    }
    const reach = min(distance, max(straight, MAX_STEP), toLimit);
    const probe = current + d * (reach + BOUNDARY_TOLERANCE / 4);
    engine.linesAt(pH, probe); // the lines there give the dominant species (their lowest) and the next tangents
    const there = engine.lineLowest;
    if (there === here) {
      if (d * (limit - probe) <= 0) return null;
      current = probe;
      here = pastOnLines(engine, there, d);
      continue;
    }
    return bisect(engine, pH, current, probe, here, there, d);
  }
  return null;
}

/**
 * Narrows [inside, outside] (species `here` at inside, `atOutside` at outside) to BOUNDARY_TOLERANCE: the root of
 * g_other − g_here by linear interpolation between the ends (regula falsi) is tested with a pair of points
 * BOUNDARY_TOLERANCE apart around it, which closes the bracket at once when the estimate is good; every third step
 * is a bisection, so the bracket always shrinks.
 */
function bisect(
  engine: PointEngine,
  pH: number,
  inside: number,
  outside: number,
  here: number,
  atOutside: number,
  d: 1 | -1,
): PointCrossing {
  let other = atOutside;
  const half = BOUNDARY_TOLERANCE / 2;
  for (let step = 1; abs(outside - inside) > BOUNDARY_TOLERANCE && step < 200; step++) {
    const width = outside - inside;
    let middle = inside + 0.5 * width;
    if (step % 3 !== 0) {
      const fIn = gap(engine, pH, inside, here, other);
      const fOut = gap(engine, pH, outside, here, other);
      const estimate = inside + (width * fIn) / (fIn - fOut);
      if (d * (outside - estimate) <= half && d * (estimate - inside) > 0) {
        // the root sits at the outside end (a walk step aimed there): one test just inside it closes the bracket
        const near = outside - d * 0.9 * BOUNDARY_TOLERANCE;
        const s = engine.dominant(pH, near, true);
        if (s === here) inside = near;
        else {
          outside = near;
          other = s;
        }
        continue;
      }
      if (d * (estimate - inside) > half && d * (outside - estimate) > half) {
        const before = estimate - d * half;
        const s = engine.dominant(pH, before, true);
        if (s !== here) {
          outside = before;
          other = s;
          continue;
        }
        inside = before;
        middle = estimate + d * half;
        if (d * (outside - middle) <= 0) continue;
      }
    }
    const s = engine.dominant(pH, middle, true);
    if (s === here) inside = middle;
    else {
      outside = middle;
      other = s;
    }
  }
  return crossing(0.5 * (inside + outside), here, other, d);
}

/** g_other − g_here at E (ligands at E). */
function gap(engine: PointEngine, pH: number, E: number, here: number, other: number): number {
  engine.ligandsAt(pH, E);
  return engine.g(other, pH, E) - engine.g(here, pH, E);
}

function crossing(E: number, here: number, next: number, d: 1 | -1): PointCrossing {
  return d > 0 ? { E, below: here, above: next } : { E, below: next, above: here };
}
