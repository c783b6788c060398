import type { CriteriaZone, WallCategory } from '@shared/checks/criteria';
import type { CriteriaSave, CriteriaSet } from '@shared/schemas/criteria';
import type { UnitSystem } from '@shared/units';
import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { errorMessage } from '../../../lib/api';
import { conflictingSet, useSaveCriteriaRows } from '../api/save-criteria';
import { blankDraft, type DraftErrors, type DraftRow, fromDrafts, starterDrafts, toDrafts } from '../draft';
import { CriteriaGrid } from './CriteriaGrid';

interface Props {
  set: CriteriaSet;
  system: UnitSystem;
  /** Called after a save, with the table as saved (a new version when the edited one was frozen). */
  onSaved: (saved: CriteriaSave) => void;
  /** An empty table opens with one blank row per criterion type for this zone and category. */
  starter?: { zone: CriteriaZone; category: WallCategory } | null;
}

/**
 * The rows of one version in the grid, saved all at once. Values stay in the unit system the grid was
 * opened in until saved (switching units mid-edit would re-read what was typed); a clean grid follows the
 * person's unit switch.
 */
export function CriteriaRowsEditor({ set, system, onSaved, starter }: Props) {
  const readOnly = set.myAccess === 'read' || !set.isLatest;
  const [opened, setOpened] = useState({ id: set.id, revision: set.revision, system });
  const outline = starter && set.rows.length === 0 && !readOnly;
  const [drafts, setDrafts] = useState<DraftRow[]>(() =>
    outline ? starterDrafts(starter.zone, starter.category) : toDrafts(set.rows, system),
  );
  const [dirty, setDirty] = useState(Boolean(outline));
  const [errors, setErrors] = useState<DraftErrors>({});
  const [conflict, setConflict] = useState<CriteriaSet | null>(null);
  const save = useSaveCriteriaRows();

  // A different version, a new revision saved elsewhere while clean, or a unit switch while clean: reload.
  if (
    (opened.id !== set.id || opened.revision !== set.revision || opened.system !== system) &&
    (!dirty || opened.id !== set.id)
  ) {
    setOpened({ id: set.id, revision: set.revision, system });
    setDrafts(toDrafts(set.rows, system));
    setDirty(false);
    setErrors({});
    setConflict(null);
  }
  const draftSystem = opened.system;

  const change = (next: DraftRow[]) => {
    setDrafts(next);
    setDirty(true);
  };

  async function submit() {
    const parsed = fromDrafts(drafts, draftSystem);
    if (!parsed.ok) {
      setErrors(parsed.errors);
      return;
    }
    setErrors({});
    try {
      const saved = await save.mutateAsync({ setId: set.id, revision: opened.revision, rows: parsed.rows });
      setDirty(false);
      // Reload the grid from the table as saved (the next render sees the saved version).
      setOpened({ id: '', revision: 0, system: draftSystem });
      onSaved(saved);
    } catch (e) {
      const current = conflictingSet(e);
      if (current) setConflict(current);
    }
  }

  const problems = Object.keys(errors).length;
  return (
    <div className="flex flex-col gap-4">
      {set.frozenAt && set.isLatest && !readOnly ? (
        <Notice tone="info" title={`Version ${set.version} is frozen: a stored check run used it.`}>
          <p>
            Saving your changes creates version {set.version + 1}; version {set.version} stays exactly as
            issued.
          </p>
        </Notice>
      ) : null}
      {draftSystem !== system ? (
        <Notice
          tone="info"
          title={`The values below are in ${draftSystem} units until you save or discard your changes.`}
        />
      ) : null}
      <CriteriaGrid
        drafts={drafts}
        system={draftSystem}
        labels={set.categoryLabels}
        errors={errors}
        readOnly={readOnly}
        onChange={change}
        caption={`Rows of version ${set.version} (${drafts.length})`}
      />
      {problems > 0 ? (
        <Notice
          tone="caution"
          title={`${problems} row${problems === 1 ? ' needs' : 's need'} attention; nothing was saved.`}
          live
        />
      ) : null}
      {conflict ? (
        <Notice tone="warning" title="Your rows were not saved." live>
          <p>
            {conflict.id === set.id
              ? `Someone saved this table (revision ${conflict.revision}) after you opened it.`
              : `Version ${conflict.version} of this table exists now; edit that version.`}{' '}
            Your edits are still in the grid.
          </p>
          <Button
            variant="secondary"
            onClick={() => {
              setDirty(false);
              onSaved({ ...conflict, versionCreated: false });
            }}
          >
            Open the saved table (discard my edits)
          </Button>
        </Notice>
      ) : null}
      {save.isError && !conflict ? <Notice tone="caution" title={errorMessage(save.error)} live /> : null}
      {readOnly ? null : (
        <div className="flex flex-wrap gap-3">
          <Button variant="secondary" onClick={() => change([...drafts, blankDraft(drafts.at(-1))])}>
            Add a row
          </Button>
          <Button
            variant="primary"
            busy={save.isPending}
            busyLabel="Saving…"
            disabled={!dirty}
            onClick={submit}
          >
            {set.frozenAt ? `Save as version ${set.version + 1}` : 'Save rows'}
          </Button>
          {dirty ? (
            <Button
              variant="quiet"
              onClick={() => {
                setDrafts(toDrafts(set.rows, system));
                setOpened({ id: set.id, revision: set.revision, system });
                setDirty(false);
                setErrors({});
              }}
            >
              Discard changes
            </Button>
          ) : null}
        </div>
      )}
    </div>
  );
}
