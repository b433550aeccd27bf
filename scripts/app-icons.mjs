// Draws the installed app's icons (src/icons/*.png) from the same figure as src/favicon.svg: a hinge
// cup's ring between two screw holes, cream on the app's teal. Run `node scripts/app-icons.mjs` after
// changing the figure, and commit the PNGs.
import { mkdirSync, writeFileSync } from 'node:fs';
import { crc32, deflateSync } from 'node:zlib';

const teal = [0x0e, 0x6b, 0x66];
const cream = [0xfd, 0xf2, 0xe9];

/** Coverage (0..1) of the figure at a point of the favicon's 32 × 32 box. */
function figure(x, y) {
  const ring = Math.abs(Math.hypot(x - 16, y - 16) - 8.5) - 1.5;
  const holes = Math.min(Math.hypot(x - 16, y - 5.5), Math.hypot(x - 16, y - 26.5)) - 1.8;
  return Math.min(ring, holes);
}

/** Distance outside the favicon's rounded square (rx 6), negative inside. */
function roundedSquare(x, y) {
  const qx = Math.abs(x - 16) - 10;
  const qy = Math.abs(y - 16) - 10;
  return Math.hypot(Math.max(qx, 0), Math.max(qy, 0)) + Math.min(Math.max(qx, qy), 0) - 6;
}

/**
 * One icon, `size` pixels square. A maskable icon fills its square with teal and keeps the figure
 * inside the central 80 % circle the platforms may cut out (W3C Web App Manifest, "maskable").
 */
function draw(size, maskable) {
  const scale = maskable ? 0.62 : 1;
  const rows = [];
  const samples = 4;
  for (let py = 0; py < size; py++) {
    const row = Buffer.alloc(1 + size * 4);
    for (let px = 0; px < size; px++) {
      let inside = 0;
      let ink = 0;
      for (let s = 0; s < samples * samples; s++) {
        // The point in the favicon's box, the figure scaled about the centre for a maskable icon.
        const u = ((px + ((s % samples) + 0.5) / samples) / size) * 32;
        const v = ((py + (Math.floor(s / samples) + 0.5) / samples) / size) * 32;
        if (maskable || roundedSquare(u, v) <= 0) inside++;
        else continue;
        if (figure(16 + (u - 16) / scale, 16 + (v - 16) / scale) <= 0) ink++;
      }
      const a = inside / (samples * samples);
      const t = inside === 0 ? 0 : ink / inside;
      const o = 1 + px * 4;
      for (let c = 0; c < 3; c++) row[o + c] = Math.round(teal[c] + (cream[c] - teal[c]) * t);
      row[o + 3] = Math.round(a * 255);
    }
    rows.push(row);
  }
  return png(size, Buffer.concat(rows));
}

function chunk(type, data) {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'latin1');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])));
  return Buffer.concat([head, data, crc]);
}

/** An 8-bit RGBA PNG (ISO/IEC 15948) of scanlines that each start with filter type 0. */
function png(size, scanlines) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header.set([8, 6, 0, 0, 0], 8);
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk('IHDR', header), chunk('IDAT', deflateSync(scanlines, { level: 9 })), chunk('IEND', Buffer.alloc(0))]);
}

const dir = new URL('../src/icons/', import.meta.url);
mkdirSync(dir, { recursive: true });
for (const [name, size, maskable] of [
  ['icon-192.png', 192, false],
  ['icon-512.png', 512, false],
  ['icon-maskable-512.png', 512, true],
]) {
  writeFileSync(new URL(name, dir), draw(size, maskable));
}
