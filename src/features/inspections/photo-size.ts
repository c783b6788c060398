/*
 * The arithmetic of shrinking a photo and of writing its GPS position back (pure, tested in photo-size.test.ts).
 */

/** Long edge of a photo as kept and sent: about 2000 px, plenty to read a fastener head or a bead. */
export const PHOTO_LONG_EDGE_PX = 2000;

/** The size that fits `longEdge` on the longer side, keeping the proportions; never larger than the original. */
export function fitLongEdge(width: number, height: number, longEdge = PHOTO_LONG_EDGE_PX) {
  if (!(width >= 1 && height >= 1 && longEdge >= 1))
    throw new RangeError('a photo has a size of at least 1 px');
  const scale = Math.min(1, longEdge / Math.max(width, height));
  return { width: Math.max(1, Math.round(width * scale)), height: Math.max(1, Math.round(height * scale)) };
}

/** Degrees as degrees, minutes and seconds (the seconds to 1/10 000), each a rational num/den. */
export function dmsRationals(degrees: number): [number, number][] {
  const abs = Math.abs(degrees);
  const d = Math.floor(abs);
  const m = Math.floor((abs - d) * 60);
  const s = Math.round(((abs - d) * 60 - m) * 60 * 10_000);
  return [
    [d, 1],
    [m, 1],
    [s, 10_000],
  ];
}

/**
 * A JPEG with an Exif APP1 segment that holds only the GPS position, inserted after the start-of-image marker
 * (Exif 2.32 (CIPA DC-008-2019) §4.5, §4.6.6: IFD0 with the GPSInfo pointer, tag 0x8825; the GPS IFD with
 * GPSVersionID 2.3.0.0, GPSLatitudeRef/GPSLatitude, GPSLongitudeRef/GPSLongitude as three RATIONALs).
 * Big-endian TIFF ("MM").
 */
export function withGpsExif(
  jpeg: Uint8Array,
  { latitude, longitude }: { latitude: number; longitude: number },
) {
  if (jpeg[0] !== 0xff || jpeg[1] !== 0xd8) throw new Error('not a JPEG');
  const tiff = new DataView(new ArrayBuffer(140));
  let at = 0;
  const u16 = (v: number) => {
    tiff.setUint16(at, v);
    at += 2;
  };
  const u32 = (v: number) => {
    tiff.setUint32(at, v);
    at += 4;
  };
  const entry = (tag: number, type: number, count: number, value: () => void) => {
    u16(tag);
    u16(type);
    u32(count);
    const end = at + 4;
    value();
    at = end;
  };
  const ascii = (c: string) => () => {
    tiff.setUint8(at, c.charCodeAt(0));
  };
  u16(0x4d4d); // "MM"
  u16(42);
  u32(8); // IFD0 at 8
  u16(1); // IFD0: one entry
  entry(0x8825, 4, 1, () => u32(26)); // GPSInfo → the GPS IFD at 8 + 2 + 12 + 4 = 26
  u32(0); // no next IFD
  u16(5); // GPS IFD: five entries, its values at 26 + 2 + 5 × 12 + 4 = 92
  entry(0x0000, 1, 4, () => tiff.setUint32(at, 0x02030000)); // GPSVersionID bytes 2, 3, 0, 0
  entry(0x0001, 2, 2, ascii(latitude < 0 ? 'S' : 'N'));
  entry(0x0002, 5, 3, () => u32(92));
  entry(0x0003, 2, 2, ascii(longitude < 0 ? 'W' : 'E'));
  entry(0x0004, 5, 3, () => u32(116));
  u32(0);
  for (const [num, den] of [...dmsRationals(latitude), ...dmsRationals(longitude)]) {
    u32(num);
    u32(den);
  }
  const header = [0x45, 0x78, 0x69, 0x66, 0, 0]; // "Exif\0\0"
  const length = 2 + header.length + tiff.byteLength; // the length field counts itself
  const out = new Uint8Array(jpeg.length + 2 + length);
  out.set([0xff, 0xd8, 0xff, 0xe1, length >> 8, length & 0xff, ...header], 0);
  out.set(new Uint8Array(tiff.buffer), 12);
  out.set(jpeg.subarray(2), 12 + tiff.byteLength);
  return out;
}
