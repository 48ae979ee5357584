import type { CheckpointKind, CheckpointOf, LessonProblem } from '@core/contracts';

/** What each kind's form takes (the registry passes the studio's props through). */
export type KindFormProps<K extends CheckpointKind> = {
  checkpoint: CheckpointOf<K>;
  onChange: (next: CheckpointOf<K>) => void;
  /** Publish problems of this checkpoint, paths relative to it ('options.1.text'). */
  problems: readonly LessonProblem[];
  lessonId: string;
  /** The recording's length, for times inside it. */
  durationMs: number;
};
