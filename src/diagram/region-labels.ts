/**
 * Which label each region gets and where, so that no two labels overlap and none crosses the frame: regions are
 * labelled largest room first; each tries its formula at 13, 11 and 9 px at the points of its polygon with the most
 * room (label-placement.ts), skipping points whose box would overlap a label already placed. A region too small
 * for its formula gets a number instead (its formula goes in the key beside the diagram); a region too small even
 * for a number is listed in the key unmarked. A box that fits inside its clipped polygon lies inside the frame.
 */
import { Pixel, placeLabel, roomAt, touchingGroups } from "./label-placement";

export interface LabelRequest {
  /** The region's formula (groups touching pieces of one species). */
  readonly key: string;
  readonly pixels: readonly Pixel[];
  /** Width (px) of the formula's text at a font size. */
  width(size: number): number;
}

export interface Box {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

export type LabelPlan =
  | { readonly kind: "formula"; readonly piece: number; readonly x: number; readonly y: number; readonly size: number }
  | {
      readonly kind: "number";
      readonly piece: number;
      readonly x: number;
      readonly y: number;
      readonly size: number;
      readonly number: number;
    }
  | { readonly kind: "key-only"; readonly piece: number; readonly number: number };

export const LABEL_SIZES = [13, 11, 9] as const;
const NUMBER_SIZE = 10;
const GRID = 14;

/** Box of a label of font `size` and text width `width` centred at (x, y): text height 1.25·size plus a margin. */
export function labelBox(x: number, y: number, width: number, size: number): Box {
  const w = width + 4;
  const h = size * 1.25 + 2;
  return { x: x - w / 2, y: y - h / 2, width: w, height: h };
}

export function boxesOverlap(a: Box, b: Box): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

/** Centres inside `polygon` where a w × h box fits, most room first (the best point, then a grid over the polygon). */
function candidates(polygon: readonly Pixel[], w: number, h: number): Pixel[] {
  const best = placeLabel(polygon, w, h);
  if (!best.fits) return [];
  const xs = polygon.map((p) => p[0]);
  const ys = polygon.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const points: { p: Pixel; room: number }[] = [{ p: [best.x, best.y], room: best.room }];
  for (let i = 0; i <= GRID; i++) {
    for (let j = 0; j <= GRID; j++) {
      const p: Pixel = [x0 + ((x1 - x0) * i) / GRID, y0 + ((y1 - y0) * j) / GRID];
      const room = roomAt(polygon, w, h, p[0], p[1]);
      if (room >= 0) points.push({ p, room });
    }
  }
  return points.sort((a, b) => b.room - a.room).map((c) => c.p);
}

/** The first candidate centre whose box clears every placed box. */
function freeSpot(
  polygon: readonly Pixel[],
  width: number,
  size: number,
  placed: readonly Box[],
): { x: number; y: number; box: Box } | null {
  const probe = labelBox(0, 0, width, size);
  for (const [x, y] of candidates(polygon, probe.width, probe.height)) {
    const box = labelBox(x, y, width, size);
    if (!placed.some((b) => boxesOverlap(b, box))) return { x, y, box };
  }
  return null;
}

/** One label per visible region (touching pieces of one species count as one), in request order of pieces. */
export function planLabels(requests: readonly LabelRequest[]): LabelPlan[] {
  const groups = touchingGroups(requests.map((r) => ({ key: r.key, pixels: r.pixels })));
  const members = new Map<number, number[]>();
  groups.forEach((g, i) => members.set(g, [...(members.get(g) ?? []), i]));
  const roomOf = (i: number) =>
    placeLabel(requests[i].pixels, requests[i].width(LABEL_SIZES[2]) + 4, LABEL_SIZES[2] * 1.25 + 2).room;
  // each group's pieces, most room first; groups with the most room are labelled first
  const ordered = [...members.values()].map((pieces) =>
    pieces.map((i) => ({ i, room: roomOf(i) })).sort((a, b) => b.room - a.room),
  );
  ordered.sort((a, b) => b[0].room - a[0].room);
  const placed: Box[] = [];
  const plans: LabelPlan[] = [];
  const unlabelled: number[] = [];
  for (const pieces of ordered) {
    let done = false;
    for (const size of LABEL_SIZES) {
      for (const { i } of pieces) {
        const spot = freeSpot(requests[i].pixels, requests[i].width(size), size, placed);
        if (!spot) continue;
        placed.push(spot.box);
        plans.push({ kind: "formula", piece: i, x: spot.x, y: spot.y, size });
        done = true;
        break;
      }
      if (done) break;
    }
    if (!done) unlabelled.push(pieces[0].i);
  }
  // numbered key for the rest, numbered left to right on the diagram
  const centre = (i: number) => requests[i].pixels.reduce((s, p) => s + p[0], 0) / requests[i].pixels.length;
  unlabelled.sort((a, b) => centre(a) - centre(b));
  unlabelled.forEach((i, k) => {
    const number = k + 1;
    const width = String(number).length * NUMBER_SIZE * 0.6;
    const spot = freeSpot(requests[i].pixels, width, NUMBER_SIZE, placed);
    if (spot) {
      placed.push(spot.box);
      plans.push({ kind: "number", piece: i, x: spot.x, y: spot.y, size: NUMBER_SIZE, number });
    } else plans.push({ kind: "key-only", piece: i, number });
  });
  return plans;
}
