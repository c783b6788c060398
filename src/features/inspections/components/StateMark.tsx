import {
  DEFICIENCY_STATE_TEXT,
  type Deficiency,
  type DeficiencyState,
  ITEM_STATE_TEXT,
  type ItemState,
} from '@shared/inspections/schema';
import { isOverdue, localToday } from '../overdue';

const ITEM_TONE: Record<ItemState, string> = {
  unseen: 'text-ink-muted',
  pass: 'text-meets',
  fail: 'text-caution',
  na: 'text-ink',
};

/** An item's state as a glyph and a word (never colour alone). */
export function ItemStateMark({ state }: { state: ItemState }) {
  const t = ITEM_STATE_TEXT[state];
  return (
    <span className={`inline-flex items-center gap-1 font-semibold ${ITEM_TONE[state]}`} data-state={state}>
      <span aria-hidden="true">{t.glyph}</span>
      {t.label}
    </span>
  );
}

/** A deficiency's state as a glyph and a word. */
export function DeficiencyStateMark({ state }: { state: DeficiencyState }) {
  const t = DEFICIENCY_STATE_TEXT[state];
  const tone = state === 'accepted' ? 'text-meets' : state === 'corrected' ? 'text-warning' : 'text-caution';
  return (
    <span className={`inline-flex items-center gap-1 font-semibold ${tone}`} data-state={state}>
      <span aria-hidden="true">{t.glyph}</span>
      {t.label}
    </span>
  );
}

/** A deficiency's due date, and "overdue" in a glyph and words when it is past and not yet accepted. */
export function DueMark({
  deficiency: d,
  today = localToday(),
  word = true,
}: {
  deficiency: Pick<Deficiency, 'state' | 'dueDate'>;
  today?: string;
  /** "due …" in a list; the date alone beside a "Due" label. */
  word?: boolean;
}) {
  if (!d.dueDate) return <span className="text-ink-muted">no due date</span>;
  return (
    <span className="inline-flex flex-wrap items-center gap-2" data-testid="deficiency-due">
      <span className="num">{word ? `due ${d.dueDate}` : d.dueDate}</span>
      {isOverdue(d, today) ? (
        <span className="inline-flex items-center gap-1 font-semibold text-caution" data-overdue="true">
          <span aria-hidden="true">⚠</span>overdue
        </span>
      ) : null}
    </span>
  );
}

/** A deficiency's state, owner and due date on one wrapping line, as each list of deficiencies shows them. */
export function DeficiencyMarks({
  deficiency: d,
}: {
  deficiency: Pick<Deficiency, 'state' | 'dueDate' | 'ownerName'>;
}) {
  return (
    <span className="flex flex-wrap items-center gap-3 text-sm">
      <DeficiencyStateMark state={d.state} />
      <span className="[overflow-wrap:anywhere]">{d.ownerName ?? 'no owner yet'}</span>
      <DueMark deficiency={d} />
    </span>
  );
}
