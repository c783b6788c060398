import { GENERIC_MATERIAL_NOTE, type Material } from '@shared/calc/thermal/materials';
import type { BridgeValue, OrgMaterial } from '@shared/schemas/assembly';
import { useUnitSystem } from '../../../lib/unit-system';
import { useDeleteBridgeValue, useDeleteFirmMaterial } from '../api/firm-lists';
import { libraryNumber, libraryUnit } from '../units';
import {
  addedColumn,
  type Column,
  FirmTable,
  LibraryTable,
  measureColumn,
  nameColumn,
  removalOf,
} from './LibraryTable';

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
  const columns: Column<Material>[] = [
    nameColumn('Material'),
    { header: 'Class', cell: (m) => CATEGORY_WORDS[m.category] },
    measureColumn('λ', 'conductivity', system, (m) => m.conductivity),
    measureColumn('ρ', 'density', system, (m) => m.density),
    {
      header: 'μ',
      unit: 'dry / wet',
      numeric: true,
      className: 'whitespace-nowrap',
      cell: (m) => (
        <>
          {mu(m.mu.dry)} / {mu(m.mu.wet)}
        </>
      ),
    },
    {
      header: 'Source',
      className: 'text-xs',
      cell: (m) => (
        <>
          {m.source}
          <span className="mt-0.5 block text-ink-muted">{GENERIC_MATERIAL_NOTE}.</span>
        </>
      ),
    },
  ];
  return <LibraryTable caption="Generic materials" columns={columns} rows={materials} />;
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
  const columns: Column<OrgMaterial>[] = [
    nameColumn('Material'),
    measureColumn('λ', 'conductivity', system, (m) => m.conductivity),
    measureColumn('ρ', 'density', system, (m) => m.density),
    { header: 'μ', numeric: true, cell: (m) => m.vapourResistanceFactor ?? '—' },
    { header: 'Source', className: 'text-xs', cell: (m) => m.source },
    addedColumn(),
  ];
  return (
    <FirmTable
      caption="The firm's materials"
      columns={columns}
      rows={materials}
      empty="No materials of the firm's own yet."
      isAdmin={isAdmin}
      removal={removalOf(del, orgId, 'itemId')}
    />
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
  const measure = (v: BridgeValue) => (v.kind === 'point' ? 'chi' : 'psi');
  const columns: Column<BridgeValue>[] = [
    nameColumn('Clip, bracket, girt or rail'),
    {
      header: 'Kind',
      className: 'whitespace-nowrap',
      cell: (v) => (v.kind === 'point' ? 'point, χ' : 'linear, ψ'),
    },
    {
      header: 'Value',
      numeric: true,
      className: 'whitespace-nowrap',
      cell: (v) => (
        <>
          {libraryNumber(v.value, measure(v), system)}{' '}
          <span className="text-xs text-ink-muted">{libraryUnit(measure(v), system)}</span>
        </>
      ),
    },
    {
      header: 'Source',
      className: 'text-xs',
      cell: (v) => (
        <>
          <span className="font-semibold">{SOURCE_WORDS[v.sourceType]}:</span> {v.source}
        </>
      ),
    },
    addedColumn(),
  ];
  return (
    <FirmTable
      caption="The firm's χ and ψ values"
      columns={columns}
      rows={values}
      empty="No χ or ψ values of the firm's own yet."
      isAdmin={isAdmin}
      removal={removalOf(del, orgId, 'itemId')}
    />
  );
}
