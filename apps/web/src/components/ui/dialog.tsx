// A small modal dialog on the browser's own <dialog>: it traps focus, closes on Esc and gives focus
// back to what opened it. The content renders only while open, so every opening starts afresh.
import { useEffect, useId, useRef, type ReactNode } from 'react';

type DialogProps = {
  open: boolean;
  onClose: () => void;
  title: ReactNode;
  description?: ReactNode;
  children: ReactNode;
};

export function Dialog({ open, onClose, title, description, children }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const id = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={`${id}-title`}
      aria-describedby={description ? `${id}-description` : undefined}
      onClose={onClose}
      className="m-auto w-[30rem] max-w-[calc(100vw-2rem)] rounded-lg border border-line-strong bg-surface p-0 text-ink shadow-xl shadow-black/40 backdrop:bg-black/55"
    >
      {open && (
        <div className="px-5 pt-4 pb-5">
          <h2 id={`${id}-title`} className="text-base font-semibold">
            {title}
          </h2>
          {description && (
            <p id={`${id}-description`} className="mt-1 text-[13px] text-ink-muted">
              {description}
            </p>
          )}
          <div className="mt-4">{children}</div>
        </div>
      )}
    </dialog>
  );
}
