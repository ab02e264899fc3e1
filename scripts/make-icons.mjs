// Draws the Protolyte icons (our own design: a droplet over a three-band acid/neutral/base scale on a
// slate-teal tile) and writes them as PNG at the sizes Office asks for. Generated files:
// assets/icon-{16,32,64,80,128}.png. Run: node scripts/make-icons.mjs
import { deflateSync } from "node:zlib";
import { writeFileSync, mkdirSync } from "node:fs";

const SIZES = [16, 32, 64, 80, 128];
const SS = 4; // supersampling per axis

function crc32(buf) {
  let c, crc = 0xffffffff;
  for (let n = 0; n < buf.length; n++) {
    c = (crc ^ buf[n]) & 0xff;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    crc = (crc >>> 8) ^ c;
  }
  return (crc ^ 0xffffffff) >>> 0;
}
function chunk(type, data) {
  const len = Buffer.alloc(4); len.writeUInt32BE(data.length);
  const td = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4); crc.writeUInt32BE(crc32(td));
  return Buffer.concat([len, td, crc]);
}
function png(size, rgba) {
  const raw = Buffer.alloc((size * 4 + 1) * size);
  for (let y = 0; y < size; y++) {
    raw[y * (size * 4 + 1)] = 0;
    rgba.copy(raw, y * (size * 4 + 1) + 1, y * size * 4, (y + 1) * size * 4);
  }
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0); ihdr.writeUInt32BE(size, 4);
  ihdr[8] = 8; ihdr[9] = 6; ihdr[10] = 0; ihdr[11] = 0; ihdr[12] = 0;
  return Buffer.concat([Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]), chunk("IHDR", ihdr), chunk("IDAT", deflateSync(raw)), chunk("IEND", Buffer.alloc(0))]);
}

// Colour of the unit square at (u, v) in [0,1]², or null for transparent.
function shade(u, v) {
  const r = 0.18; // tile corner radius
  const cx = Math.min(Math.max(u, r), 1 - r), cy = Math.min(Math.max(v, r), 1 - r);
  if ((u - cx) ** 2 + (v - cy) ** 2 > r * r) return null;
  // droplet: circle at (0.5, 0.52) radius 0.22 plus a cone up to the tip at (0.5, 0.14)
  const dx = u - 0.5, dy = v - 0.52, R = 0.22;
  const inCircle = dx * dx + dy * dy <= R * R;
  const tipY = 0.14;
  const t = (v - tipY) / (0.52 - tipY);
  const inCone = v >= tipY && v <= 0.52 && Math.abs(dx) <= Math.max(0, t) * R * 0.98;
  if (inCircle || inCone) {
    // a wave line across the drop
    const wave = 0.6 + 0.03 * Math.sin((u - 0.28) * 2 * Math.PI * 2.2);
    return v > wave ? [198, 236, 240] : [255, 255, 255];
  }
  // scale bar along the bottom: acid / neutral / base
  if (v > 0.82 && v < 0.9 && u > 0.16 && u < 0.84) {
    if (u < 0.3867) return [222, 96, 72];
    if (u < 0.6133) return [120, 190, 110];
    return [84, 120, 214];
  }
  return [18, 78, 102];
}

mkdirSync("assets", { recursive: true });
for (const size of SIZES) {
  const buf = Buffer.alloc(size * size * 4);
  for (let y = 0; y < size; y++) for (let x = 0; x < size; x++) {
    let r = 0, g = 0, b = 0, a = 0;
    for (let sy = 0; sy < SS; sy++) for (let sx = 0; sx < SS; sx++) {
      const c = shade((x + (sx + 0.5) / SS) / size, (y + (sy + 0.5) / SS) / size);
      if (c) { r += c[0]; g += c[1]; b += c[2]; a += 1; }
    }
    const i = (y * size + x) * 4;
    if (a > 0) { buf[i] = Math.round(r / a); buf[i + 1] = Math.round(g / a); buf[i + 2] = Math.round(b / a); }
    buf[i + 3] = Math.round((255 * a) / (SS * SS));
  }
  writeFileSync(`assets/icon-${size}.png`, png(size, buf));
}
console.log(`wrote ${SIZES.map((s) => `assets/icon-${s}.png`).join(", ")}`);
