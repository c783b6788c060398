/** A firm's library list (server/routes/firm-library.ts: `materials`, `bridge-values`), or one entry of it. */
export const firmLibraryPath = (orgId: string, list: 'materials' | 'bridge-values', itemId?: string) =>
  `/api/organisations/${encodeURIComponent(orgId)}/${list}${itemId ? `/${encodeURIComponent(itemId)}` : ''}`;
