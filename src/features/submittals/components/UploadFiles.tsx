import { UPLOAD_LIMITS } from '@shared/schemas/submittals';
import { type ChangeEvent, useId, useRef, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { errorMessage } from '../../../lib/api';
import { useUploadFiles } from '../api/upload-files';

const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;

/** Product data, test reports, shop drawings: chosen, checked for size here, sent with a progress bar. */
export function UploadFiles({ submittalId }: { submittalId: string }) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const [files, setFiles] = useState<File[]>([]);
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const upload = useUploadFiles(submittalId);

  const choose = (e: ChangeEvent<HTMLInputElement>) => {
    const chosen = [...(e.target.files ?? [])];
    setDone(null);
    const tooBig = chosen.filter((f) => f.size > UPLOAD_LIMITS.maxFileBytes);
    if (chosen.length > UPLOAD_LIMITS.maxFiles)
      setProblem(`Choose at most ${UPLOAD_LIMITS.maxFiles} files at once.`);
    else if (tooBig.length > 0)
      setProblem(`${tooBig.map((f) => f.name).join(', ')}: larger than ${mb(UPLOAD_LIMITS.maxFileBytes)}.`);
    else setProblem(null);
    setFiles(chosen);
  };

  const send = async () => {
    setDone(null);
    try {
      const { items } = await upload.mutateAsync(files);
      setDone(`${items.length} file${items.length === 1 ? '' : 's'} added.`);
      setFiles([]);
      if (input.current) input.current.value = '';
    } catch {
      // shown below from upload.error
    }
  };

  const p = upload.progress;
  return (
    <div className="flex flex-col gap-3 border border-rule bg-paper-raised p-4">
      <label htmlFor={id} className="text-sm font-semibold">
        Add files{' '}
        <span className="font-normal text-ink-muted">
          ({UPLOAD_LIMITS.accepted}; up to {UPLOAD_LIMITS.maxFiles} files of {mb(UPLOAD_LIMITS.maxFileBytes)}{' '}
          each)
        </span>
      </label>
      <input
        id={id}
        ref={input}
        type="file"
        multiple
        accept=".pdf,.png,.jpg,.jpeg,.dwg,application/pdf,image/png,image/jpeg"
        onChange={choose}
        className="text-sm file:mr-3 file:border file:border-ink file:bg-transparent file:px-3 file:py-1 file:text-sm file:font-semibold"
        disabled={upload.isPending}
      />
      {files.length > 0 ? (
        <ul className="text-sm">
          {files.map((f) => (
            <li key={`${f.name}-${f.size}`}>
              {f.name} <span className="num text-ink-muted">{mb(f.size)}</span>
            </li>
          ))}
        </ul>
      ) : null}
      {problem ? <Notice tone="caution" title={problem} live /> : null}
      {p ? (
        <div role="status" className="flex flex-col gap-1">
          <progress
            className="h-2 w-full accent-ink"
            max={Math.max(1, p.total)}
            value={p.loaded}
            aria-label="Upload progress"
          />
          <span className="num text-xs text-ink-muted">
            {p.loaded >= p.total ? 'Checking and storing…' : `${mb(p.loaded)} of ${mb(p.total)} sent`}
          </span>
        </div>
      ) : null}
      {upload.isError ? <Notice tone="caution" title={errorMessage(upload.error)} live /> : null}
      {done ? <Notice tone="info" title={done} live /> : null}
      <div>
        <Button
          variant="secondary"
          onClick={send}
          disabled={files.length === 0 || problem !== null}
          busy={upload.isPending}
          busyLabel="Uploading…"
        >
          Upload {files.length > 0 ? `${files.length} file${files.length === 1 ? '' : 's'}` : 'files'}
        </Button>
      </div>
    </div>
  );
}
