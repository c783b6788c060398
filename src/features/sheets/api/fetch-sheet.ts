import type { UnitSystem } from '@shared/units';
import { useEffect, useState } from 'react';
import { ApiRequestError, errorMessage } from '../../../lib/api';

export type SheetState =
  | { phase: 'producing' }
  | { phase: 'downloading'; loaded: number; total: number | null }
  | { phase: 'ready'; url: string; filename: string; code: string | null; size: number }
  | { phase: 'failed'; message: string };

/** `GET /api/check-runs/:runId/sheet.pdf`: reads the PDF as it arrives (progress) into a blob. */
async function fetchSheet(
  runId: string,
  units: UnitSystem,
  onProgress: (loaded: number, total: number | null) => void,
  signal: AbortSignal,
) {
  const res = await fetch(`/api/check-runs/${encodeURIComponent(runId)}/sheet.pdf?units=${units}`, {
    credentials: 'same-origin',
    signal,
  });
  if (!res.ok) {
    let message = `The sheet could not be produced (${res.status}).`;
    try {
      message = ((await res.json()) as { error: { message: string } }).error.message;
    } catch {
      // not JSON
    }
    throw new ApiRequestError(res.status, `http_${res.status}`, message);
  }
  const total = Number(res.headers.get('content-length')) || null;
  const chunks: Uint8Array[] = [];
  let loaded = 0;
  const reader = res.body?.getReader();
  if (reader)
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      chunks.push(value);
      loaded += value.length;
      onProgress(loaded, total);
    }
  else chunks.push(new Uint8Array(await res.arrayBuffer()));
  const disposition = res.headers.get('content-disposition') ?? '';
  return {
    blob: new Blob(chunks as BlobPart[], { type: 'application/pdf' }),
    filename: /filename="([^"]+)"/.exec(disposition)?.[1] ?? 'compliance-sheet.pdf',
    code: res.headers.get('x-verification-code'),
  };
}

/**
 * The compliance sheet of a run as an object URL for preview and download, with the phase it is in:
 * producing (the server renders it), downloading (bytes arriving), ready, or failed. The URL is revoked
 * when the run or units change and when the page goes.
 */
export function useSheetPdf(runId: string, units: UnitSystem, attempt = 0): SheetState {
  const [state, setState] = useState<SheetState>({ phase: 'producing' });
  // biome-ignore lint/correctness/useExhaustiveDependencies: `attempt` re-runs the request on purpose
  useEffect(() => {
    const controller = new AbortController();
    let url: string | null = null;
    setState({ phase: 'producing' });
    fetchSheet(
      runId,
      units,
      (loaded, total) => setState({ phase: 'downloading', loaded, total }),
      controller.signal,
    )
      .then(({ blob, filename, code }) => {
        url = URL.createObjectURL(blob);
        setState({ phase: 'ready', url, filename, code, size: blob.size });
      })
      .catch((e: unknown) => {
        if (e instanceof DOMException && e.name === 'AbortError') return;
        setState({ phase: 'failed', message: errorMessage(e) });
      });
    return () => {
      controller.abort();
      if (url) URL.revokeObjectURL(url);
    };
  }, [runId, units, attempt]);
  return state;
}
