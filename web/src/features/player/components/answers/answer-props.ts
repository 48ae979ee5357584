import type { CheckpointAnswer, StudentCheckpoint } from '@core/contracts';

export type AnswerFormProps<K extends StudentCheckpoint['kind']> = {
  checkpoint: Extract<StudentCheckpoint, { kind: K }>;
  /** Graded and not being tried again: the answer stays on show, read-only. */
  locked: boolean;
  busy: boolean;
  /** The server's reading problem with the last answer (no attempt used), shown by the field. */
  problem: string | null;
  onSubmit: (answer: CheckpointAnswer) => void;
};
