import { fitLongEdge, PHOTO_LONG_EDGE_PX, withGpsExif } from './photo-size';

/*
 * A photo from the phone's camera, made small on the device before it is kept or sent: the browser decodes it
 * upright (EXIF orientation applied by createImageBitmap), draws it at most PHOTO_LONG_EDGE_PX on its long edge
 * and encodes a new JPEG — which carries no metadata at all, so the location is gone. When the person ticks
 * "keep location", the GPS position read from the original (exifr) is written back into the new JPEG alone.
 */

const JPEG_QUALITY = 0.85;

export interface GpsPosition {
  latitude: number;
  longitude: number;
}

/** The GPS position of a photo, or null when it has none (or it cannot be read). */
export async function photoPosition(file: Blob): Promise<GpsPosition | null> {
  const { gps } = await import('exifr');
  const p = await gps(file).catch(() => undefined);
  return p && Number.isFinite(p.latitude) && Number.isFinite(p.longitude)
    ? { latitude: p.latitude, longitude: p.longitude }
    : null;
}

/** The photo as a JPEG of at most PHOTO_LONG_EDGE_PX on its long edge, upright, without metadata (or only GPS). */
export async function shrinkPhoto(file: File, { keepLocation }: { keepLocation: boolean }): Promise<File> {
  const bitmap = await createImageBitmap(file, { imageOrientation: 'from-image' });
  const size = fitLongEdge(bitmap.width, bitmap.height, PHOTO_LONG_EDGE_PX);
  const canvas = document.createElement('canvas');
  canvas.width = size.width;
  canvas.height = size.height;
  const context = canvas.getContext('2d');
  if (!context) throw new Error('This browser cannot draw the photo to make it smaller.');
  context.imageSmoothingQuality = 'high';
  context.drawImage(bitmap, 0, 0, size.width, size.height);
  bitmap.close();
  const blob = await new Promise<Blob>((resolve, reject) =>
    canvas.toBlob(
      (b) => (b ? resolve(b) : reject(new Error('The photo could not be encoded.'))),
      'image/jpeg',
      JPEG_QUALITY,
    ),
  );
  const position = keepLocation ? await photoPosition(file) : null;
  const bytes = new Uint8Array(await blob.arrayBuffer());
  const out = position ? withGpsExif(bytes, position) : bytes;
  const name = `${file.name.replace(/\.[^.]*$/, '') || 'photo'}.jpg`;
  return new File([out], name, { type: 'image/jpeg' });
}
