// Draws the Redox Cells icon — a 3×3 grid of cells crossed by a rising arrow (a potential going up) — from one
// shape list into assets/icon.svg and assets/icon-{16,32,64,80}.png. Pure JavaScript: shapes are rasterised here
// by supersampling (8×8 samples per pixel) and written with pngjs. Run: node scripts/make-icons.mjs

import { writeFileSync, mkdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { PNG } from "pngjs";

const ROOT = join(dirname(fileURLToPath(import.meta.url)), "..");
const OUT = join(ROOT, "assets");
const VIEW = 64; // design grid: 64 × 64 units
const SIZES = [16, 32, 64, 80];
const SAMPLES = 8;

/** Arrow from (x0,y0) to the tip (x1,y1) as a polygon: shaft of width w, head of length h and width hw. */
function arrow(x0, y0, x1, y1, w, h, hw) {
  const len = Math.hypot(x1 - x0, y1 - y0);
  const ux = (x1 - x0) / len;
  const uy = (y1 - y0) / len;
  const nx = -uy;
  const ny = ux;
  const bx = x1 - ux * h; // base of the head
  const by = y1 - uy * h;
  const p = (x, y, s) => [x + nx * s, y + ny * s];
  return [
    p(x0, y0, w / 2),
    p(bx, by, w / 2),
    p(bx, by, hw / 2),
    [x1, y1],
    p(bx, by, -hw / 2),
    p(bx, by, -w / 2),
    p(x0, y0, -w / 2),
  ];
}

const cells = [];
for (let row = 0; row < 3; row++) {
  for (let col = 0; col < 3; col++) {
    const shade = (row + col) % 2 === 0 ? "#d9ebe6" : "#b8d8d0";
    cells.push({ kind: "rect", x: 8 + col * 17, y: 8 + row * 17, w: 14, h: 14, r: 2, fill: shade });
  }
}

/** The icon, back to front. */
const SHAPES = [
  { kind: "rect", x: 0, y: 0, w: 64, h: 64, r: 12, fill: "#1d4f57" },
  ...cells,
  { kind: "polygon", points: arrow(13, 51, 52, 12, 8, 17, 22), fill: "#1d4f57" }, // dark outline under the arrow
  { kind: "polygon", points: arrow(15, 49, 49, 15, 5, 13, 16), fill: "#e39a2d" },
];

function insideRoundRect(s, x, y) {
  if (x < s.x || x > s.x + s.w || y < s.y || y > s.y + s.h) return false;
  const cx = Math.min(Math.max(x, s.x + s.r), s.x + s.w - s.r);
  const cy = Math.min(Math.max(y, s.y + s.r), s.y + s.h - s.r);
  return (x - cx) ** 2 + (y - cy) ** 2 <= s.r ** 2;
}

function insidePolygon(points, x, y) {
  let inside = false;
  for (let i = 0, j = points.length - 1; i < points.length; j = i++) {
    const [xi, yi] = points[i];
    const [xj, yj] = points[j];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

const inside = (s, x, y) => (s.kind === "rect" ? insideRoundRect(s, x, y) : insidePolygon(s.points, x, y));
const rgb = (hex) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));

function rasterise(size) {
  const png = new PNG({ width: size, height: size });
  const scale = VIEW / size;
  for (let py = 0; py < size; py++) {
    for (let px = 0; px < size; px++) {
      let r = 0,
        g = 0,
        b = 0,
        a = 0;
      for (let sy = 0; sy < SAMPLES; sy++) {
        for (let sx = 0; sx < SAMPLES; sx++) {
          const x = (px + (sx + 0.5) / SAMPLES) * scale;
          const y = (py + (sy + 0.5) / SAMPLES) * scale;
          let top = null;
          for (const s of SHAPES) if (inside(s, x, y)) top = s;
          if (top) {
            const [cr, cg, cb] = rgb(top.fill);
            r += cr;
            g += cg;
            b += cb;
            a += 1;
          }
        }
      }
      const k = (py * size + px) * 4;
      const n = SAMPLES * SAMPLES;
      // Colour averaged over covered samples (straight alpha), alpha = coverage.
      png.data[k] = a ? Math.round(r / a) : 0;
      png.data[k + 1] = a ? Math.round(g / a) : 0;
      png.data[k + 2] = a ? Math.round(b / a) : 0;
      png.data[k + 3] = Math.round((255 * a) / n);
    }
  }
  return PNG.sync.write(png);
}

function svg() {
  const body = SHAPES.map((s) =>
    s.kind === "rect"
      ? `  <rect x="${s.x}" y="${s.y}" width="${s.w}" height="${s.h}" rx="${s.r}" fill="${s.fill}"/>`
      : `  <polygon points="${s.points.map(([x, y]) => `${x.toFixed(2)},${y.toFixed(2)}`).join(" ")}" fill="${s.fill}"/>`,
  );
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${VIEW}" height="${VIEW}" viewBox="0 0 ${VIEW} ${VIEW}">`,
    ...body,
    "</svg>",
    "",
  ].join("\n");
}

mkdirSync(OUT, { recursive: true });
writeFileSync(join(OUT, "icon.svg"), svg());
for (const size of SIZES) {
  writeFileSync(join(OUT, `icon-${size}.png`), rasterise(size));
  console.log(`assets/icon-${size}.png`);
}
console.log("assets/icon.svg");
