import {
  DEFICIENCY_STATE_TEXT,
  type DeficiencyState,
  ITEM_STATE_TEXT,
  type ItemState,
} from '@shared/inspections/schema';

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
