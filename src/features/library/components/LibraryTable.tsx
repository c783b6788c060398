import type { UnitSystem } from '@shared/units';
import { type ReactNode, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { Table, Td, Th } from '../../../components/ui/Table';
import { errorMessage } from '../../../lib/api';
import { formatDate } from '../../../lib/format';
import { type LibraryMeasure, libraryNumber, libraryUnit } from '../units';

/** One column of a library table: its head (with an optional unit line) and its cell for a row. */
export interface Column<T> {
  header: ReactNode;
  /** A second, quieter line under the header: the unit, or what the figures are. */
  unit?: ReactNode;
  /** Right-aligned figures, in the head and the cells. */
  numeric?: boolean;
  /** Classes of the body cells. */
  className?: string;
  cell: (row: T) => ReactNode;
}

/** A column head with its unit on a line of its own below. */
export function UnitHeader({
  children,
  unit,
  numeric,
}: {
  children: ReactNode;
  unit?: ReactNode;
  numeric?: boolean;
}) {
  return (
    <Th numeric={numeric}>
      {children}
      {unit !== undefined ? <span className="block text-xs font-normal text-ink-muted">{unit}</span> : null}
    </Th>
  );
}

/** The row's name in bold, with its notes (when there are any) in a quiet line below. */
export function nameColumn<T extends { name: string; notes?: string }>(header: string): Column<T> {
  return {
    header,
    className: 'font-semibold',
    cell: (row) => (
      <>
        {row.name}
        {row.notes ? <span className="block text-xs font-normal text-ink-muted">{row.notes}</span> : null}
      </>
    ),
  };
}

/** A figure stored in SI, shown in the person's units, with the unit under the header. */
export function measureColumn<T>(
  header: string,
  measure: LibraryMeasure,
  system: UnitSystem,
  value: (row: T) => number | null | undefined,
): Column<T> {
  return {
    header,
    unit: libraryUnit(measure, system),
    numeric: true,
    cell: (row) => libraryNumber(value(row), measure, system),
  };
}

/** When the entry was added to the firm's library. */
export function addedColumn<T extends { createdAt: string }>(): Column<T> {
  return {
    header: 'Added',
    numeric: true,
    className: 'whitespace-nowrap',
    cell: (row) => formatDate(row.createdAt),
  };
}

/** A ruled library table from column definitions; `actions` adds a last column headed "Actions" for screen readers. */
export function LibraryTable<T extends { id: string }>({
  caption,
  columns,
  rows,
  rowClassName,
  actions,
}: {
  caption: string;
  columns: readonly Column<T>[];
  rows: readonly T[];
  rowClassName?: string;
  actions?: (row: T) => ReactNode;
}) {
  return (
    <Table caption={caption} captionHidden>
      <thead>
        <tr>
          {columns.map((c, i) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: the columns are fixed per table
            <UnitHeader key={i} unit={c.unit} numeric={c.numeric}>
              {c.header}
            </UnitHeader>
          ))}
          {actions ? (
            <Th>
              <span className="sr-only">Actions</span>
            </Th>
          ) : null}
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.id} className={rowClassName}>
            {columns.map((c, i) => (
              // biome-ignore lint/suspicious/noArrayIndexKey: the columns are fixed per table
              <Td key={i} numeric={c.numeric} className={c.className}>
                {c.cell(row)}
              </Td>
            ))}
            {actions ? <Td>{actions(row)}</Td> : null}
          </tr>
        ))}
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

/** How a firm table removes an entry: the id being removed (if any), the call, and its error. */
export interface Removal {
  pendingId: string | undefined;
  remove: (id: string) => void;
  error: unknown;
}

/** The removal of a firm table from its delete mutation, whose variables name the entry by `key`. */
export function removalOf<K extends string>(
  del: {
    isPending: boolean;
    variables?: Record<K, string>;
    error: unknown;
    mutate: (variables: { orgId: string } & Record<K, string>) => void;
  },
  orgId: string,
  key: K,
): Removal {
  return {
    pendingId: del.isPending ? del.variables?.[key] : undefined,
    remove: (id) => del.mutate({ orgId, [key]: id } as { orgId: string } & Record<K, string>),
    error: del.error,
  };
}

/**
 * A table of the firm's own entries: the empty state when there are none, and for firm administrators a
 * last column with the two-step remove and, below the table, the reason a removal failed.
 */
export function FirmTable<T extends { id: string; name: string }>({
  empty,
  isAdmin,
  removal,
  ...table
}: {
  caption: string;
  columns: readonly Column<T>[];
  rows: readonly T[];
  rowClassName?: string;
  empty: string;
  isAdmin: boolean;
  removal: Removal;
}) {
  if (table.rows.length === 0) return <p className="text-ink-muted">{empty}</p>;
  return (
    <>
      <LibraryTable
        {...table}
        actions={
          isAdmin
            ? (row) => (
                <RemoveButton
                  what={row.name}
                  busy={removal.pendingId === row.id}
                  onRemove={() => removal.remove(row.id)}
                />
              )
            : undefined
        }
      />
      {removal.error ? <Notice tone="caution" title={errorMessage(removal.error)} live /> : null}
    </>
  );
}
