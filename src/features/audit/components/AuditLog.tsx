import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import type { AuditEntry } from '@shared/schemas/me';
import type { UnitSystem } from '@shared/units';
import { Table, Td, Th } from '../../../components/ui/Table';
import { formatDateTime } from '../../../lib/format';
import { formatProjectFieldValue, projectFieldLabel } from '../../../lib/project-fields';
import { useUnitSystem } from '../../../lib/unit-system';

type Change = { field: string; before: unknown; after: unknown };

const isRecord = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

const SKIP = new Set([
  'id',
  'version',
  'createdAt',
  'updatedAt',
  'organisationId',
  'organisationName',
  'myRole',
]);
const blankToNull = (v: unknown) => (v === undefined || v === '' ? null : v);

/**
 * Fields whose value differs between `before` and `after`, book-keeping left out. When both sides are
 * records (an update) only fields present on both are compared, so a partial snapshot does not read as
 * "removed"; a creation or deletion lists every field.
 */
export function changedFields(before: unknown, after: unknown): Change[] {
  const b = isRecord(before) ? before : {};
  const a = isRecord(after) ? after : {};
  const keys =
    isRecord(before) && isRecord(after)
      ? Object.keys(a).filter((k) => k in b)
      : [...new Set([...Object.keys(b), ...Object.keys(a)])];
  return keys
    .filter((k) => !SKIP.has(k))
    .filter((k) => JSON.stringify(blankToNull(b[k])) !== JSON.stringify(blankToNull(a[k])))
    .map((field) => ({ field, before: b[field], after: a[field] }));
}

/** "project · update" → "Project updated"-style plain words, falling back to the raw action. */
function describe(entry: AuditEntry): string {
  const verbs: Record<string, string> = {
    create: 'created',
    created: 'created',
    update: 'changed',
    updated: 'changed',
    update_wind: 'wind data changed',
    update_climate: 'climate changed',
    revise: 'revised',
    join: 'joined',
    change_role: 'role changed',
    archive: 'archived',
    archived: 'archived',
    unarchive: 'restored',
    unarchived: 'restored',
    delete: 'removed',
    deleted: 'removed',
    remove: 'removed',
    invite: 'invited',
    accept: 'accepted',
    accepted: 'accepted',
  };
  const action = entry.action.split('.').pop() ?? entry.action;
  const thing = entry.entity.replace(/_/g, ' ');
  const verb = verbs[action];
  return verb ? `${thing.charAt(0).toUpperCase()}${thing.slice(1)} ${verb}` : `${thing}: ${entry.action}`;
}

function formatValue(field: string, value: unknown, system: UnitSystem): string {
  if (typeof value === 'object' && value !== null) return 'entered (see its page)';
  if (field.endsWith('At') && typeof value === 'string') return formatDateTime(value);
  if (field === 'role' && typeof value === 'string' && value in PROJECT_ROLE_LABELS) {
    return PROJECT_ROLE_LABELS[value as keyof typeof PROJECT_ROLE_LABELS];
  }
  return formatProjectFieldValue(field, value, system);
}

const EXTRA_LABELS: Record<string, string> = {
  archivedAt: 'Archived',
  role: 'Role',
  email: 'E-mail',
  acceptedAt: 'Accepted',
  expiresAt: 'Expires',
};
/** Project fields get their project labels; other records (assemblies, criteria…) their own plain names. */
const label = (entity: string, field: string) =>
  EXTRA_LABELS[field] ?? (entity === 'project' ? projectFieldLabel(field) : (OTHER_LABELS[field] ?? field));
const OTHER_LABELS: Record<string, string> = {
  name: 'Name',
  revision: 'Revision',
  note: 'Note',
  wind: 'Wind data',
  climate: 'Monthly climate',
};

function Changes({ entry, system }: { entry: AuditEntry; system: UnitSystem }) {
  const changes = changedFields(entry.before, entry.after);
  if (changes.length === 0) return <span className="text-ink-muted">No values changed.</span>;
  return (
    <ul className="space-y-1">
      {changes.map((c) => (
        <li key={c.field}>
          <span className="text-ink-muted">{label(entry.entity, c.field)}: </span>
          <span className={typeof c.before === 'number' ? 'num' : ''}>
            {formatValue(c.field, c.before, system)}
          </span>
          <span aria-hidden="true"> → </span>
          <span className="sr-only"> changed to </span>
          <span className={typeof c.after === 'number' ? 'num' : ''}>
            {formatValue(c.field, c.after, system)}
          </span>
        </li>
      ))}
    </ul>
  );
}

export function AuditLog({ entries }: { entries: AuditEntry[] }) {
  const system = useUnitSystem();
  if (entries.length === 0)
    return <p className="text-ink-muted">Nothing has been recorded on this project yet.</p>;
  const newestFirst = [...entries].sort((a, b) => b.at.localeCompare(a.at));
  return (
    <Table caption="Recorded changes, newest first" captionHidden>
      <thead>
        <tr>
          <Th>When</Th>
          <Th>Who</Th>
          <Th>What</Th>
          <Th>Changes</Th>
        </tr>
      </thead>
      <tbody>
        {newestFirst.map((e) => (
          <tr key={e.id}>
            <Td className="num whitespace-nowrap">{formatDateTime(e.at)}</Td>
            <Td>{e.actorName ?? <span className="text-ink-muted">system</span>}</Td>
            <Td>{describe(e)}</Td>
            <Td>
              <Changes entry={e} system={system} />
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
