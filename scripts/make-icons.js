'use strict';
/* eslint-disable @typescript-eslint/no-require-imports -- a plain CommonJS Node script, run without a build step */
/**
 * Draws the Sunpane icons (assets/icon-16.png, -32, -64, -80): a slate window frame with four
 * lights, a warm wedge of sunlight falling across the glass, and an amber sun rising behind the
 * frame's upper-left corner. Our own design, drawn from geometry in unit coordinates (y down) with
 * 4 × 4 supersampling, and written by a minimal PNG encoder (RGBA, 8 bit, no interlace) on node:zlib.
 *
 * Usage: node scripts/make-icons.js   (rewrites the PNGs; commit them with this script)
 */
const fs = require('node:fs');
const path = require('node:path');
const zlib = require('node:zlib');

const SIZES = [16, 32, 64, 80];
const OUT = path.resolve(__dirname, '..', 'assets');
const SUPERSAMPLE = 4;

const SUN = [0xf2, 0xa5, 0x41];
const FRAME = [0x27, 0x4c, 0x5e];
const GLASS = [0xd8, 0xec, 0xf4];
const BEAM = [0xff, 0xd3, 0x6e];

const inRect = (x, y, x0, y0, x1, y1) => x >= x0 && x <= x1 && y >= y0 && y <= y1;

/** Point in a convex polygon given clockwise (in y-down screen coordinates). */
function inConvex(x, y, pts) {
  for (let i = 0; i < pts.length; i++) {
    const [ax, ay] = pts[i];
    const [bx, by] = pts[(i + 1) % pts.length];
    if ((bx - ax) * (y - ay) - (by - ay) * (x - ax) < 0) return false;
  }
  return true;
}

const WIN = { x0: 0.34, y0: 0.34, x1: 0.94, y1: 0.94 };
const T = 0.075; // frame width
const M = 0.05; // mullion width
const MID = (WIN.x0 + WIN.x1) / 2;
const WEDGE = [
  [0.41, 0.41],
  [0.66, 0.41],
  [0.87, 0.87],
  [0.58, 0.87],
];

/** The colour at a point, painter's order: sun, frame, glass, beam, mullions. Undefined = clear. */
function colourAt(x, y) {
  let c;
  if ((x - 0.3) ** 2 + (y - 0.3) ** 2 <= 0.22 ** 2) c = SUN;
  if (inRect(x, y, WIN.x0, WIN.y0, WIN.x1, WIN.y1)) {
    c = FRAME;
    if (inRect(x, y, WIN.x0 + T, WIN.y0 + T, WIN.x1 - T, WIN.y1 - T)) {
      c = inConvex(x, y, WEDGE) ? BEAM : GLASS;
      if (Math.abs(x - MID) <= M / 2 || Math.abs(y - MID) <= M / 2) c = FRAME;
    }
  }
  return c;
}

function render(size) {
  const rgba = Buffer.alloc(size * size * 4);
  const n = SUPERSAMPLE * SUPERSAMPLE;
  for (let py = 0; py < size; py++) {
    for (let px = 0; px < size; px++) {
      let r = 0;
      let g = 0;
      let b = 0;
      let covered = 0;
      for (let sy = 0; sy < SUPERSAMPLE; sy++) {
        for (let sx = 0; sx < SUPERSAMPLE; sx++) {
          const c = colourAt((px + (sx + 0.5) / SUPERSAMPLE) / size, (py + (sy + 0.5) / SUPERSAMPLE) / size);
          if (!c) continue;
          r += c[0];
          g += c[1];
          b += c[2];
          covered++;
        }
      }
      const o = (py * size + px) * 4;
      if (covered > 0) {
        rgba[o] = Math.round(r / covered);
        rgba[o + 1] = Math.round(g / covered);
        rgba[o + 2] = Math.round(b / covered);
        rgba[o + 3] = Math.round((255 * covered) / n);
      }
    }
  }
  return rgba;
}

const CRC_TABLE = Array.from({ length: 256 }, (_, k) => {
  let c = k;
  for (let i = 0; i < 8; i++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

function crc32(buf) {
  let c = 0xffffffff;
  for (const byte of buf) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type, data) {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

/** Encodes RGBA pixels as a PNG (colour type 6, filter 0 on every row). */
function encodePng(size, rgba) {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0);
  ihdr.writeUInt32BE(size, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 6; // RGBA
  const raw = Buffer.alloc(size * (size * 4 + 1));
  for (let y = 0; y < size; y++) rgba.copy(raw, y * (size * 4 + 1) + 1, y * size * 4, (y + 1) * size * 4);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', zlib.deflateSync(raw, { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

if (require.main === module) {
  fs.mkdirSync(OUT, { recursive: true });
  for (const size of SIZES) {
    const file = path.join(OUT, `icon-${size}.png`);
    fs.writeFileSync(file, encodePng(size, render(size)));
    console.log(`wrote ${path.relative(process.cwd(), file)}`);
  }
}

module.exports = { SIZES, render, encodePng, crc32 };
