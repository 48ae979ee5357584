import { useState } from 'react';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ErrorBanner } from '@/components/ui/error-banner';
import type { SchoolClock } from '@/lib/format';
import type { EditConflict } from '../draft/autosave';
import { clockTime } from './save-status';

type ConflictPanelProps = {
  conflict: EditConflict;
  clock: SchoolClock;
  /** Fetches the newer draft and shows it (my unsaved edits are dropped). */
  onLoadNewer: () => Promise<void>;
  onOverwrite: () => void;
};

/** Saving stopped because another tab or person saved first: the teacher chooses, nothing is overwritten silently. */
export function ConflictPanel({ conflict, clock, onLoadNewer, onOverwrite }: ConflictPanelProps) {
  const [loading, setLoading] = useState(false);
  const [error, setError] = useState<unknown>(null);
  const who = conflict.savedBy ? `in another tab or by ${conflict.savedBy}` : 'in another tab';
  return (
    <Banner tone="error" title="Saving is paused: this lesson changed elsewhere">
      <p>
        This lesson was saved {who} at {clockTime(conflict.savedAt, clock)}. Your latest edits are kept here.
      </p>
      <p className="mt-1 text-sm">
        Load the newer version to continue from it (your unsaved edits here are dropped), or keep yours and save them over it.
      </p>
      <div className="mt-2 flex flex-wrap gap-2">
        <Button
          size="sm"
          variant="secondary"
          busy={loading}
          onClick={() => {
            setLoading(true);
            setError(null);
            onLoadNewer()
              .catch((failure: unknown) => setError(failure))
              .finally(() => setLoading(false));
          }}
        >
          Load the newer version
        </Button>
        <Button size="sm" variant="danger" onClick={onOverwrite} disabled={loading}>
          Keep mine and overwrite
        </Button>
      </div>
      {error ? <ErrorBanner error={error} title="The newer version could not be loaded" className="mt-2" /> : null}
    </Banner>
  );
}
