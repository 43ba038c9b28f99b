// Draws assets/icon.png (1024 × 1024, RGBA): a white twelve-tooth gear on an Okabe–Ito blue
// rounded square, with a bluish-green oil drop in its bore. Original artwork; run
// `node assets/icon-source/draw-icon.mjs` to redraw. No dependencies: PNG written with zlib.
import { writeFileSync } from 'node:fs';
import { deflateSync } from 'node:zlib';

const SIZE = 1024;
const SAMPLES = 4; // per axis, for anti-aliasing
const BLUE = [0x00, 0x72, 0xb2];
const GREEN = [0x00, 0x9e, 0x73];
const WHITE = [0xff, 0xff, 0xff];

const TEETH = 12;
const ROOT = 0.3;
const TIP = 0.385;
const BORE = 0.13;

function roundedSquare(x, y) {
  const half = 0.44;
  const r = 0.19;
  const qx = Math.max(Math.abs(x) - (half - r), 0);
  const qy = Math.max(Math.abs(y) - (half - r), 0);
  return Math.hypot(qx, qy) <= r;
}

/** Gear outline radius at polar angle t: root, straight-ish flank, tip land, flank, root. */
function gearRadius(t) {
  const phase = (((t * TEETH) / (2 * Math.PI)) % 1 + 1) % 1;
  const ramp = (a, b, p) => Math.min(1, Math.max(0, (p - a) / (b - a)));
  const up = ramp(0.08, 0.2, phase);
  const down = 1 - ramp(0.5, 0.62, phase);
  return ROOT + (TIP - ROOT) * Math.min(up, down);
}

function drop(x, y) {
  // A circle with a pointed top: the tangent lines from the tip meet the circle.
  const cy = 0.025;
  const r = 0.07;
  const tipY = -0.11;
  if (Math.hypot(x, y - cy) <= r) return true;
  const d = cy - tipY;
  const half = Math.asin(r / d);
  const tangentY = tipY + Math.sqrt(d * d - r * r) * Math.cos(half);
  if (y < tipY || y > tangentY) return false;
  return Math.abs(x) <= (y - tipY) * Math.tan(half);
}

function colourAt(x, y) {
  if (!roundedSquare(x, y)) return null;
  const gx = x;
  const gy = y + 0.005;
  const rho = Math.hypot(gx, gy);
  if (drop(gx, gy)) return GREEN;
  if (rho >= BORE && rho <= gearRadius(Math.atan2(gy, gx) + Math.PI / TEETH / 2)) return WHITE;
  return BLUE;
}

const raw = Buffer.alloc(SIZE * (SIZE * 4 + 1));
for (let j = 0; j < SIZE; j++) {
  raw[j * (SIZE * 4 + 1)] = 0; // filter: none
  for (let i = 0; i < SIZE; i++) {
    let r = 0;
    let g = 0;
    let b = 0;
    let a = 0;
    for (let sj = 0; sj < SAMPLES; sj++) {
      for (let si = 0; si < SAMPLES; si++) {
        const x = (i + (si + 0.5) / SAMPLES) / SIZE - 0.5;
        const y = (j + (sj + 0.5) / SAMPLES) / SIZE - 0.5;
        const c = colourAt(x, y);
        if (!c) continue;
        r += c[0];
        g += c[1];
        b += c[2];
        a += 1;
      }
    }
    const o = j * (SIZE * 4 + 1) + 1 + i * 4;
    const n = SAMPLES * SAMPLES;
    raw[o] = a ? Math.round(r / a) : 0;
    raw[o + 1] = a ? Math.round(g / a) : 0;
    raw[o + 2] = a ? Math.round(b / a) : 0;
    raw[o + 3] = Math.round((255 * a) / n);
  }
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
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
  const td = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(td));
  return Buffer.concat([len, td, crc]);
}
const ihdr = Buffer.alloc(13);
ihdr.writeUInt32BE(SIZE, 0);
ihdr.writeUInt32BE(SIZE, 4);
ihdr[8] = 8; // bit depth
ihdr[9] = 6; // RGBA
const png = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', ihdr), chunk('IDAT', deflateSync(raw, { level: 9 })), chunk('IEND', Buffer.alloc(0))]);
const out = new URL('../icon.png', import.meta.url);
writeFileSync(out, png);
console.log(`wrote ${out.pathname} (${png.length} bytes)`);
