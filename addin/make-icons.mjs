/**
 * Draws Phasecell's ribbon and store icons (16, 32, 64 and 80 px PNG) into addin/assets/.
 *
 * The motif is our own: three phase-boundary curves meeting at a triple point, white on a deep
 * teal rounded square. Each pixel is supersampled 5 × 5 for anti-aliasing, and the PNG is encoded
 * by hand (signature, IHDR, one zlib-compressed IDAT, IEND; RGBA, 8 bits per channel), so no
 * image tool is needed. Run `node addin/make-icons.mjs` after changing the drawing; the PNGs are
 * kept in the repository so a build never depends on this script.
 */
import { deflateSync } from "node:zlib";
import { writeFileSync, mkdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { Buffer } from "node:buffer";

export const ICON_SIZES = [16, 32, 64, 80];
const here = dirname(fileURLToPath(import.meta.url));

const BACKGROUND = [0x0e, 0x5a, 0x6e]; // deep teal
const INK = [0xff, 0xff, 0xff];
const ACCENT = [0xff, 0xc8, 0x3d]; // the triple point

/** Triple point and the three curves, in unit coordinates (x right, y down). */
const TRIPLE = [0.42, 0.6];
function quadratic(p0, p1, p2, steps = 24) {
  const points = [];
  for (let i = 0; i <= steps; i++) {
    const t = i / steps;
    const a = (1 - t) * (1 - t);
    const b = 2 * (1 - t) * t;
    const c = t * t;
    points.push([a * p0[0] + b * p1[0] + c * p2[0], a * p0[1] + b * p1[1] + c * p2[1]]);
  }
  return points;
}
const CURVES = [
  quadratic([0.16, 0.84], [0.3, 0.76], TRIPLE), // sublimation
  quadratic(TRIPLE, [0.62, 0.48], [0.84, 0.2]), // boiling, ends at the critical point
  quadratic(TRIPLE, [0.4, 0.4], [0.36, 0.16]), // melting
];
const CRITICAL = [0.84, 0.2];

function distanceToSegment(px, py, [ax, ay], [bx, by]) {
  const dx = bx - ax;
  const dy = by - ay;
  const lengthSquared = dx * dx + dy * dy;
  const t = lengthSquared === 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / lengthSquared));
  return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
}

function insideRoundedSquare(x, y, radius) {
  const cx = Math.min(Math.max(x, radius), 1 - radius);
  const cy = Math.min(Math.max(y, radius), 1 - radius);
  return Math.hypot(x - cx, y - cy) <= radius;
}

/** Colour and coverage of one sample point (unit coordinates). */
function sample(x, y, size) {
  if (!insideRoundedSquare(x, y, 0.18)) return null;
  // Strokes keep at least about 1.3 px at 16 px so the curves stay visible on the ribbon.
  const halfWidth = Math.max(0.055, 0.65 / size);
  const dotRadius = Math.max(0.085, 1.6 / size);
  if (Math.hypot(x - TRIPLE[0], y - TRIPLE[1]) <= dotRadius) return ACCENT;
  if (size >= 32 && Math.hypot(x - CRITICAL[0], y - CRITICAL[1]) <= dotRadius * 0.7) return INK;
  for (const curve of CURVES) {
    for (let i = 1; i < curve.length; i++) {
      if (distanceToSegment(x, y, curve[i - 1], curve[i]) <= halfWidth) return INK;
    }
  }
  return BACKGROUND;
}

/** RGBA pixels of one icon. */
export function drawIcon(size) {
  const samples = 5;
  const pixels = Buffer.alloc(size * size * 4);
  for (let row = 0; row < size; row++) {
    for (let column = 0; column < size; column++) {
      let r = 0;
      let g = 0;
      let b = 0;
      let covered = 0;
      for (let sy = 0; sy < samples; sy++) {
        for (let sx = 0; sx < samples; sx++) {
          const colour = sample((column + (sx + 0.5) / samples) / size, (row + (sy + 0.5) / samples) / size, size);
          if (colour === null) continue;
          r += colour[0];
          g += colour[1];
          b += colour[2];
          covered++;
        }
      }
      const offset = (row * size + column) * 4;
      if (covered > 0) {
        pixels[offset] = Math.round(r / covered);
        pixels[offset + 1] = Math.round(g / covered);
        pixels[offset + 2] = Math.round(b / covered);
      }
      pixels[offset + 3] = Math.round((255 * covered) / (samples * samples));
    }
  }
  return pixels;
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
function crc32(bytes) {
  let c = 0xffffffff;
  for (const byte of bytes) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
function chunk(type, data) {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const typeAndData = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typeAndData));
  return Buffer.concat([length, typeAndData, crc]);
}

/** A PNG file (RGBA, 8 bit, no interlace) from raw RGBA pixels. */
export function encodePng(size, rgba) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // colour type RGBA
  header[10] = 0; // deflate
  header[11] = 0; // adaptive filtering
  header[12] = 0; // no interlace
  const stride = size * 4;
  const raw = Buffer.alloc((stride + 1) * size);
  for (let row = 0; row < size; row++) {
    raw[row * (stride + 1)] = 0; // filter: none
    rgba.copy(raw, row * (stride + 1) + 1, row * stride, (row + 1) * stride);
  }
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", header),
    chunk("IDAT", deflateSync(raw, { level: 9 })),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const out = join(here, "assets");
  mkdirSync(out, { recursive: true });
  for (const size of ICON_SIZES) {
    const file = join(out, `icon-${size}.png`);
    const png = encodePng(size, drawIcon(size));
    writeFileSync(file, png);
    console.log(`wrote addin/assets/icon-${size}.png (${png.length} bytes)`);
  }
}
