import type { AssemblyInput } from '@shared/schemas/assembly';
import type { SavedSweepSummary } from '@shared/schemas/sweeps';
import type { SweepParameter } from '@shared/sweep/schema';
import type { UnitSystem } from '@shared/units';
import { measureOf, newDraft, type ParameterDraft } from './draft';

/*
 * A saved sweep on the page: whether the assembly has changed since it ran, in words, and its parameters back in
 * the form.
 */

/** "Stale — the assembly changed since (revision 3 → 5)", or null while the sweep is of the current revision. */
export const staleText = (s: Pick<SavedSweepSummary, 'stale' | 'assemblyRevision' | 'currentRevision'>) =>
  s.stale
    ? `Stale — the assembly changed since (revision ${s.assemblyRevision} → ${s.currentRevision})`
    : null;

/** Where a parameter sits (its layer, bridge or joint), or null for a parameter of the whole wall. */
const targetOf = (p: SweepParameter): number | null =>
  'layer' in p ? p.layer : 'bridge' in p ? p.bridge : 'joint' in p ? (p.joint ?? null) : null;

/** A saved parameter as the form's draft: a range in SI, a list as text in the person's units. */
export function draftOf(a: AssemblyInput, p: SweepParameter, system: UnitSystem): ParameterDraft {
  const base = { ...newDraft(a, p.kind, targetOf(p)), target: targetOf(p) };
  if (p.kind === 'sealantClass') return { ...base, mode: 'list', classes: [...p.list] };
  if (p.kind === 'insulationProduct') return { ...base, products: [...p.products] };
  if (p.kind === 'clipChi' && p.entries) return { ...base, mode: 'entries', entries: [...p.entries] };
  if ('range' in p && p.range) return { ...base, mode: 'range', ...p.range };
  const measure = measureOf(p.kind);
  const list = 'list' in p ? (p.list ?? []) : [];
  return { ...base, mode: 'list', list: list.map((v) => measure.toText(v, system)).join(' ') };
}
