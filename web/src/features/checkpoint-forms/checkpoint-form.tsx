import type { ReactNode } from 'react';
import type { Checkpoint, CheckpointKind, CheckpointOf, LessonProblem } from '@core/contracts';
import type { KindFormProps } from './common/form-props';
import { EquationForm } from './equation/equation-form';
import { MultipleChoiceForm } from './multiple-choice/multiple-choice-form';
import { NoteForm } from './note/note-form';
import { NumericForm } from './numeric/numeric-form';
import { PredictionForm } from './prediction/prediction-form';
import { ShortTextForm } from './short-text/short-text-form';
import { SignForm } from './sign/sign-form';

export type CheckpointFormProps = {
  checkpoint: Checkpoint;
  /** Called with the whole edited checkpoint on every change. */
  onChange: (next: Checkpoint) => void;
  /** This checkpoint's publish problems, paths relative to it ('options.1.text'). */
  problems: LessonProblem[];
  lessonId: string;
  durationMs: number;
};

type AnyKindForm = (props: KindFormProps<CheckpointKind>) => ReactNode;

const FORMS: { [K in CheckpointKind]: (props: KindFormProps<K>) => ReactNode } = {
  'multiple-choice': MultipleChoiceForm,
  numeric: NumericForm,
  'short-text': ShortTextForm,
  equation: EquationForm,
  sign: SignForm,
  prediction: PredictionForm,
  note: NoteForm,
};

/**
 * The form for a checkpoint's kind. Keyed by the checkpoint's key and kind, so choosing another
 * checkpoint starts a fresh form instead of carrying one checkpoint's typing into the next.
 */
export function CheckpointForm({ checkpoint, onChange, problems, lessonId, durationMs }: CheckpointFormProps) {
  const Form = FORMS[checkpoint.kind] as AnyKindForm;
  return (
    <Form
      key={`${checkpoint.key}:${checkpoint.kind}`}
      checkpoint={checkpoint as CheckpointOf<CheckpointKind>}
      onChange={onChange as (next: CheckpointOf<CheckpointKind>) => void}
      problems={problems}
      lessonId={lessonId}
      durationMs={durationMs}
    />
  );
}
