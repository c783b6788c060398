import exifr from 'exifr';
import { describe, expect, it } from 'vitest';
import { dmsRationals, fitLongEdge, PHOTO_LONG_EDGE_PX, withGpsExif } from './photo-size';

describe('fitLongEdge — the size a photo is shrunk to', () => {
  it('brings the long edge to 2000 px and keeps the proportions (derived)', () => {
    // A 12 MP phone photo, 4032 × 3024 (4:3): scale 2000/4032 → 2000 × 1500.
    expect(fitLongEdge(4032, 3024)).toEqual({ width: 2000, height: 1500 });
    // Portrait (upright after EXIF orientation): the height is the long edge.
    expect(fitLongEdge(3024, 4032)).toEqual({ width: 1500, height: 2000 });
    // 16:9, 4000 × 2250 → 2000 × 1125.
    expect(fitLongEdge(4000, 2250, PHOTO_LONG_EDGE_PX)).toEqual({ width: 2000, height: 1125 });
  });

  it('never enlarges a photo that is already small enough', () => {
    expect(fitLongEdge(1600, 1200)).toEqual({ width: 1600, height: 1200 });
    expect(fitLongEdge(2000, 10)).toEqual({ width: 2000, height: 10 });
  });

  it('keeps a very thin photo at least 1 px across and refuses a size of nothing', () => {
    expect(fitLongEdge(40_000, 3)).toEqual({ width: 2000, height: 1 });
    expect(() => fitLongEdge(0, 100)).toThrow(RangeError);
    expect(() => fitLongEdge(Number.NaN, 100)).toThrow(RangeError);
  });
});

describe('withGpsExif — the position written back when the person keeps it', () => {
  // The smallest JPEG frame the Exif reader needs: start of image, end of image.
  const bare = new Uint8Array([0xff, 0xd8, 0xff, 0xd9]);

  it('writes degrees, minutes and seconds (derived: 51.5007° = 51° 30′ 2.52″)', () => {
    expect(dmsRationals(51.5007)).toEqual([
      [51, 1],
      [30, 1],
      [25_200, 10_000],
    ]);
  });

  it('is read back by an Exif reader (exifr) to within 0.1 m, in every quarter of the globe', async () => {
    for (const [latitude, longitude] of [
      [51.5007, -0.1246],
      [-33.8568, 151.2153],
      [40.6892, -74.0445],
    ]) {
      const jpeg = withGpsExif(bare, { latitude, longitude });
      expect([...jpeg.subarray(0, 4)]).toEqual([0xff, 0xd8, 0xff, 0xe1]);
      expect([...jpeg.subarray(-2)]).toEqual([0xff, 0xd9]);
      const gps = await exifr.gps(jpeg);
      // 1/10 000 of an arc second ≈ 3 mm on the ground.
      expect(gps?.latitude).toBeCloseTo(latitude, 6);
      expect(gps?.longitude).toBeCloseTo(longitude, 6);
    }
  });

  it('refuses what is not a JPEG', () => {
    expect(() =>
      withGpsExif(new Uint8Array([0x89, 0x50, 0x4e, 0x47]), { latitude: 0, longitude: 0 }),
    ).toThrow('not a JPEG');
  });
});
