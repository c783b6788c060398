import { SPAN_CONDITION_WORDS } from '@shared/calc/wind/attachment';
import type { AttachmentProduct } from '@shared/schemas/attachment-library';
import type { UnitSystem } from '@shared/units';
import { useRef } from 'react';
import { Button } from '../../../components/ui/Button';
import { errorMessage } from '../../../lib/api';
import { useUnitSystem } from '../../../lib/unit-system';
import { dataSheetHref, useDeleteAttachmentProduct, useUploadDataSheet } from '../api/attachment-products';
import { type LibraryMeasure, libraryNumber, libraryUnit } from '../units';
import { addedColumn, type Column, FirmTable, nameColumn, removalOf } from './LibraryTable';

const q = (si: number, m: LibraryMeasure, system: UnitSystem) =>
  `${libraryNumber(si, m, system)} ${libraryUnit(m, system)}`;

/** The entry's values in one line: the table's range and condition, or the clip's capacity. */
export function productSummary(p: AttachmentProduct, system: UnitSystem): string {
  if (p.kind === 'clip') {
    if ('allowableLoad' in p.clip) return `rated ${q(p.clip.allowableLoad, 'force', system)} per clip (ASD)`;
    const { fastenerCapacity: f, fastenersPerClip: n } = p.clip;
    return `${n} × ${q(f, 'force', system)} = ${q(n * f, 'force', system)} per clip (ASD)`;
  }
  const { rows, spanCondition, deflectionLimit } = p.loadSpanTable;
  const first = rows[0]!;
  const last = rows[rows.length - 1]!;
  return [
    `${SPAN_CONDITION_WORDS[spanCondition]}, ${rows.length} rows`,
    `spans ${libraryNumber(first.span, 'span', system)}–${q(last.span, 'span', system)}`,
    `outward ${libraryNumber(first.allowableOutward, 'pressure', system)}–${q(last.allowableOutward, 'pressure', system)}`,
    rows[0]!.allowableDeflectionPressure !== undefined ? `deflection column ${deflectionLimit}` : '',
    p.panelModuleWidth ? `module ${q(p.panelModuleWidth, 'width', system)}` : '',
  ]
    .filter(Boolean)
    .join(' · ');
}

/**
 * An entry's data sheet, and — for the firm's editors and administrators — uploading or replacing it: one PDF,
 * PNG or JPEG, checked by its content on the server.
 */
function DataSheetCell({
  orgId,
  product,
  mayWrite,
}: {
  orgId: string;
  product: AttachmentProduct;
  mayWrite: boolean;
}) {
  return (
    <div className="flex flex-col items-start gap-1">
      {product.dataSheet ? (
        <a href={dataSheetHref(orgId, product.id)} target="_blank" rel="noreferrer">
          {product.dataSheet.name}
        </a>
      ) : (
        <span className="text-ink-muted">none yet</span>
      )}
      {mayWrite ? <DataSheetUpload orgId={orgId} product={product} /> : null}
    </div>
  );
}

function DataSheetUpload({ orgId, product }: { orgId: string; product: AttachmentProduct }) {
  const input = useRef<HTMLInputElement>(null);
  const upload = useUploadDataSheet();
  return (
    <>
      <input
        ref={input}
        type="file"
        accept="application/pdf,image/png,image/jpeg"
        className="sr-only"
        aria-label={`Data sheet file for ${product.name}`}
        onChange={(e) => {
          const file = e.target.files?.[0];
          if (file) upload.mutate({ orgId, productId: product.id, file });
          e.target.value = '';
        }}
      />
      <Button
        variant="quiet"
        className="px-0 py-0 text-xs"
        busy={upload.isPending}
        busyLabel="Uploading…"
        onClick={() => input.current?.click()}
      >
        {product.dataSheet ? 'Replace…' : 'Upload…'}
      </Button>
      {upload.isError ? (
        <span role="alert" className="text-xs font-medium text-caution">
          ✕ {errorMessage(upload.error)}
        </span>
      ) : null}
    </>
  );
}

/** The firm's panel load–span tables and clip capacities, each with its source and data sheet. */
export function AttachmentProductsTable({
  orgId,
  products,
  isAdmin,
  mayWrite,
}: {
  orgId: string;
  products: readonly AttachmentProduct[];
  isAdmin: boolean;
  /** Whether the firm role writes the library (editors, administrators): uploading data sheets. */
  mayWrite: boolean;
}) {
  const system = useUnitSystem();
  const del = useDeleteAttachmentProduct();
  const columns: Column<AttachmentProduct>[] = [
    nameColumn('Product'),
    { header: 'Kind', cell: (p) => (p.kind === 'panel' ? 'load–span table' : 'clip') },
    { header: 'Values', className: 'text-xs', cell: (p) => productSummary(p, system) },
    { header: 'Source', className: 'text-xs', cell: (p) => p.source },
    {
      header: 'Data sheet',
      className: 'text-sm',
      cell: (p) => <DataSheetCell orgId={orgId} product={p} mayWrite={mayWrite} />,
    },
    addedColumn(),
  ];
  return (
    <FirmTable
      caption="The firm's panel tables and clips"
      columns={columns}
      rows={products}
      rowClassName="align-top"
      empty="No panel tables or clips yet. Enter them on an assembly’s Attachment & wind page and save them to the library from there."
      isAdmin={isAdmin}
      removal={removalOf(del, orgId, 'productId')}
    />
  );
}
