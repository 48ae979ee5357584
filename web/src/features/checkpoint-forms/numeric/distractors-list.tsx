import type { CheckpointOf } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { newKey } from '@core/lessons/new-key';
import { MarkdownPathField, TextField } from '../common/fields';
import { ListEditor } from '../common/list-editor';
import { useBoundField } from '../common/use-bound-field';

type Distractor = CheckpointOf<'numeric'>['distractors'][number];

/** Formulas for the mistakes a teacher expects, each with the feedback a student who made it gets. */
export function DistractorsList() {
  const distractors = useBoundField<Distractor[]>('distractors');
  const items = distractors.value ?? [];
  return (
    <ListEditor
      path="distractors"
      legend="Expected mistakes"
      hint="An answer that matches one of these formulas gets its feedback (the engine already checks a diameter slip and forgotten turns from the variable roles)."
      items={items}
      onChange={distractors.set}
      itemName={(index) => `Mistake ${index + 1}`}
      newItem={() => ({ id: newKey(6), formula: '', feedback: '' })}
      addLabel="Add a mistake"
      max={LIMITS.distractorsMax}
      itemKey={(item) => item.id}
      error={distractors.zodError}
      renderItem={(_, index) => (
        <>
          <TextField
            path={`distractors.${index}.formula`}
            label={`Mistake ${index + 1} formula`}
            hint="Such as mu0*N*I/a (the radius used as a diameter)."
            mono
          />
          <MarkdownPathField
            path={`distractors.${index}.feedback`}
            label={`Mistake ${index + 1} feedback`}
            small
            maxLength={LIMITS.feedbackMax}
          />
        </>
      )}
    />
  );
}
