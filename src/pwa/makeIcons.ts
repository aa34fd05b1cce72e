/**
 * Writes the app icons (public/icons/*.png) with no external tool: a cross-section
 * of a case-hardened bar (a bright case ring around a darker core) on the app's
 * background. Run with `npx tsx src/pwa/makeIcons.ts` after changing the design.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { deflateSync } from 'node:zlib';

type Rgb = readonly [number, number, number];

const BACKGROUND: Rgb = [0x10, 0x14, 0x18];
const CASE: Rgb = [0xf5, 0xb8, 0x3d];
const CORE: Rgb = [0x5b, 0x66, 0x70];
const SUPERSAMPLE = 4;

/** Colour at a point (u, v in 0..1) of the design; `scale` shrinks it into the maskable safe zone. */
function shade(u: number, v: number, scale: number, rounded: boolean): Rgb | undefined {
  const x = (u - 0.5) / scale;
  const y = (v - 0.5) / scale;
  if (rounded) {
    // Rounded square outline of the whole tile (corner radius 22 % of the size).
    const r = 0.22;
    const dx = Math.max(Math.abs(u - 0.5) - (0.5 - r), 0);
    const dy = Math.max(Math.abs(v - 0.5) - (0.5 - r), 0);
    if (dx * dx + dy * dy > r * r) return undefined;
  }
  const d = Math.hypot(x, y);
  if (d <= 0.25) return CORE;
  if (d <= 0.36) return CASE;
  return BACKGROUND;
}

function crc32(bytes: Uint8Array): number {
  let c = ~0;
  for (const b of bytes) {
    c ^= b;
    for (let k = 0; k < 8; k++) c = (c >>> 1) ^ (0xedb88320 & -(c & 1));
  }
  return ~c >>> 0;
}

function chunk(type: string, data: Uint8Array): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'ascii');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])), 0);
  return Buffer.concat([head, data, crc]);
}

export function iconPng(size: number, { maskable }: { maskable: boolean }): Buffer {
  const raw = Buffer.alloc(size * (size * 4 + 1));
  const n = SUPERSAMPLE;
  for (let py = 0; py < size; py++) {
    raw[py * (size * 4 + 1)] = 0; // filter: none
    for (let px = 0; px < size; px++) {
      let r = 0,
        g = 0,
        b = 0,
        a = 0;
      for (let sy = 0; sy < n; sy++) {
        for (let sx = 0; sx < n; sx++) {
          const c = shade((px + (sx + 0.5) / n) / size, (py + (sy + 0.5) / n) / size, maskable ? 0.8 : 1, !maskable);
          if (!c) continue;
          r += c[0];
          g += c[1];
          b += c[2];
          a += 255;
        }
      }
      const count = n * n;
      const o = py * (size * 4 + 1) + 1 + px * 4;
      const covered = a / 255;
      raw[o] = covered ? Math.round(r / covered) : 0;
      raw[o + 1] = covered ? Math.round(g / covered) : 0;
      raw[o + 2] = covered ? Math.round(b / covered) : 0;
      raw[o + 3] = Math.round(a / count);
    }
  }
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0);
  ihdr.writeUInt32BE(size, 4);
  ihdr.writeUInt8(8, 8); // bit depth
  ihdr.writeUInt8(6, 9); // colour type RGBA
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([
    signature,
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(raw, { level: 9 })),
    chunk('IEND', new Uint8Array(0)),
  ]);
}

if (process.argv[1]?.endsWith('makeIcons.ts')) {
  const dir = new URL('../../public/icons/', import.meta.url);
  mkdirSync(dir, { recursive: true });
  writeFileSync(new URL('icon-192.png', dir), iconPng(192, { maskable: false }));
  writeFileSync(new URL('icon-512.png', dir), iconPng(512, { maskable: false }));
  writeFileSync(new URL('maskable-512.png', dir), iconPng(512, { maskable: true }));
  writeFileSync(new URL('apple-touch-180.png', dir), iconPng(180, { maskable: true }));
  console.log('icons written to public/icons/');
}
