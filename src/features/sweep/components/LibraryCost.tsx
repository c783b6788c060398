import { canInFirm, type FirmRole } from '@shared/auth/permissions';
import type { SweepCost, SweepCostInput } from '@shared/schemas/sweeps';
import type { UnitSystem } from '@shared/units';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { Select } from '../../../components/ui/Select';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { useSaveSweepCost } from '../api/sweep-costs';
import {
  type CostDraft,
  type CostSlot,
  costBoxText,
  costUnit,
  entriesFor,
  slotClass,
  slotKind,
  slotSI,
  slotText,
  withSlot,
} from '../costs';

/** The firm whose library prices the sweep (the project's firm) and what the person may do in it. */
export interface FirmLibrary {
  orgId: string;
  firmName: string;
  /** The person's firm role; null when they are not a member (its library is not theirs to read). */
  role: FirmRole | null;
  entries: SweepCost[] | undefined;
}

/** Whether a typed SI cost is the entry's (within rounding of the box's six figures). */
const same = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(b));

/**
 * Under one cost box: which library entry it came from (a choice when the firm has several), and for the
 * firm's editors and administrators a way to save what is typed to the library — a change of that entry, or a
 * new entry with a name and a currency.
 */
export function LibraryCost({
  slot,
  label,
  library,
  draft,
  onDraft,
  system,
}: {
  slot: CostSlot;
  label: string;
  library: FirmLibrary;
  draft: CostDraft;
  onDraft: (d: CostDraft) => void;
  system: UnitSystem;
}) {
  const kind = slotKind(slot);
  const entries = library.entries ? entriesFor(library.entries, slot) : [];
  const entry = entries.find((e) => e.id === draft.from[slot]);
  const si = slotSI(draft, slot, system);
  const mayWrite = canInFirm(library.role, 'firm.write');
  const save = useSaveSweepCost();
  const [adding, setAdding] = useState(false);
  const [name, setName] = useState('');
  const [currency, setCurrency] = useState(library.entries?.[0]?.currency ?? '');

  const store = async ({ name, currency, source, notes }: Omit<SweepCostInput, 'kind' | 'cost'>) => {
    if (si === undefined) return;
    try {
      const saved = await save.mutateAsync({
        orgId: library.orgId,
        input: { kind, cost: si, movementClass: slotClass(slot), name, currency, source, notes },
        existing: entry,
      });
      setAdding(false);
      onDraft(withSlot(draft, slot, slotText(draft, slot), saved.id));
    } catch {
      // shown below
    }
  };

  return (
    <div className="flex min-w-0 flex-col gap-1 text-sm">
      {entries.length > 1 ? (
        <Select
          aria-label={`${label}: library entry`}
          className="py-1 text-sm"
          value={entry?.id ?? ''}
          onChange={(e) => {
            const picked = entries.find((x) => x.id === e.target.value);
            onDraft(
              picked
                ? withSlot(draft, slot, costBoxText(picked.cost, kind, system), picked.id)
                : withSlot(draft, slot, slotText(draft, slot), ''),
            );
          }}
        >
          <option value="">— typed here —</option>
          {entries.map((x) => (
            <option key={x.id} value={x.id}>
              {x.name}: {costBoxText(x.cost, kind, system)} {x.currency}
            </option>
          ))}
        </Select>
      ) : entry ? (
        <span className="text-ink-muted">
          From the library: {entry.name} ({entry.currency}
          {entry.source ? `; ${entry.source}` : ''})
        </span>
      ) : null}
      {mayWrite && si !== undefined && entry && !same(si, entry.cost) ? (
        <Button
          variant="quiet"
          className="self-start px-2 py-1"
          busy={save.isPending}
          busyLabel="Saving…"
          onClick={() => void store(entry)}
        >
          Save to the library as “{entry.name}”
        </Button>
      ) : null}
      {mayWrite && si !== undefined && !entry && !adding ? (
        <Button variant="quiet" className="self-start px-2 py-1" onClick={() => setAdding(true)}>
          Save to the firm library…
          <span className="sr-only"> — {label}</span>
        </Button>
      ) : null}
      {adding && si !== undefined ? (
        <form
          className="flex flex-col gap-2 border-l-2 border-rule pl-2"
          aria-label={`Save ${label.toLowerCase()} to the library of ${library.firmName}`}
          onSubmit={(e) => {
            e.preventDefault();
            void store({
              name: name.trim(),
              currency: currency.trim().toUpperCase(),
              source: 'Typed on the sweep page',
              notes: '',
            });
          }}
        >
          <Field label="Product name">
            {(c) => (
              <TextInput {...c} value={name} maxLength={200} onChange={(e) => setName(e.target.value)} />
            )}
          </Field>
          <Field label="Currency" hint="Three letters: EUR, GBP, USD…">
            {(c) => (
              <TextInput
                {...c}
                value={currency}
                maxLength={3}
                autoCapitalize="characters"
                onChange={(e) => setCurrency(e.target.value)}
              />
            )}
          </Field>
          <p className="text-ink-muted">
            Saved as {costBoxText(si, kind, 'SI')} {costUnit(kind, 'SI')}.
          </p>
          <div className="flex flex-wrap gap-2">
            <Button
              type="submit"
              variant="primary"
              className="px-2 py-1"
              busy={save.isPending}
              busyLabel="Saving…"
              disabled={name.trim() === ''}
            >
              Save to the library
            </Button>
            <Button variant="quiet" className="px-2 py-1" onClick={() => setAdding(false)}>
              Cancel
            </Button>
          </div>
        </form>
      ) : null}
      {save.error ? <Notice tone="caution" title={errorMessage(save.error)} live /> : null}
      {save.isSuccess && !adding ? (
        <span role="status">Saved to the library of {library.firmName}.</span>
      ) : null}
    </div>
  );
}
