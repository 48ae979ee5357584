import type { SchoolClock } from '@/lib/format';
import { Button } from '@/components/ui/button';
import { AlertIcon, CheckIcon, SpinnerIcon } from '@/components/ui/icons';
import type { SaveState } from '../draft/autosave';

/** "14:02" in the school's zone (falls back to the browser's when the zone is unknown). */
export function clockTime(iso: string, clock: SchoolClock): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  try {
    return new Intl.DateTimeFormat(clock.locale, { hour: '2-digit', minute: '2-digit', timeZone: clock.timeZone }).format(date);
  } catch {
    return new Intl.DateTimeFormat(undefined, { hour: '2-digit', minute: '2-digit' }).format(date);
  }
}

export function saveStateText(state: SaveState, clock: SchoolClock): string {
  switch (state.kind) {
    case 'saved':
      return `Saved · ${clockTime(state.savedAt, clock)}`;
    case 'pending':
    case 'saving':
      return 'Saving…';
    case 'retrying':
      return `Not saved — retrying in ${Math.round(state.retryInMs / 1000)} s`;
    case 'rejected':
      return 'Not saved — see the problem below';
    case 'conflict':
      return 'Not saved — saved elsewhere meanwhile';
  }
}

/** The draft's saving state in words (announced politely), with "Retry now" while waiting to retry. */
export function SaveStatus({ state, clock, onRetry }: { state: SaveState; clock: SchoolClock; onRetry: () => void }) {
  const failed = state.kind === 'retrying' || state.kind === 'rejected' || state.kind === 'conflict';
  const busy = state.kind === 'pending' || state.kind === 'saving';
  return (
    <div className="flex items-center gap-2">
      <p
        role="status"
        className={`flex items-center gap-1.5 text-sm font-bold ${failed ? 'text-danger' : 'text-ink-muted'}`}
        title={state.kind === 'retrying' ? state.message : undefined}
      >
        {failed ? (
          <AlertIcon className="size-4" />
        ) : busy ? (
          <SpinnerIcon className="size-4 animate-spin" />
        ) : (
          <CheckIcon className="size-4 text-success" />
        )}
        {saveStateText(state, clock)}
      </p>
      {state.kind === 'retrying' ? (
        <Button size="sm" variant="secondary" onClick={onRetry}>
          Retry now
        </Button>
      ) : null}
    </div>
  );
}
