import type { ReactNode } from 'react';

/**
 * A button-sized label that opens the camera (or the photo picker) through a hidden file input: 44 px high, for
 * a thumb on site. `onFile` gets the chosen photo; the input is emptied after, so the same photo can be taken
 * again.
 */
export function PhotoButton({
  id,
  children,
  disabled = false,
  onFile,
}: {
  id: string;
  children: ReactNode;
  disabled?: boolean;
  onFile: (file: File | undefined) => void;
}) {
  return (
    <>
      <label
        htmlFor={id}
        className={`inline-flex min-h-11 w-fit cursor-pointer items-center gap-2 rounded-sm border border-ink px-4 py-2 text-base font-semibold ${disabled ? 'opacity-55' : 'hover:bg-paper-sunk'}`}
      >
        <span aria-hidden="true">▣</span> {children}
      </label>
      <input
        id={id}
        type="file"
        accept="image/*"
        capture="environment"
        className="sr-only"
        disabled={disabled}
        onChange={(e) => {
          onFile(e.target.files?.[0]);
          e.target.value = '';
        }}
      />
    </>
  );
}
