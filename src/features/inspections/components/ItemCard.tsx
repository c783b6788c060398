import {
  type InspectionItem,
  ITEM_STATE_TEXT,
  ITEM_STATES,
  type ItemAnswer,
  type ItemState,
} from '@shared/inspections/schema';
import { answerProblem, checkMeasured } from '@shared/inspections/tolerance';
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { QuantityInput } from '../../../components/ui/QuantityInput';
import { TextArea, TextInput } from '../../../components/ui/TextInput';
import { useUnitSystem } from '../../../lib/unit-system';
import { itemMeasure, itemValueText, toleranceText } from '../units';
import { KeptPhoto, PhotoCapture } from './PhotoCapture';
import { ItemStateMark } from './StateMark';

const STATE_BUTTON: Record<ItemState, string> = {
  unseen: 'aria-pressed:bg-ink aria-pressed:text-paper',
  pass: 'aria-pressed:bg-meets aria-pressed:text-white aria-pressed:border-meets',
  fail: 'aria-pressed:bg-caution aria-pressed:text-white aria-pressed:border-caution',
  na: 'aria-pressed:bg-ink aria-pressed:text-paper',
};

interface ItemCardProps {
  inspectionId: string;
  item: InspectionItem;
  /** This device's answer still waiting to be sent, shown in place of the server's. */
  pending: ItemAnswer | undefined;
  pendingPhotos: string[];
  readOnly: boolean;
  onSave: (answer: ItemAnswer) => void;
  /** The button's words: "Save answer", or "Save and next" one item at a time. */
  saveLabel: string;
  /** Its place in the checklist, from 1. */
  number: number;
}

/**
 * One checklist item: what was designed (value, tolerance, where it came from), the answer — pass / fail /
 * not applicable / not yet seen as large buttons, the measured value in the person's units checked against
 * the tolerance as it is typed, a note, where on the wall — and its photos.
 */
export function ItemCard({
  inspectionId,
  item,
  number,
  pending,
  pendingPhotos,
  readOnly,
  onSave,
  saveLabel,
}: ItemCardProps) {
  const id = useId();
  const system = useUnitSystem();
  const shown = {
    ...item,
    ...pending,
    measured: pending?.measured !== undefined ? pending.measured : item.measured,
  };
  const [state, setState] = useState<ItemState>(shown.state);
  const [measured, setMeasured] = useState<number | null>(shown.measured);
  const [note, setNote] = useState(shown.note);
  const [location, setLocation] = useState(shown.location);
  const [unreadable, setUnreadable] = useState(false);

  const check = checkMeasured(item, measured);
  const problem = answerProblem(item, { state, measured });
  const tolerance = toleranceText(item.quantity, item.tolerance, system);
  const stateGroup = `${id}-state`;

  return (
    <article
      className="flex flex-col gap-4 border border-ink bg-paper-raised p-4"
      data-item={item.kind}
      aria-labelledby={`${id}-h`}
    >
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`${id}-h`} className="text-xl">
          <span className="num mr-2 text-ink-muted">{number}.</span>
          {item.label}
        </h3>
        <span className="flex items-center gap-2 text-sm">
          <ItemStateMark state={shown.state} />
          {pending ? (
            <span className="border border-warning px-1 text-warning" data-testid="item-waiting">
              waiting to send
            </span>
          ) : null}
        </span>
      </header>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="font-semibold">Design</dt>
        <dd className="min-w-0 [overflow-wrap:anywhere]">
          {item.designValue !== null ? (
            <span className="num mr-2">{itemValueText(item.quantity, item.designValue, system)}</span>
          ) : null}
          {item.designText}
        </dd>
        {tolerance ? (
          <>
            <dt className="font-semibold">Accepted</dt>
            <dd className="num">{tolerance}</dd>
          </>
        ) : null}
        <dt className="font-semibold">From</dt>
        <dd className="min-w-0 text-ink-muted [overflow-wrap:anywhere]">{item.source.text}</dd>
      </dl>

      <fieldset className="flex flex-col gap-2" disabled={readOnly}>
        <legend id={stateGroup} className="mb-1 text-sm font-semibold">
          Result
        </legend>
        <div className="grid grid-cols-2 gap-2 sm:grid-cols-4">
          {ITEM_STATES.map((s) => (
            <button
              key={s}
              type="button"
              aria-pressed={state === s}
              onClick={() => setState(s)}
              className={`min-h-12 rounded-sm border-2 border-ink bg-paper px-3 py-2 text-base font-semibold text-ink ${STATE_BUTTON[s]}`}
            >
              <span aria-hidden="true">{ITEM_STATE_TEXT[s].glyph} </span>
              {ITEM_STATE_TEXT[s].label}
            </button>
          ))}
        </div>
      </fieldset>

      {item.quantity !== null ? (
        <div className="flex flex-col gap-1">
          <QuantityInput
            label="Measured"
            measure={itemMeasure(item.quantity)}
            value={measured}
            required={false}
            disabled={readOnly}
            onChange={(si, entry) => {
              setUnreadable(entry === 'invalid');
              setMeasured(si ?? null);
            }}
            error={problem?.field === 'measured' ? problem.reason : undefined}
          />
          {check.status !== 'none' ? (
            <p
              className={`text-sm font-semibold ${check.status === 'within' ? 'text-meets' : 'text-caution'}`}
              data-testid="measured-check"
            >
              <span aria-hidden="true">{check.status === 'within' ? '✓ ' : '✕ '}</span>
              {`Measured ${check.text}`}
            </p>
          ) : null}
        </div>
      ) : null}

      <div className="grid gap-3 sm:grid-cols-2">
        <label className="flex flex-col gap-1 text-sm font-semibold">
          Note
          <TextArea rows={2} value={note} disabled={readOnly} onChange={(e) => setNote(e.target.value)} />
        </label>
        <label className="flex flex-col gap-1 text-sm font-semibold">
          Where on the wall
          <TextInput
            value={location}
            disabled={readOnly}
            placeholder="e.g. grid C/4, level 2"
            onChange={(e) => setLocation(e.target.value)}
          />
        </label>
      </div>

      <div className="flex flex-col gap-2">
        <p className="text-sm font-semibold">Photos</p>
        {item.photos.length + pendingPhotos.length > 0 ? (
          <ul className="flex flex-wrap gap-2" aria-label={`Photos of ${item.label}`}>
            {item.photos.map((p) => (
              <li key={p.id}>
                <img
                  src={p.url}
                  alt={`${item.label}: ${p.name}`}
                  className="h-24 w-24 border border-rule object-cover"
                />
              </li>
            ))}
            {pendingPhotos.map((key) => (
              <li key={key} className="relative" data-testid="photo-waiting">
                <KeptPhoto photoKey={key} alt={`${item.label}: photo waiting to be sent`} />
                <span className="absolute inset-x-0 bottom-0 bg-ink/80 px-1 text-xs text-paper">waiting</span>
              </li>
            ))}
          </ul>
        ) : null}
        {readOnly ? null : <PhotoCapture inspectionId={inspectionId} itemId={item.id} label={item.label} />}
      </div>

      {readOnly ? null : (
        <div className="flex flex-col gap-2">
          {problem?.field === 'state' ? (
            <p role="alert" className="text-sm font-semibold text-caution">
              <span aria-hidden="true">✕ </span>
              {problem.reason}
            </p>
          ) : null}
          <Button
            variant="primary"
            className="min-h-12 w-full text-base sm:w-fit"
            disabled={problem !== undefined || unreadable}
            onClick={() =>
              onSave({
                version: item.version,
                state,
                measured: item.quantity !== null ? measured : undefined,
                note,
                location,
              })
            }
          >
            {saveLabel}
          </Button>
        </div>
      )}
    </article>
  );
}
