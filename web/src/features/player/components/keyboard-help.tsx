import { cn } from '@/lib/cn';
import { HOTKEYS } from '../player-hotkeys';

/** The player's keyboard shortcuts, folded away until asked for. */
export function KeyboardHelp({ className }: { className?: string }) {
  return (
    // Phones have no keyboard to use them with; tablets with one get the list from the small breakpoint up.
    <details className={cn('hidden rounded-md border border-line bg-surface px-3 py-2 text-sm sm:block', className)}>
      <summary className="min-h-9 cursor-pointer py-1 font-bold">Keyboard shortcuts</summary>
      <p className="mt-1 text-ink-muted">With the video or one of its controls focused (click the video, or Tab to its play button):</p>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        {HOTKEYS.map((hotkey) => (
          <div key={hotkey.keys} className="contents">
            <dt className="font-mono">{hotkey.keys}</dt>
            <dd>{hotkey.does}</dd>
          </div>
        ))}
      </dl>
    </details>
  );
}
