import { useEffect, useId, useRef, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { CloseIcon } from '@/components/ui/icons';

type StudioDialogProps = {
  open: boolean;
  title: string;
  onClose: () => void;
  children: ReactNode;
  /** Buttons at the bottom; a Close button is always in the corner. */
  footer?: ReactNode;
  wide?: boolean;
};

/** A modal dialog (native <dialog>): Escape closes it and focus returns to what opened it. */
export function StudioDialog({ open, title, onClose, children, footer, wide = false }: StudioDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (!open || !dialog) return;
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    if (typeof dialog.showModal === 'function') dialog.showModal();
    else dialog.setAttribute('open', '');
    // Focus goes inside (showModal does this itself; the non-modal fallback does not).
    if (!dialog.contains(document.activeElement)) dialog.querySelector<HTMLElement>('button, textarea, input')?.focus();
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
      aria-labelledby={titleId}
      aria-modal="true"
      className={`m-auto max-h-[calc(100dvh-2rem)] rounded-lg border border-line bg-surface p-0 text-ink shadow-xl backdrop:bg-ink/40 ${wide ? 'w-[min(46rem,calc(100vw-2rem))]' : 'w-[min(34rem,calc(100vw-2rem))]'}`}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      onKeyDown={(event) => {
        // Also where <dialog> is not modal (no showModal): Escape closes it.
        if (event.key === 'Escape') {
          event.preventDefault();
          onClose();
        }
      }}
    >
      <div className="flex items-start justify-between gap-4 border-b border-line px-5 py-3">
        <h2 id={titleId} className="text-xl">
          {title}
        </h2>
        <Button size="sm" variant="ghost" onClick={onClose} aria-label="Close">
          <CloseIcon className="size-5" />
        </Button>
      </div>
      <div className="px-5 py-4">{children}</div>
      {footer ? <div className="flex flex-wrap justify-end gap-2 border-t border-line px-5 py-3">{footer}</div> : null}
    </dialog>
  );
}
