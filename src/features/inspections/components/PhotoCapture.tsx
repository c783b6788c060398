import { useEffect, useId, useState } from 'react';
import { keepPhoto, keptPhoto, newPhotoKey } from '../../../lib/offline/device-photos';
import { useUploadPhoto } from '../api/upload-photo';
import { shrinkPhoto } from '../photo';
import { PhotoButton } from './PhotoButton';

/** Most a photo may weigh before it is made smaller (the server's limit on what it is sent is the same). */
const MAX_PHOTO_BYTES = 15 * 1024 * 1024;

/** A photo kept on the device, shown from there while it waits to be sent. */
export function KeptPhoto({ photoKey, alt }: { photoKey: string; alt: string }) {
  const [url, setUrl] = useState<string>();
  useEffect(() => {
    let made: string | undefined;
    let live = true;
    void keptPhoto(photoKey).then((file) => {
      if (!file || !live) return;
      made = URL.createObjectURL(file);
      setUrl(made);
    });
    return () => {
      live = false;
      if (made) URL.revokeObjectURL(made);
    };
  }, [photoKey]);
  return url ? <img src={url} alt={alt} className="h-24 w-24 border border-rule object-cover" /> : null;
}

/**
 * "Take a photo": the phone's camera (`capture`), the photo made smaller on the device (2000 px long edge,
 * upright, location removed unless kept), kept on the device and sent in the inspection's queue.
 */
export function PhotoCapture({
  inspectionId,
  itemId,
  label,
  disabled,
}: {
  inspectionId: string;
  itemId: string;
  label: string;
  disabled?: boolean;
}) {
  const id = useId();
  const [keepLocation, setKeepLocation] = useState(false);
  const [problem, setProblem] = useState<string>();
  const [busy, setBusy] = useState(false);
  const upload = useUploadPhoto(inspectionId);

  const take = async (file: File | undefined) => {
    setProblem(undefined);
    if (!file) return;
    if (!file.type.startsWith('image/')) return setProblem('That file is not a photo.');
    if (file.size > MAX_PHOTO_BYTES) return setProblem('That photo is larger than 15 MB.');
    setBusy(true);
    try {
      const small = await shrinkPhoto(file, { keepLocation });
      const photoKey = newPhotoKey();
      await keepPhoto(photoKey, small);
      upload.mutate({ inspectionId, itemId, label, photoKey });
    } catch (e) {
      setProblem(e instanceof Error ? e.message : 'The photo could not be read.');
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="flex flex-col gap-2">
      <PhotoButton id={`${id}-photo`} disabled={disabled || busy} onFile={(file) => void take(file)}>
        {busy ? 'Making the photo smaller…' : 'Take a photo'}
      </PhotoButton>
      <label className="flex min-h-11 items-center gap-3 text-sm">
        <input
          type="checkbox"
          className="h-6 w-6"
          checked={keepLocation}
          onChange={(e) => setKeepLocation(e.target.checked)}
        />
        Keep the photo’s location (removed unless ticked)
      </label>
      {problem ? (
        <p role="alert" className="text-sm font-semibold text-caution">
          <span aria-hidden="true">✕ </span>
          {problem}
        </p>
      ) : null}
    </div>
  );
}
