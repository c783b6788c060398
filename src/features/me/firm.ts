import type { Me } from '@shared/schemas/me';

/**
 * The firm a page works in: the one named (the project's firm, `?org=`, the person's choice) when the person
 * belongs to it, else their first firm; undefined when they belong to none.
 */
export function firmOf(me: Me | null | undefined, id: string | null | undefined) {
  const orgs = me?.organisations ?? [];
  return orgs.find((o) => o.id === id) ?? orgs[0];
}
