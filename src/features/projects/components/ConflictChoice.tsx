import { useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';

/**
 * The two ways on after someone saved first (project and climate editors): carry this person's changes onto
 * the saved version, or load that version; `carriedOnto` remembers the version carried onto, for the notice.
 */
export function useConflictChoice<R extends { version: number }, F>(restart: (next: R, form: F) => void) {
  const [carriedOnto, setCarriedOnto] = useState<number | null>(null);
  return {
    carriedOnto,
    carry: (theirs: R, form: F) => {
      setCarriedOnto(theirs.version);
      restart(theirs, form);
    },
    load: (theirs: R, form: F) => {
      setCarriedOnto(null);
      restart(theirs, form);
    },
  };
}

/** The conflict notice's two buttons. */
export function ConflictChoice({
  onCarry,
  onLoad,
  loadLabel,
}: {
  onCarry: () => void;
  onLoad: () => void;
  /** "Load the saved climate (discard my edits)". */
  loadLabel: string;
}) {
  return (
    <div className="flex flex-wrap gap-3 pt-1">
      <Button variant="secondary" onClick={onCarry}>
        Carry my changes over
      </Button>
      <Button variant="secondary" onClick={onLoad}>
        {loadLabel}
      </Button>
    </div>
  );
}

/** After carrying over: the changes now sit on the saved version and still need saving. */
export function CarriedNotice({
  onto,
  version,
}: {
  onto: number /** "version", "revision" */;
  version: string;
}) {
  return (
    <Notice tone="info" title={`Your changes are now on top of ${version} ${onto}. Check them, then save.`} />
  );
}
