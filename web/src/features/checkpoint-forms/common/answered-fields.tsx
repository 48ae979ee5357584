import { LIMITS } from '@core/limits';
import { MarkdownField } from '@/components/rich-text/markdown-field';
import { MarkdownPathField, NumberField, ToggleField } from './fields';
import { useFormEnv } from './form-env';
import { ListEditor } from './list-editor';
import { useBoundField } from './use-bound-field';

/** Whether the student must answer, what it is worth, how many tries, the hints and the explanation. */
export function AnsweredFields() {
  return (
    <div className="flex flex-col gap-4">
      <ToggleField
        path="required"
        label="Required"
        hint="Counts towards finishing the lesson; optional checkpoints may be left unanswered."
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField path="points" label="Points" hint={`0 to ${LIMITS.pointsMax}.`} />
        <NumberField path="attempts" label="Attempts allowed" hint={`1 to ${LIMITS.attemptsMax}.`} />
      </div>
      <HintsList />
      <MarkdownPathField
        path="explanation"
        label="Explanation"
        hint="Shown with the correct answer once the student has finished."
        maxLength={LIMITS.feedbackMax}
      />
    </div>
  );
}

function HintsList() {
  const hints = useBoundField<string[]>('hints');
  const items = hints.value ?? [];
  return (
    <ListEditor
      path="hints"
      legend="Hints"
      hint="Shown one by one after wrong attempts: the first hint after the first wrong answer, and so on."
      items={items}
      onChange={hints.set}
      itemName={(index) => `Hint ${index + 1}`}
      newItem={() => ''}
      addLabel="Add a hint"
      max={LIMITS.hintsMax}
      itemKey={(_, index) => String(index)}
      error={hints.zodError}
      renderItem={(_, index) => <HintField index={index} />}
    />
  );
}

function HintField({ index }: { index: number }) {
  const field = useBoundField<string>(`hints.${index}`);
  const { lessonId } = useFormEnv();
  return (
    <MarkdownField
      label={`Hint ${index + 1} text`}
      value={field.value ?? ''}
      onChange={field.set}
      error={field.error}
      lessonId={lessonId || undefined}
      small
      maxLength={LIMITS.feedbackMax}
    />
  );
}

/** The paths AnsweredFields renders, for the checkpoint's current hints. */
export function answeredAnchors(hintCount: number): string[] {
  return ['required', 'points', 'attempts', 'explanation', 'hints', ...Array.from({ length: hintCount }, (_, i) => `hints.${i}`)];
}
