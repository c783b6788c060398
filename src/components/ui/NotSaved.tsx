import { Notice } from './Notice';

/** Why a save failed, as a caution notice with a line per reason; nothing while there is none. */
export function NotSaved({ reasons }: { reasons: readonly string[] | null }) {
  return reasons ? (
    <Notice tone="caution" title="Not saved." live>
      {reasons.map((m) => (
        <p key={m}>{m}</p>
      ))}
    </Notice>
  ) : null;
}
