import { PROJECT_ROLE_LABELS } from '@shared/auth/permissions';
import type { AuditEntry } from '@shared/schemas/me';
import type { UnitSystem } from '@shared/units';
import { Link } from 'react-router';
import { Table, Td } from '../../../components/ui/Table';
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
  // Ids of what an entry touched (the entry's own object is named and linked in "What").
  'item',
  'checkRun',
  'comment',
  'previous',
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

/** Each action as a verb phrase put before the object ("Decided submittal …"). */
const VERBS: Record<string, string> = {
  create: 'Created',
  created: 'Created',
  update: 'Changed',
  updated: 'Changed',
  update_wind: 'Changed the wind data of',
  update_climate: 'Changed the climate of',
  revise: 'Saved a new revision of',
  note: 'Changed the revision note of',
  join: 'Added',
  change_role: 'Changed the role of',
  archive: 'Archived',
  archived: 'Archived',
  unarchive: 'Restored',
  unarchived: 'Restored',
  delete: 'Removed',
  deleted: 'Removed',
  remove: 'Removed',
  invite: 'Invited',
  accept: 'Accepted',
  accepted: 'Accepted',
  submit: 'Submitted',
  start_review: 'Started the review of',
  decide: 'Decided',
  close_review: 'Closed the review of',
  open_revision: 'Opened the next revision of',
  add_sheet: 'Attached a compliance sheet to',
  upload: 'Uploaded files to',
  remove_item: 'Removed an item from',
  comment: 'Commented on',
  freeze: 'Froze',
  new_version: 'Made a new version of',
};

/** Where an object's own verb reads better than the action's: a sweep is saved, not created. */
const ENTITY_VERBS: Record<string, Record<string, string>> = {
  sweep: { create: 'Saved', delete: 'Deleted' },
};

/** The object's kind in words: "check_run" → "check run", a member → "member". */
const KIND: Record<string, string> = {
  sweep: 'the sweep',
  check_run: 'the check run of',
  member: 'member',
  invitation: 'the invitation of',
};

/** Where an entry's object is shown, when it has a page of its own. */
function hrefOf(projectId: string, entry: AuditEntry): string | null {
  const p = `/projects/${encodeURIComponent(projectId)}`;
  const id = encodeURIComponent(entry.entityId);
  switch (entry.entity) {
    case 'project':
      return p;
    case 'assembly':
      return `${p}/assemblies/${id}`;
    case 'submittal':
      return `${p}/submittals/${id}`;
    case 'check_run':
      return `${p}/check-runs/${id}/sheet`;
    case 'member':
      return `${p}/members`;
    default:
      return null;
  }
}

const words = (key: string) => key.replace(/_/g, ' ');

/** What a decision's or a status's key says in words ("approved_as_noted" → "approved as noted"). */
function outcome(entry: AuditEntry): string | null {
  const after = isRecord(entry.after) ? entry.after : {};
  if (entry.action === 'decide' && typeof after.decision === 'string') return words(after.decision);
  if (entry.action === 'close_review' && typeof after.status === 'string') return words(after.status);
  if (entry.action === 'revise' && typeof after.revision === 'number') return `revision ${after.revision}`;
  return null;
}

/** The name an object had when its entry was made ("“Insulation × clips” "), for one that is gone. */
function goneName(entry: AuditEntry): string {
  const v = isRecord(entry.before) ? entry.before : isRecord(entry.after) ? entry.after : {};
  return typeof v.name === 'string' ? `“${v.name}” ` : '';
}

/** "Decided submittal S-003 rev 1 — Façade panels: approved as noted", the object linked to its page. */
export function What({ projectId, entry }: { projectId: string; entry: AuditEntry }) {
  const action = entry.action.split('.').pop() ?? entry.action;
  const verb =
    ENTITY_VERBS[entry.entity]?.[action] ??
    VERBS[action] ??
    `${words(action).charAt(0).toUpperCase()}${words(action).slice(1)}`;
  const kind = KIND[entry.entity] ?? words(entry.entity);
  const name = entry.entityName;
  const href = name === null ? null : hrefOf(projectId, entry);
  const result = outcome(entry);
  return (
    <>
      {verb} {kind}{' '}
      {name === null ? (
        <span className="text-ink-muted">{goneName(entry)}(no longer there)</span>
      ) : href ? (
        <Link to={href}>{name}</Link>
      ) : (
        name
      )}
      {result ? `: ${result}` : ''}
    </>
  );
}

/** Where a duplicate came from: "Wall A in Corvid Lane rev 3", or the project and its assembly count. */
function copiedFrom(v: Record<string, unknown>): string {
  if (typeof v.assembly === 'string') return `${v.assembly} in ${v.project} rev ${v.revision}`;
  return `${v.project} (${v.assemblies} assemblies)`;
}

function formatValue(field: string, value: unknown, system: UnitSystem): string {
  if (field === 'copiedFrom' && isRecord(value)) return copiedFrom(value);
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
  copiedFrom: 'Copied from',
  // A saved sweep: what it ran on and what it found.
  assembly: 'Assembly',
  criteriaSet: 'Code table',
  criteriaSetVersion: 'Code table version',
  variants: 'Variants',
  passing: 'Passing variants',
};

/** A saved sweep's entry names its code table's version `version`: there it is a fact, not book-keeping. */
const snapshot = (entry: AuditEntry, v: unknown) => {
  if (entry.entity !== 'sweep' || !isRecord(v) || !('version' in v)) return v;
  const { version, ...rest } = v;
  return { ...rest, criteriaSetVersion: version };
};

function Changes({ entry, system }: { entry: AuditEntry; system: UnitSystem }) {
  const changes = changedFields(snapshot(entry, entry.before), snapshot(entry, entry.after));
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

export function AuditLog({ projectId, entries }: { projectId: string; entries: AuditEntry[] }) {
  const system = useUnitSystem();
  if (entries.length === 0)
    return <p className="text-ink-muted">Nothing has been recorded on this project yet.</p>;
  const newestFirst = [...entries].sort((a, b) => b.at.localeCompare(a.at));
  return (
    <Table caption="Recorded changes, newest first" captionHidden head={['When', 'Who', 'What', 'Changes']}>
      <tbody>
        {newestFirst.map((e) => (
          <tr key={e.id}>
            <Td className="num whitespace-nowrap">{formatDateTime(e.at)}</Td>
            <Td>{e.actorName ?? <span className="text-ink-muted">system</span>}</Td>
            <Td>
              <What projectId={projectId} entry={e} />
            </Td>
            <Td>
              <Changes entry={e} system={system} />
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
