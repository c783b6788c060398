/** One column of a comparison: an assembly at its current revision (`revision: null`) or at a saved one. */
export interface CompareItem {
  assemblyId: string;
  revision: number | null;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * `?ids=a,b,c&rev=,3,` — `rev` is aligned with `ids` (empty = current). `a@3` inside `ids` is accepted
 * too. Unknown or malformed entries are dropped rather than guessed.
 */
export function parseCompareParams(params: URLSearchParams): CompareItem[] {
  const ids = (params.get('ids') ?? '').split(',').map((s) => s.trim());
  const revs = (params.get('rev') ?? '').split(',').map((s) => s.trim());
  const items: CompareItem[] = [];
  ids.forEach((raw, i) => {
    const [id, at] = raw.split('@') as [string, string | undefined];
    if (!UUID.test(id)) return;
    const text = at ?? revs[i] ?? '';
    const n = Number(text);
    items.push({ assemblyId: id, revision: text !== '' && Number.isInteger(n) && n > 0 ? n : null });
  });
  return items;
}

export function compareSearch(items: readonly CompareItem[]): string {
  const ids = items.map((i) => i.assemblyId).join(',');
  const revs = items.map((i) => (i.revision === null ? '' : String(i.revision)));
  return revs.some((r) => r !== '') ? `?ids=${ids}&rev=${revs.join(',')}` : `?ids=${ids}`;
}
