import { render } from '@testing-library/react';
import userEvent, { PointerEventsCheckLevel } from '@testing-library/user-event';
import { useState } from 'react';
import { vi } from 'vitest';
import type { Checkpoint, CheckpointKind, CheckpointOf, LessonProblem } from '@core/contracts';
import { CheckpointForm } from './checkpoint-form';

// A whole checkpoint form is a long page for jsdom; on a busy two-core machine a test may pass 5 s.
vi.setConfig({ testTimeout: 30_000 });

export const LESSON_ID = '6d1f4a2b-3c5e-4f70-8a91-b2c3d4e5f607';

/** The studio's side of the form in tests: it keeps the checkpoint, as the studio does, and records every change. */
export function renderCheckpointForm<K extends CheckpointKind>(
  initial: CheckpointOf<K>,
  { problems = [], durationMs = 120_000 }: { problems?: LessonProblem[]; durationMs?: number } = {},
) {
  const onChange = vi.fn<(next: Checkpoint) => void>();
  let setFromOutside: (next: Checkpoint) => void = () => undefined;
  function Studio() {
    const [checkpoint, setCheckpoint] = useState<Checkpoint>(initial);
    setFromOutside = setCheckpoint;
    return (
      <CheckpointForm
        checkpoint={checkpoint}
        onChange={(next) => {
          onChange(next);
          setCheckpoint(next);
        }}
        problems={problems}
        lessonId={LESSON_ID}
        durationMs={durationMs}
      />
    );
  }
  // The pointer-events check walks every ancestor's computed style on each event: slow in jsdom with a long form.
  const user = userEvent.setup({ pointerEventsCheck: PointerEventsCheckLevel.Never, delay: null });
  const result = render(<Studio />);
  /** The last checkpoint the form sent, typed as the kind under test. */
  const last = () => onChange.mock.lastCall?.[0] as CheckpointOf<K> | undefined;
  return { ...result, user, onChange, last, setFromOutside: (next: Checkpoint) => setFromOutside(next) };
}
