// PNG ink counter for the workbench screenshots (decodes with zlib, no image library); the same decoder as
// tests/report/svgChromium.test.ts, which imports it from here.
import { inflateSync } from "node:zlib";
import { expect } from "vitest";

/** Counts pixels that are not near-white in an 8-bit RGB/RGBA PNG, decoding it with zlib (no image library). */
export function countInkPixels(png: Buffer): { ink: number; total: number } {
  expect(png.subarray(1, 4).toString("latin1")).toBe("PNG");
  let offset = 8;
  let width = 0;
  let height = 0;
  let colorType = 0;
  const idat: Buffer[] = [];
  while (offset < png.length) {
    const length = png.readUInt32BE(offset);
    const type = png.subarray(offset + 4, offset + 8).toString("latin1");
    const data = png.subarray(offset + 8, offset + 8 + length);
    if (type === "IHDR") {
      width = data.readUInt32BE(0);
      height = data.readUInt32BE(4);
      expect(data[8]).toBe(8); // bit depth
      colorType = data[9]!;
      expect(data[12]).toBe(0); // no interlace
    } else if (type === "IDAT") idat.push(data);
    offset += 12 + length;
  }
  const channels = colorType === 6 ? 4 : colorType === 2 ? 3 : 0;
  expect(channels).toBeGreaterThan(0);
  const raw = inflateSync(Buffer.concat(idat));
  const stride = width * channels;
  const previous = new Uint8Array(stride);
  const current = new Uint8Array(stride);
  let ink = 0;
  for (let y = 0; y < height; y++) {
    const base = y * (stride + 1);
    const filter = raw[base]!;
    for (let i = 0; i < stride; i++) {
      const value = raw[base + 1 + i]!;
      const left = i >= channels ? current[i - channels]! : 0;
      const up = previous[i]!;
      const upLeft = i >= channels ? previous[i - channels]! : 0;
      let out: number;
      switch (filter) {
        case 0: out = value; break;
        case 1: out = value + left; break;
        case 2: out = value + up; break;
        case 3: out = value + ((left + up) >> 1); break;
        case 4: {
          const p = left + up - upLeft;
          const pa = Math.abs(p - left);
          const pb = Math.abs(p - up);
          const pc = Math.abs(p - upLeft);
          out = value + (pa <= pb && pa <= pc ? left : pb <= pc ? up : upLeft);
          break;
        }
        default: throw new Error(`bad PNG filter ${filter}`);
      }
      current[i] = out & 0xff;
    }
    for (let x = 0; x < width; x++) {
      const r = current[x * channels]!;
      const g = current[x * channels + 1]!;
      const b = current[x * channels + 2]!;
      if (r < 200 || g < 200 || b < 200) ink++;
    }
    previous.set(current);
  }
  return { ink, total: width * height };
}
