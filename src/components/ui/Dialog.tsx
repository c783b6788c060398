import { type ReactNode, useEffect, useId, useRef } from 'react';

/**
 * A native modal `<dialog>` shown while `open`: centred in view wherever the page is scrolled, focus kept
 * inside, Escape calls `onClose`. Focus starts on the element marked `data-autofocus`, else the browser's
 * first focusable one.
 */
export function Dialog({
  open,
  title,
  children,
  onClose,
}: {
  open: boolean;
  title: ReactNode;
  children: ReactNode;
  onClose: () => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (open && d && !d.open) {
      d.showModal();
      d.querySelector<HTMLElement>('[data-autofocus]')?.focus();
    }
    if (!open && d?.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className="m-auto w-[min(34rem,calc(100vw-2rem))] rounded-sm border border-ink bg-paper p-5 text-ink backdrop:bg-ink/50"
    >
      <h2 id={titleId} className="mb-3 text-xl">
        {title}
      </h2>
      {children}
    </dialog>
  );
}
