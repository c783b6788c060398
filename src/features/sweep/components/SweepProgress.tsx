import { useSyncExternalStore } from 'react';
import { Button } from '../../../components/ui/Button';
import { secondsLeft } from '../pool';
import type { ProgressStore } from '../use-sweep-run';

const seconds = (s: number) =>
  s < 1 ? 'under a second' : s < 90 ? `about ${Math.round(s)} s` : `about ${Math.round(s / 60)} min`;

/**
 * The running sweep's bar, count, time left at the pace so far, and Cancel. It alone redraws with the count
 * (every 100 ms at most), not the page around it (D-032).
 */
export function SweepProgress({ progress, onCancel }: { progress: ProgressStore; onCancel: () => void }) {
  const p = useSyncExternalStore(progress.subscribe, progress.get);
  if (!p) return null;
  const left = secondsLeft(p.done, p.total, p.now - p.startedAt);
  return (
    <>
      <progress
        className="h-3 w-full accent-ink"
        max={p.total}
        value={p.done}
        aria-label="Variants checked"
      />
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <span className="num">
          {p.done.toLocaleString('en-GB')} of {p.total.toLocaleString('en-GB')} variants checked
        </span>
        <span>{left === null ? 'estimating the time left…' : `${seconds(left)} left`}</span>
        <Button onClick={onCancel}>Cancel</Button>
      </div>
    </>
  );
}
