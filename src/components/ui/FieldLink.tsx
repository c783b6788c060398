import type { ReactNode } from 'react';
import { fieldDomId, focusField } from '../../lib/field-problems';

/** A link to the box of a field path (a problem list's entry): moves there and focuses it. */
export function FieldLink({ path, children }: { path: string; children: ReactNode }) {
  return (
    <a
      href={`#${fieldDomId(path)}`}
      onClick={(e) => {
        if (focusField(path)) e.preventDefault();
      }}
    >
      {children}
    </a>
  );
}
