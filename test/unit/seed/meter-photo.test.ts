import zlib from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { crc32, encodePng, meterPhotoPng } from '@server/seed/demo-workshop/meter-photo';

/** The drawn demo photo: a well-formed PNG by the PNG specification (ISO/IEC 15948). */

describe('crc32', () => {
  it('gives the check value of the specification’s CRC-32: "123456789" → CBF43926', () => {
    expect(crc32(new TextEncoder().encode('123456789')).toString(16)).toBe('cbf43926');
  });
});

describe('encodePng', () => {
  it('writes the signature, an RGB header, the rows deflated with filter 0, and the IEND chunk every PNG ends with', () => {
    const png = encodePng(2, 1, new Uint8Array([255, 0, 0, 0, 0, 255]));
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(png.subarray(12, 16).toString('latin1')).toBe('IHDR');
    expect([png.readUInt32BE(16), png.readUInt32BE(20), png[24], png[25]]).toEqual([2, 1, 8, 2]);
    // An empty IEND chunk is always 00000000 49454E44 AE426082.
    expect(png.subarray(-12).toString('hex')).toBe('0000000049454e44ae426082');
    const idatLength = png.readUInt32BE(33);
    expect(png.subarray(37, 41).toString('latin1')).toBe('IDAT');
    expect([...zlib.inflateSync(png.subarray(41, 41 + idatLength))]).toEqual([0, 255, 0, 0, 0, 0, 255]);
  });
});

describe('meterPhotoPng', () => {
  it('draws the same picture for the same reading and another for another', () => {
    expect(meterPhotoPng('12.41').equals(meterPhotoPng('12.41'))).toBe(true);
    expect(meterPhotoPng('12.41').equals(meterPhotoPng('0.8'))).toBe(false);
  });
});
