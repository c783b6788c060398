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
  wide = false,
}: {
  open: boolean;
  title: ReactNode;
  children: ReactNode;
  onClose: () => void;
  /** A wider box (up to 56rem) for a drawing or a table. */
  wide?: boolean;
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
      className={`m-auto ${wide ? 'w-[min(56rem,calc(100vw-2rem))]' : 'w-[min(34rem,calc(100vw-2rem))]'} rounded-sm border border-ink bg-paper p-5 text-ink backdrop:bg-ink/50`}
    >
      <h2 id={titleId} className="mb-3 text-xl">
        {title}
      </h2>
      {children}
    </dialog>
  );
}
