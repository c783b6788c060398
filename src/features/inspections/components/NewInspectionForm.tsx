import { INSPECTION_ZONES, type InspectionCreate, type InspectionZone } from '@shared/inspections/schema';
import type { AssemblySummary } from '@shared/schemas/assembly';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { NamedOptions, Options } from '../../../components/ui/Options';
import { Select } from '../../../components/ui/Select';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage, isApiRequestError } from '../../../lib/api';

const ZONE_LABELS: Record<InspectionZone, string> = {
  field: 'Field zone (away from corners)',
  edge: 'Edge zone',
  corner: 'Corner zone',
};

/** New inspection: the assembly and its revision, the elevation, and a range of grid lines or a wind zone. */
export function NewInspectionForm({
  assemblies,
  onCreate,
  busy,
  error,
}: {
  assemblies: AssemblySummary[];
  onCreate: (input: InspectionCreate) => void;
  busy: boolean;
  error: unknown;
}) {
  const [assemblyId, setAssemblyId] = useState(assemblies[0]?.id ?? '');
  const assembly = assemblies.find((a) => a.id === assemblyId);
  const [revision, setRevision] = useState<number | null>(null);
  const [elevation, setElevation] = useState('');
  const [kind, setKind] = useState<'grid' | 'zone'>('grid');
  const [from, setFrom] = useState('');
  const [to, setTo] = useState('');
  const [zone, setZone] = useState<InspectionZone>('field');
  const fields = isApiRequestError(error) ? (error.fields ?? {}) : {};
  const current = assembly?.revision ?? 1;
  const revisions = Array.from({ length: current }, (_, i) => current - i);

  return (
    <form
      className="flex max-w-xl flex-col gap-5"
      onSubmit={(e) => {
        e.preventDefault();
        onCreate({
          assemblyId,
          revision: revision ?? current,
          elevation,
          area: kind === 'grid' ? { kind, from, to } : { kind, zone },
        });
      }}
    >
      {error ? <Notice tone="caution" live title={errorMessage(error)} /> : null}
      <Field label="Assembly" required error={fields.assemblyId}>
        {(p) => (
          <Select {...p} value={assemblyId} onChange={(e) => setAssemblyId(e.target.value)}>
            <NamedOptions items={assemblies} />
          </Select>
        )}
      </Field>
      <Field
        label="Revision"
        hint="The checklist is built from what this revision proved."
        error={fields.revision}
      >
        {(p) => (
          <Select {...p} value={revision ?? current} onChange={(e) => setRevision(Number(e.target.value))}>
            {revisions.map((r) => (
              <option key={r} value={r}>
                {r === current ? `Revision ${r} (current)` : `Revision ${r}`}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <Field
        label="Elevation"
        required
        hint="As the drawings name it, e.g. “North elevation”."
        error={fields.elevation}
      >
        {(p) => <TextInput {...p} value={elevation} onChange={(e) => setElevation(e.target.value)} />}
      </Field>
      <fieldset className="flex flex-col gap-3">
        <legend className="mb-1 text-sm font-semibold">Part of the wall</legend>
        <div className="flex flex-wrap gap-4">
          {(['grid', 'zone'] as const).map((k) => (
            <label key={k} className="flex min-h-11 items-center gap-2">
              <input
                type="radio"
                name="area-kind"
                className="h-5 w-5"
                checked={kind === k}
                onChange={() => setKind(k)}
              />
              {k === 'grid' ? 'Between grid lines' : 'A wind zone'}
            </label>
          ))}
        </div>
        {kind === 'grid' ? (
          <div className="grid grid-cols-2 gap-3">
            <Field label="From grid line" required error={fields['area.from']}>
              {(p) => <TextInput {...p} value={from} onChange={(e) => setFrom(e.target.value)} />}
            </Field>
            <Field label="To grid line" required error={fields['area.to']}>
              {(p) => <TextInput {...p} value={to} onChange={(e) => setTo(e.target.value)} />}
            </Field>
          </div>
        ) : (
          <Field label="Zone" error={fields['area.zone']}>
            {(p) => (
              <Select {...p} value={zone} onChange={(e) => setZone(e.target.value as InspectionZone)}>
                <Options values={INSPECTION_ZONES} labels={ZONE_LABELS} />
              </Select>
            )}
          </Field>
        )}
      </fieldset>
      <Button
        type="submit"
        variant="primary"
        className="min-h-12 w-full text-base sm:w-fit"
        busy={busy}
        busyLabel="Building the checklist…"
      >
        Create the inspection
      </Button>
    </form>
  );
}
