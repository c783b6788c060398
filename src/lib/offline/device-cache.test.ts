import 'fake-indexeddb/auto';
import { MutationObserver, onlineManager, QueryClient } from '@tanstack/react-query';
import { createStore, get } from 'idb-keyval';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { asPaused, createDevicePersister, isKeptOffline, startDeviceCache } from './device-cache';
import { forgetPhoto, keepPhoto, keptPhoto } from './device-photos';

/*
 * The device cache in IndexedDB (fake-indexeddb): a mutation made with no signal is saved, survives a "reload"
 * (a new QueryClient on the same store) and is sent, by its registered function, once the device is online.
 */

let n = 0;
const freshStore = () => createStore(`device-cache-test-${++n}`, 'query-client');
const settle = () => new Promise((r) => setTimeout(r, 250)); // > the persister's 100 ms throttle

afterEach(() => onlineManager.setOnline(true));

function appClient(send: (v: { itemId: string }, context: unknown) => Promise<unknown>) {
  const qc = new QueryClient();
  qc.setMutationDefaults(['inspections', 'answer'], { mutationFn: send });
  return qc;
}

describe('the queue kept on the device', () => {
  it('keeps an answer made offline across a reload and sends it when the connection returns', async () => {
    const store = freshStore();
    onlineManager.setOnline(false);

    // First visit: the answer is made with no signal — it waits (paused) and is saved.
    const firstSend = vi.fn(async () => ({ ok: true }));
    const first = appClient(firstSend);
    await startDeviceCache(first, [['inspections']], createDevicePersister(store));
    const observer = new MutationObserver<unknown, Error, { itemId: string }>(first, {
      mutationKey: ['inspections', 'answer', 'x'],
    });
    void observer.mutate({ itemId: 'item-1' }).catch(() => undefined);
    await settle();
    expect(firstSend).not.toHaveBeenCalled();
    expect(first.getMutationCache().getAll()[0]?.state.isPaused).toBe(true);
    const saved = JSON.parse((await get<string>('skinwright-query-client', store)) ?? '{}');
    expect(saved.clientState.mutations).toHaveLength(1);

    // Reload: a new client restores it from the device, still offline — nothing is sent yet.
    const secondSend = vi.fn(async (_v: { itemId: string }, _context: unknown) => ({ ok: true }));
    const second = appClient(secondSend);
    await startDeviceCache(second, [['inspections']], createDevicePersister(store));
    const restored = second.getMutationCache().getAll();
    expect(restored).toHaveLength(1);
    expect(restored[0]?.state.variables).toEqual({ itemId: 'item-1' });
    expect(secondSend).not.toHaveBeenCalled();

    // Online again: the restored mutation runs the registered function with what was answered.
    onlineManager.setOnline(true);
    await second.resumePausedMutations();
    expect(secondSend).toHaveBeenCalledTimes(1);
    expect(secondSend).toHaveBeenCalledWith({ itemId: 'item-1' }, expect.anything());
    await settle();
    const after = JSON.parse((await get<string>('skinwright-query-client', store)) ?? '{}');
    expect(after.clientState.mutations).toHaveLength(0);
  });

  it('saves a mutation caught on its way as paused, so that it is sent again after a restore', () => {
    const client = {
      timestamp: 1,
      buster: 'b',
      clientState: {
        queries: [],
        mutations: [
          {
            mutationKey: ['inspections', 'answer'],
            state: {
              context: undefined,
              data: undefined,
              error: null,
              failureCount: 0,
              failureReason: null,
              isPaused: false,
              status: 'pending' as const,
              variables: { itemId: 'a' },
              submittedAt: 1,
            },
          },
        ],
      },
    };
    expect(asPaused(client).clientState.mutations[0]?.state.isPaused).toBe(true);
  });

  it('keeps only successful queries under the named roots', () => {
    const keep = isKeptOffline(['inspections', 'me']);
    const q = (key: string, status: 'success' | 'error') =>
      ({ queryKey: [key, 'detail'], state: { status } }) as unknown as Parameters<typeof keep>[0];
    expect(keep(q('inspections', 'success'))).toBe(true);
    expect(keep(q('me', 'success'))).toBe(true);
    expect(keep(q('inspections', 'error'))).toBe(false);
    expect(keep(q('assemblies', 'success'))).toBe(false);
  });

  it('restores queries of the kept roots with their data, and drops what was saved under another buster', async () => {
    const store = freshStore();
    const first = new QueryClient();
    await startDeviceCache(first, [['inspections']], createDevicePersister(store));
    first.setQueryData(['inspections', 'detail', 'i1'], { title: 'North elevation' });
    first.setQueryData(['assemblies', 'detail', 'a1'], { name: 'not kept' });
    await settle();
    const second = new QueryClient();
    await startDeviceCache(second, [['inspections']], createDevicePersister(store));
    expect(second.getQueryData(['inspections', 'detail', 'i1'])).toEqual({ title: 'North elevation' });
    expect(second.getQueryData(['assemblies', 'detail', 'a1'])).toBeUndefined();
    // Shown at once, never taken as fresh: a page that uses it fetches it again (a change made elsewhere shows).
    expect(second.getQueryState(['inspections', 'detail', 'i1'])?.isInvalidated).toBe(true);
  });
});

describe('photos kept on the device', () => {
  it('keeps the bytes, type and name of a photo until it is forgotten', async () => {
    const store = createStore('device-photos-test', 'photos');
    const file = new File([new Uint8Array([0xff, 0xd8, 1, 2, 3, 0xff, 0xd9])], 'girt.jpg', {
      type: 'image/jpeg',
    });
    await keepPhoto('p1', file, store);
    const back = await keptPhoto('p1', store);
    expect(back?.name).toBe('girt.jpg');
    expect(back?.type).toBe('image/jpeg');
    expect([...new Uint8Array((await back?.arrayBuffer()) ?? new ArrayBuffer(0))]).toEqual([
      0xff, 0xd8, 1, 2, 3, 0xff, 0xd9,
    ]);
    await forgetPhoto('p1', store);
    expect(await keptPhoto('p1', store)).toBeUndefined();
  });
});
