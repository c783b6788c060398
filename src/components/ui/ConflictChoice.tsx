import { type ReactNode, useState } from 'react';
import { Button } from './Button';
import { Notice } from './Notice';

/**
 * The two ways on after someone saved first (project and climate editors): carry this person's changes onto
 * the saved version, or load that version; `carriedOnto` remembers the version carried onto, for the notice.
 */
export function useConflictChoice<R extends { version: number }, F>(
  conflict: unknown,
  restart: (next: R, form: F) => void,
) {
  const [carriedOnto, setCarriedOnto] = useState<number | null>(null);
  return {
    /** A conflict is open. */
    open: conflict !== null,
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

/**
 * An editor's banner above its save bar: while a conflict is open, the warning with what happened and the two
 * ways on (children); after carrying over, the note that the changes still need saving; else nothing.
 */
export function ConflictBanner({
  choice: { open, carriedOnto },
  title,
  version,
  children,
}: {
  choice: { open: boolean; carriedOnto: number | null };
  title: string;
  /** What the record's numbers are called: "version", "revision". */
  version: string;
  children: ReactNode;
}) {
  return open ? (
    <Notice tone="warning" title={title} live>
      {children}
    </Notice>
  ) : carriedOnto !== null ? (
    <Notice
      tone="info"
      title={`Your changes are now on top of ${version} ${carriedOnto}. Check them, then save.`}
    />
  ) : null;
}
