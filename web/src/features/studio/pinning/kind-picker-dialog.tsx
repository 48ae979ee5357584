import { CHECKPOINT_KINDS, CHECKPOINT_KIND_LABELS, type CheckpointKind } from '@core/contracts';
import { KindIcon } from '../timeline/kind-icons';
import { formatTime } from '../time/format-time';
import { StudioDialog } from '../ui/studio-dialog';

/** "Pin here" from the transcript: which kind to pin at that line's start. */
export function KindPickerDialog({
  atMs,
  onPick,
  onClose,
}: {
  atMs: number | null;
  onPick: (kind: CheckpointKind) => void;
  onClose: () => void;
}) {
  return (
    <StudioDialog open={atMs !== null} title={`Pin at ${formatTime(atMs ?? 0)}`} onClose={onClose}>
      <p className="mb-3 text-ink-muted">Choose the kind of checkpoint.</p>
      <ul className="grid grid-cols-2 gap-2">
        {CHECKPOINT_KINDS.map((kind) => (
          <li key={kind}>
            <button
              type="button"
              className="flex min-h-11 w-full cursor-pointer items-center gap-2 rounded-md border border-line-strong px-3 text-left font-bold hover:bg-sunken"
              onClick={() => onPick(kind)}
            >
              <KindIcon kind={kind} className="size-5 shrink-0" />
              {CHECKPOINT_KIND_LABELS[kind]}
            </button>
          </li>
        ))}
      </ul>
    </StudioDialog>
  );
}
