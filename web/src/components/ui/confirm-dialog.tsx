import { useEffect, useId, useRef, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field';

type ConfirmDialogProps = {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  cancelLabel: string;
  busy?: boolean;
  /** Why the action failed, shown inside the dialog so the teacher can try again or keep things. */
  error?: string;
  onConfirm: () => void;
  onCancel: () => void;
};

/**
 * A modal question before something that cannot be undone. Focus starts on the safe choice, Escape keeps
 * things as they are, and focus returns to the button that opened it.
 */
export function ConfirmDialog({ open, title, children, confirmLabel, cancelLabel, busy, error, onConfirm, onCancel }: ConfirmDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const bodyId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!open || !dialog) return;
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    // showModal makes the rest of the page inert; environments without it get an open, non-modal dialog.
    if (typeof dialog.showModal === 'function') dialog.showModal();
    else dialog.setAttribute('open', '');
    dialog.querySelector<HTMLButtonElement>('[data-safe-choice]')?.focus();
    return () => {
      if (typeof dialog.close === 'function' && dialog.open) dialog.close();
      else dialog.removeAttribute('open');
      opener?.focus();
    };
  }, [open]);

  if (!open) return null;
  return (
    <dialog
      ref={ref}
      role="alertdialog"
      aria-modal="true"
      aria-labelledby={titleId}
      aria-describedby={bodyId}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-lg border border-line bg-surface p-6 text-ink shadow-xl backdrop:bg-ink/40"
      onCancel={(event) => {
        // Escape: the browser would close it on its own; let React state decide instead.
        event.preventDefault();
        if (!busy) onCancel();
      }}
      onKeyDown={(event) => {
        if (event.key === 'Escape' && !busy) {
          event.preventDefault();
          onCancel();
        }
      }}
    >
      <h2 id={titleId} className="text-xl">
        {title}
      </h2>
      <div id={bodyId} className="mt-2 text-ink-muted">
        {children}
      </div>
      <div className="mt-3">
        <FieldError message={error} />
      </div>
      <div className="mt-5 flex flex-wrap justify-end gap-2">
        <Button data-safe-choice variant="secondary" onClick={onCancel} disabled={busy}>
          {cancelLabel}
        </Button>
        <Button variant="danger" onClick={onConfirm} busy={busy}>
          {confirmLabel}
        </Button>
      </div>
    </dialog>
  );
}
