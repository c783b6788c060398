import { SPAN_CONDITION_WORDS } from '@shared/calc/wind/attachment';
import type { AttachmentProduct } from '@shared/schemas/attachment-library';
import type { UnitSystem } from '@shared/units';
import { useRef } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { Table, Td, Th } from '../../../components/ui/Table';
import { errorMessage } from '../../../lib/api';
import { formatDate } from '../../../lib/format';
import { useUnitSystem } from '../../../lib/unit-system';
import { dataSheetHref, useDeleteAttachmentProduct, useUploadDataSheet } from '../api/attachment-products';
import { type LibraryMeasure, libraryNumber, libraryUnit } from '../units';
import { RemoveButton } from './LibraryTables';

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

/** Upload (or replace) an entry's data sheet: one PDF, PNG or JPEG, checked by its content on the server. */
function DataSheetCell({ orgId, product }: { orgId: string; product: AttachmentProduct }) {
  const input = useRef<HTMLInputElement>(null);
  const upload = useUploadDataSheet();
  return (
    <div className="flex flex-col items-start gap-1">
      {product.dataSheet ? (
        <a href={dataSheetHref(orgId, product.id)} target="_blank" rel="noreferrer">
          {product.dataSheet.name}
        </a>
      ) : (
        <span className="text-ink-muted">none yet</span>
      )}
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
    </div>
  );
}

/** The firm's panel load–span tables and clip capacities, each with its source and data sheet. */
export function AttachmentProductsTable({
  orgId,
  products,
  isAdmin,
}: {
  orgId: string;
  products: readonly AttachmentProduct[];
  isAdmin: boolean;
}) {
  const system = useUnitSystem();
  const del = useDeleteAttachmentProduct();
  if (products.length === 0)
    return (
      <p className="text-ink-muted">
        No panel tables or clips yet. Enter them on an assembly’s Attachment &amp; wind sheet and save them to
        the library from there.
      </p>
    );
  return (
    <>
      <Table caption="The firm's panel tables and clips" captionHidden>
        <thead>
          <tr>
            <Th>Product</Th>
            <Th>Kind</Th>
            <Th>Values</Th>
            <Th>Source</Th>
            <Th>Data sheet</Th>
            <Th numeric>Added</Th>
            {isAdmin ? (
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {products.map((p) => (
            <tr key={p.id} className="align-top">
              <Td className="font-semibold">
                {p.name}
                {p.notes ? <span className="block text-xs font-normal text-ink-muted">{p.notes}</span> : null}
              </Td>
              <Td>{p.kind === 'panel' ? 'load–span table' : 'clip'}</Td>
              <Td className="text-xs">{productSummary(p, system)}</Td>
              <Td className="text-xs">{p.source}</Td>
              <Td className="text-sm">
                <DataSheetCell orgId={orgId} product={p} />
              </Td>
              <Td numeric className="whitespace-nowrap">
                {formatDate(p.createdAt)}
              </Td>
              {isAdmin ? (
                <Td>
                  <RemoveButton
                    what={p.name}
                    busy={del.isPending && del.variables?.productId === p.id}
                    onRemove={() => del.mutate({ orgId, productId: p.id })}
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
