import { useEffect, useRef, useState } from 'react';
import { CHECKPOINT_KINDS, CHECKPOINT_KIND_LABELS, type CheckpointKind } from '@core/contracts';
import { Button } from '@/components/ui/button';
import { PlusIcon } from '@/components/ui/icons';
import { KindIcon } from '../timeline/kind-icons';
import { formatTime } from '../time/format-time';

type PinMenuProps = {
  /** The frame a pin would land on now. */
  atMs: number;
  onPin: (kind: CheckpointKind) => void;
  disabled?: boolean;
};

/** "Pin" with the seven kinds, each with its icon and its shortcut; pins at the current frame. */
export function PinMenu({ atMs, onPin, disabled }: PinMenuProps) {
  const [open, setOpen] = useState(false);
  const rootRef = useRef<HTMLDivElement>(null);
  const firstRef = useRef<HTMLButtonElement>(null);

  useEffect(() => {
    if (!open) return;
    firstRef.current?.focus();
    const onDown = (event: PointerEvent) => {
      if (rootRef.current && !rootRef.current.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener('pointerdown', onDown);
    return () => document.removeEventListener('pointerdown', onDown);
  }, [open]);

  return (
    <div ref={rootRef} className="relative">
      <Button aria-expanded={open} aria-haspopup="true" onClick={() => setOpen((value) => !value)} disabled={disabled}>
        <PlusIcon className="size-5" />
        Pin at {formatTime(atMs)}
      </Button>
      {open ? (
        <div
          role="group"
          aria-label="Checkpoint kinds"
          className="absolute top-full left-0 z-50 mt-1 w-72 rounded-lg border border-line bg-surface p-1 shadow-xl"
          onKeyDown={(event) => {
            if (event.key === 'Escape') {
              event.stopPropagation();
              setOpen(false);
            }
          }}
        >
          {CHECKPOINT_KINDS.map((kind, index) => (
            <button
              key={kind}
              ref={index === 0 ? firstRef : undefined}
              type="button"
              className="flex min-h-10 w-full cursor-pointer items-center gap-3 rounded-md px-3 text-left hover:bg-sunken"
              onClick={() => {
                setOpen(false);
                onPin(kind);
              }}
            >
              <KindIcon kind={kind} className="size-5 shrink-0" />
              <span className="flex-1 font-bold">{CHECKPOINT_KIND_LABELS[kind]}</span>
              <kbd className="font-mono text-sm text-ink-muted" aria-label={`shortcut P then ${index + 1}`}>
                P {index + 1}
              </kbd>
            </button>
          ))}
        </div>
      ) : null}
    </div>
  );
}
