// Draws the add-in icons (assets/icon-<size>.png) with nothing but node's zlib.
// Motif: three phasor arrows 120° apart from a common star point, on a rounded tile.
// Run: node scripts/make-icons.mjs   (the PNGs are committed; rerun after changing this file)
import { deflateSync } from 'node:zlib';
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const SIZES = [16, 32, 64, 80, 128];
const OUT_DIR = join(dirname(fileURLToPath(import.meta.url)), '..', 'assets');

// Our palette: a slate-teal tile, three warm arm colours, a pale star point.
const TILE = [0x1d, 0x4e, 0x5f];
const TILE_EDGE = [0x14, 0x3a, 0x47];
const ARMS = [
  [0xf4, 0xb9, 0x42], // amber
  [0xe8, 0x6a, 0x5c], // coral
  [0x9f, 0xd8, 0xcb], // sea green
];
const HUB = [0xf7, 0xf3, 0xe8];

/** CRC-32 (ISO 3309), as PNG chunks require. */
const CRC_TABLE = (() => {
  const table = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[n] = c >>> 0;
  }
  return table;
})();

function crc32(bytes) {
  let c = 0xffffffff;
  for (const b of bytes) c = CRC_TABLE[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type, data) {
  const out = Buffer.alloc(12 + data.length);
  out.writeUInt32BE(data.length, 0);
  out.write(type, 4, 'ascii');
  data.copy(out, 8);
  out.writeUInt32BE(crc32(out.subarray(4, 8 + data.length)), 8 + data.length);
  return out;
}

/** Encodes straight (non-premultiplied) RGBA pixels as a PNG (colour type 6, 8 bit). */
function encodePng(size, rgba) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // RGBA
  const raw = Buffer.alloc(size * (size * 4 + 1));
  for (let y = 0; y < size; y++) {
    raw[y * (size * 4 + 1)] = 0; // filter: none
    rgba.copy(raw, y * (size * 4 + 1) + 1, y * size * 4, (y + 1) * size * 4);
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(raw, { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

// --- geometry, in unit coordinates: the tile spans [0,1]², y grows downwards ---

function insideRoundedSquare(x, y, inset, radius) {
  const lo = inset + radius;
  const hi = 1 - inset - radius;
  const dx = Math.max(lo - x, 0, x - hi);
  const dy = Math.max(lo - y, 0, y - hi);
  return dx * dx + dy * dy <= radius * radius;
}

function distanceToSegment(px, py, ax, ay, bx, by) {
  const vx = bx - ax;
  const vy = by - ay;
  const t = Math.max(0, Math.min(1, ((px - ax) * vx + (py - ay) * vy) / (vx * vx + vy * vy)));
  const dx = px - (ax + t * vx);
  const dy = py - (ay + t * vy);
  return Math.hypot(dx, dy);
}

function insideTriangle(px, py, [a, b, c]) {
  const side = (p, q) => (q[0] - p[0]) * (py - p[1]) - (q[1] - p[1]) * (px - p[0]);
  const s1 = side(a, b);
  const s2 = side(b, c);
  const s3 = side(c, a);
  return (s1 >= 0 && s2 >= 0 && s3 >= 0) || (s1 <= 0 && s2 <= 0 && s3 <= 0);
}

/** Where the arms meet (slightly below centre, so the tilted arms balance the upright one). */
const STAR_POINT = [0.5, 0.54];

/** Small icons get longer, bolder arms and a thinner border so the motif survives at 16 px. */
function proportions(size) {
  if (size <= 16) return { stroke: 0.14, head: 0.22, reach: 0.43, hub: 0.06, border: 0 };
  if (size <= 32) return { stroke: 0.095, head: 0.21, reach: 0.4, hub: 0.075, border: 0.03 };
  return { stroke: 0.07, head: 0.17, reach: 0.37, hub: 0.08, border: 0.04 };
}

/** The three arms: phase 1 points up, the others follow at 120° steps (screen angles). */
function arms(size) {
  const { stroke, head, reach } = proportions(size);
  const [cx, cy] = STAR_POINT;
  return [90, 210, 330].map((deg, i) => {
    const a = (deg * Math.PI) / 180;
    const ux = Math.cos(a);
    const uy = -Math.sin(a);
    const tip = [cx + reach * ux, cy + reach * uy];
    const base = [cx + (reach - head) * ux, cy + (reach - head) * uy];
    const half = head * 0.55;
    const triangle = [tip, [base[0] - half * uy, base[1] + half * ux], [base[0] + half * uy, base[1] - half * ux]];
    return { colour: ARMS[i], from: [cx, cy], to: base, stroke, triangle };
  });
}

function shade(size, x, y, geometry) {
  const { hub, border } = proportions(size);
  if (!insideRoundedSquare(x, y, 0.02, 0.2)) return null;
  if (Math.hypot(x - STAR_POINT[0], y - STAR_POINT[1]) <= hub) return HUB;
  for (const arm of geometry) {
    const [ax, ay] = arm.from;
    const [bx, by] = arm.to;
    if (distanceToSegment(x, y, ax, ay, bx, by) <= arm.stroke / 2 || insideTriangle(x, y, arm.triangle)) {
      return arm.colour;
    }
  }
  return insideRoundedSquare(x, y, 0.02 + border, 0.2 - border) ? TILE : TILE_EDGE;
}

/** Renders one icon with 6×6 supersampling per pixel for smooth edges. */
function render(size) {
  const samples = 6;
  const geometry = arms(size);
  const rgba = Buffer.alloc(size * size * 4);
  for (let py = 0; py < size; py++) {
    for (let px = 0; px < size; px++) {
      let r = 0;
      let g = 0;
      let b = 0;
      let covered = 0;
      for (let sy = 0; sy < samples; sy++) {
        for (let sx = 0; sx < samples; sx++) {
          const colour = shade(size, (px + (sx + 0.5) / samples) / size, (py + (sy + 0.5) / samples) / size, geometry);
          if (colour) {
            r += colour[0];
            g += colour[1];
            b += colour[2];
            covered++;
          }
        }
      }
      const o = (py * size + px) * 4;
      if (covered > 0) {
        rgba[o] = Math.round(r / covered);
        rgba[o + 1] = Math.round(g / covered);
        rgba[o + 2] = Math.round(b / covered);
      }
      rgba[o + 3] = Math.round((255 * covered) / (samples * samples));
    }
  }
  return encodePng(size, rgba);
}

mkdirSync(OUT_DIR, { recursive: true });
for (const size of SIZES) {
  const file = join(OUT_DIR, `icon-${size}.png`);
  writeFileSync(file, render(size));
  console.log(`wrote ${file}`);
}
