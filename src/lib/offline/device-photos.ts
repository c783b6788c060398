import { del, get, set, type UseStore } from 'idb-keyval';
import { deviceStores } from './device-cache';

/*
 * Photos taken with no signal wait here until their upload is sent; the queued upload names its photo by key.
 * Stored as bytes with their type (a Blob does not survive every IndexedDB implementation's copy).
 */

interface StoredPhoto {
  name: string;
  type: string;
  bytes: ArrayBuffer;
}

const photoStore = (): UseStore => deviceStores().photos;

/** A fresh key for a photo kept on the device. */
export const newPhotoKey = () => `photo-${crypto.randomUUID()}`;

export async function keepPhoto(key: string, file: File, store = photoStore()): Promise<void> {
  const photo: StoredPhoto = { name: file.name, type: file.type, bytes: await file.arrayBuffer() };
  await set(key, photo, store);
}

/** The photo kept under `key`, or undefined when there is none (sent already, or cleared). */
export async function keptPhoto(key: string, store = photoStore()): Promise<File | undefined> {
  const photo = await get<StoredPhoto>(key, store);
  return photo ? new File([photo.bytes], photo.name, { type: photo.type }) : undefined;
}

export const forgetPhoto = (key: string, store = photoStore()) => del(key, store);
