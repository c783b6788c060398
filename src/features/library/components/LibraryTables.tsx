import type { Material } from '@shared/calc/thermal/materials';
import type { BridgeValue, OrgMaterial } from '@shared/schemas/assembly';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { Table, Td, Th } from '../../../components/ui/Table';
import { errorMessage } from '../../../lib/api';
import { formatDate } from '../../../lib/format';
import { useUnitSystem } from '../../../lib/unit-system';
import { useDeleteBridgeValue } from '../api/delete-bridge-value';
import { useDeleteFirmMaterial } from '../api/delete-firm-material';
import { libraryNumber, libraryUnit } from '../units';

const CATEGORY_WORDS: Record<Material['category'], string> = {
  metal: 'metal',
  board: 'board',
  timber: 'timber',
  insulation: 'insulation',
  masonry: 'masonry',
  glass: 'glass',
  gas: 'gas',
  membrane: 'membrane',
};

const mu = (v: number | null) => (v === null ? '∞' : String(v));

/** The generic library, each value with the table it belongs to and how it was obtained. */
export function GenericMaterialsTable({ materials }: { materials: readonly Material[] }) {
  const system = useUnitSystem();
  return (
    <Table caption="Generic materials" captionHidden>
      <thead>
        <tr>
          <Th>Material</Th>
          <Th>Class</Th>
          <Th numeric>
            λ
            <span className="block text-xs font-normal text-ink-muted">
              {libraryUnit('conductivity', system)}
            </span>
          </Th>
          <Th numeric>
            ρ
            <span className="block text-xs font-normal text-ink-muted">{libraryUnit('density', system)}</span>
          </Th>
          <Th numeric>
            μ<span className="block text-xs font-normal text-ink-muted">dry / wet</span>
          </Th>
          <Th>Source and provenance</Th>
        </tr>
      </thead>
      <tbody>
        {materials.map((m) => {
          const unverified = m.provenance.startsWith('memory');
          return (
            <tr key={m.id}>
              <Td className="font-semibold">{m.name}</Td>
              <Td>{CATEGORY_WORDS[m.category]}</Td>
              <Td numeric>{libraryNumber(m.conductivity, 'conductivity', system)}</Td>
              <Td numeric>{libraryNumber(m.density, 'density', system)}</Td>
              <Td numeric className="whitespace-nowrap">
                {mu(m.mu.dry)} / {mu(m.mu.wet)}
              </Td>
              <Td className="text-xs">
                {m.source}
                <span className="mt-0.5 block">
                  {unverified ? (
                    <>
                      <span aria-hidden="true">▲ </span>
                      <span className="font-semibold">Not yet checked against the table:</span>{' '}
                    </>
                  ) : (
                    <span aria-hidden="true">✓ </span>
                  )}
                  <span className="text-ink-muted">{m.provenance}</span>
                </span>
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}

/** A two-step remove (firm administrators only). */
export function RemoveButton({
  what,
  onRemove,
  busy,
}: {
  what: string;
  onRemove: () => void;
  busy: boolean;
}) {
  const [confirming, setConfirming] = useState(false);
  if (!confirming)
    return (
      <Button
        variant="quiet"
        className="px-2 py-1"
        aria-label={`Remove ${what}…`}
        onClick={() => setConfirming(true)}
      >
        Remove…
      </Button>
    );
  return (
    <span className="flex flex-wrap gap-2">
      <Button
        variant="danger"
        className="px-2 py-1"
        busy={busy}
        busyLabel="Removing…"
        aria-label={`Remove ${what} for the whole firm`}
        onClick={onRemove}
      >
        Remove for the whole firm
      </Button>
      <Button variant="quiet" className="px-2 py-1" onClick={() => setConfirming(false)}>
        Keep
      </Button>
    </span>
  );
}

export function FirmMaterialsTable({
  orgId,
  materials,
  isAdmin,
}: {
  orgId: string;
  materials: readonly OrgMaterial[];
  isAdmin: boolean;
}) {
  const system = useUnitSystem();
  const del = useDeleteFirmMaterial();
  if (materials.length === 0) return <p className="text-ink-muted">No materials of the firm's own yet.</p>;
  return (
    <>
      <Table caption="The firm's materials" captionHidden>
        <thead>
          <tr>
            <Th>Material</Th>
            <Th numeric>
              λ
              <span className="block text-xs font-normal text-ink-muted">
                {libraryUnit('conductivity', system)}
              </span>
            </Th>
            <Th numeric>
              ρ
              <span className="block text-xs font-normal text-ink-muted">
                {libraryUnit('density', system)}
              </span>
            </Th>
            <Th numeric>μ</Th>
            <Th>Source</Th>
            <Th numeric>Added</Th>
            {isAdmin ? (
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {materials.map((m) => (
            <tr key={m.id}>
              <Td className="font-semibold">{m.name}</Td>
              <Td numeric>{libraryNumber(m.conductivity, 'conductivity', system)}</Td>
              <Td numeric>{libraryNumber(m.density, 'density', system)}</Td>
              <Td numeric>{m.vapourResistanceFactor ?? '—'}</Td>
              <Td className="text-xs">{m.source}</Td>
              <Td numeric className="whitespace-nowrap">
                {formatDate(m.createdAt)}
              </Td>
              {isAdmin ? (
                <Td>
                  <RemoveButton
                    what={m.name}
                    busy={del.isPending && del.variables?.itemId === m.id}
                    onRemove={() => del.mutate({ orgId, itemId: m.id })}
                  />
                </Td>
              ) : null}
            </tr>
          ))}
        </tbody>
      </Table>
      {del.isError ? <Notice tone="caution" title={errorMessage(del.error)} live /> : null}
    </>
  );
}

const SOURCE_WORDS: Record<BridgeValue['sourceType'], string> = {
  test_report: 'Test report',
  catalogue: 'Published catalogue',
  calculation: 'Calculation',
};

export function BridgeValuesTable({
  orgId,
  values,
  isAdmin,
}: {
  orgId: string;
  values: readonly BridgeValue[];
  isAdmin: boolean;
}) {
  const system = useUnitSystem();
  const del = useDeleteBridgeValue();
  if (values.length === 0) return <p className="text-ink-muted">No χ or ψ values of the firm's own yet.</p>;
  return (
    <>
      <Table caption="The firm's χ and ψ values" captionHidden>
        <thead>
          <tr>
            <Th>Clip, bracket, girt or rail</Th>
            <Th>Kind</Th>
            <Th numeric>Value</Th>
            <Th>Source</Th>
            <Th numeric>Added</Th>
            {isAdmin ? (
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {values.map((v) => {
            const measure = v.kind === 'point' ? 'chi' : 'psi';
            return (
              <tr key={v.id}>
                <Td className="font-semibold">
                  {v.name}
                  {v.notes ? (
                    <span className="block text-xs font-normal text-ink-muted">{v.notes}</span>
                  ) : null}
                </Td>
                <Td className="whitespace-nowrap">{v.kind === 'point' ? 'point, χ' : 'linear, ψ'}</Td>
                <Td numeric className="whitespace-nowrap">
                  {libraryNumber(v.value, measure, system)}{' '}
                  <span className="text-xs text-ink-muted">{libraryUnit(measure, system)}</span>
                </Td>
                <Td className="text-xs">
                  <span className="font-semibold">{SOURCE_WORDS[v.sourceType]}:</span> {v.source}
                </Td>
                <Td numeric className="whitespace-nowrap">
                  {formatDate(v.createdAt)}
                </Td>
                {isAdmin ? (
                  <Td>
                    <RemoveButton
                      what={v.name}
                      busy={del.isPending && del.variables?.itemId === v.id}
                      onRemove={() => del.mutate({ orgId, itemId: v.id })}
                    />
                  </Td>
                ) : null}
              </tr>
            );
          })}
        </tbody>
      </Table>
      {del.isError ? <Notice tone="caution" title={errorMessage(del.error)} live /> : null}
    </>
  );
}
