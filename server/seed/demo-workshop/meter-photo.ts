import zlib from 'node:zlib';

/**
 * Demo content: a drawn "photo" of a meter showing a reading, for the seeded diagnoses to carry a step photo.
 * Drawn pixel by pixel and written as a PNG here (chunks and CRC per the PNG specification, ISO/IEC 15948;
 * the pixel data deflated with node's zlib), so no picture is taken from anywhere.
 */

type Rgb = readonly [number, number, number];

const WIDTH = 320;
const HEIGHT = 240;
const BENCH: Rgb = [43, 47, 51];
const BODY: Rgb = [217, 165, 33];
const LCD: Rgb = [184, 196, 168];
const INK: Rgb = [29, 35, 32];
const DIAL: Rgb = [52, 56, 60];
const RED_LEAD: Rgb = [196, 40, 36];
const BLACK_LEAD: Rgb = [18, 18, 18];

/** Lit segments of a seven-segment display, a to g clockwise from the top and g in the middle. */
const SEGMENTS: Readonly<Record<string, string>> = {
  '0': 'abcdef', '1': 'bc', '2': 'abged', '3': 'abgcd', '4': 'fgbc', '5': 'afgcd', '6': 'afgedc', '7': 'abc', '8': 'abcdefg', '9': 'abcdfg', '-': 'g', O: 'abcdef', L: 'fed',
};

/** A PNG of the meter with `display` (digits, '.', '-', 'O', 'L') on its screen. */
export function meterPhotoPng(display: string): Buffer {
  const px = new Uint8Array(WIDTH * HEIGHT * 3);
  const fill = (x0: number, y0: number, x1: number, y1: number, c: Rgb) => {
    for (let y = Math.max(0, Math.round(y0)); y < Math.min(HEIGHT, Math.round(y1)); y++) {
      for (let x = Math.max(0, Math.round(x0)); x < Math.min(WIDTH, Math.round(x1)); x++) px.set(c, (y * WIDTH + x) * 3);
    }
  };
  const disc = (cx: number, cy: number, r: number, c: Rgb) => {
    for (let y = cy - r; y <= cy + r; y++) for (let x = cx - r; x <= cx + r; x++) if ((x - cx) ** 2 + (y - cy) ** 2 <= r * r) fill(x, y, x + 1, y + 1, c);
  };
  fill(0, 0, WIDTH, HEIGHT, BENCH);
  fill(70, 16, 250, 232, BODY);
  fill(86, 32, 234, 108, INK);
  fill(90, 36, 230, 104, LCD);
  disc(160, 168, 36, DIAL);
  fill(157, 136, 163, 160, LCD);
  disc(112, 216, 7, BLACK_LEAD);
  disc(208, 216, 7, RED_LEAD);
  fill(108, 216, 116, HEIGHT, BLACK_LEAD);
  fill(204, 216, 212, HEIGHT, RED_LEAD);

  // Right-aligned on the screen, the way a meter shows its digits.
  const chars = [...display.toUpperCase()].filter((ch) => ch === '.' || SEGMENTS[ch] !== undefined).slice(0, 5);
  const widthOf = (ch: string) => (ch === '.' ? 10 : 28);
  let x = 224 - chars.reduce((w, ch) => w + widthOf(ch), 0);
  for (const ch of chars) {
    if (ch === '.') fill(x + 2, 90, x + 8, 96, INK);
    else drawDigit(fill, x, 44, SEGMENTS[ch]);
    x += widthOf(ch);
  }
  return encodePng(WIDTH, HEIGHT, px);
}

function drawDigit(fill: (x0: number, y0: number, x1: number, y1: number, c: Rgb) => void, x: number, y: number, lit: string) {
  const w = 20;
  const h = 48;
  const t = 5;
  const seg: Record<string, [number, number, number, number]> = {
    a: [x + t, y, x + w - t, y + t],
    b: [x + w - t, y + t, x + w, y + h / 2],
    c: [x + w - t, y + h / 2, x + w, y + h - t],
    d: [x + t, y + h - t, x + w - t, y + h],
    e: [x, y + h / 2, x + t, y + h - t],
    f: [x, y + t, x + t, y + h / 2],
    g: [x + t, y + h / 2 - t / 2, x + w - t, y + h / 2 + t / 2],
  };
  for (const s of lit) fill(...seg[s], INK);
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

/** CRC-32 as the PNG specification computes it over a chunk's type and data. */
export function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff;
  for (const b of bytes) c = CRC_TABLE[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function chunk(type: string, data: Uint8Array): Buffer {
  const out = Buffer.alloc(12 + data.length);
  out.writeUInt32BE(data.length, 0);
  out.write(type, 4, 'latin1');
  out.set(data, 8);
  out.writeUInt32BE(crc32(out.subarray(4, 8 + data.length)), 8 + data.length);
  return out;
}

/** 8-bit RGB, no interlace; every row with filter type 0 (none). */
export function encodePng(width: number, height: number, rgb: Uint8Array): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 2, 0, 0, 0], 8);
  const raw = Buffer.alloc(height * (1 + width * 3));
  for (let y = 0; y < height; y++) raw.set(rgb.subarray(y * width * 3, (y + 1) * width * 3), y * (1 + width * 3) + 1);
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', header), chunk('IDAT', zlib.deflateSync(raw)), chunk('IEND', new Uint8Array(0))]);
}
