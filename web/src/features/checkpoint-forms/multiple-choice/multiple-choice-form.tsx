import { memo, useId } from 'react';
import { CHECKPOINT_KIND_LABELS, MultipleChoiceCheckpointSchema, type ChoiceOption } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { newKey } from '@core/lessons/new-key';
import { MarkdownField } from '@/components/rich-text/markdown-field';
import { AnsweredFields, answeredAnchors } from '../common/answered-fields';
import { BEHAVIOUR_ANCHORS, BehaviourFields } from '../common/behaviour-fields';
import { MarkdownPathField, ToggleField } from '../common/fields';
import type { KindFormProps } from '../common/form-props';
import { useFormEnv } from '../common/form-env';
import { FormSection, FormShell } from '../common/form-shell';
import { ListEditor } from '../common/list-editor';
import { useBoundField } from '../common/use-bound-field';
import { useCheckpointForm } from '../common/use-checkpoint-form';

function anchors(optionCount: number, hintCount: number): string[] {
  const options = Array.from({ length: optionCount }, (_, i) => [
    `options.${i}`,
    `options.${i}.text`,
    `options.${i}.correct`,
    `options.${i}.feedback`,
  ]);
  return ['prompt', 'options', 'allowSeveral', 'shuffle', ...options.flat(), ...answeredAnchors(hintCount), ...BEHAVIOUR_ANCHORS];
}

/** A multiple-choice question: the prompt, options with the correct one(s) and per-option feedback. */
export function MultipleChoiceForm({ checkpoint, onChange, problems, lessonId, durationMs }: KindFormProps<'multiple-choice'>) {
  const form = useCheckpointForm(MultipleChoiceCheckpointSchema, checkpoint, onChange);
  return (
    <FormShell
      form={form}
      title={`${CHECKPOINT_KIND_LABELS['multiple-choice']} settings`}
      problems={problems}
      anchors={anchors(checkpoint.options.length, checkpoint.hints.length)}
      env={{ lessonId, durationMs }}
    >
      <MultipleChoiceFields />
    </FormShell>
  );
}

/** The fields, memoised: each reads its own value from the form (see FormShell). */
const MultipleChoiceFields = memo(function MultipleChoiceFields() {
  return (
    <>
      <FormSection title="Question">
        <MarkdownPathField path="prompt" label="Question" maxLength={LIMITS.promptMax} />
        <CorrectnessRule />
        <OptionsList />
        <ToggleField path="shuffle" label="Shuffle the options" hint="Each student sees the options in their own order." />
      </FormSection>
      <FormSection title="Scoring and help">
        <AnsweredFields />
      </FormSection>
      <FormSection title="On the timeline">
        <BehaviourFields />
      </FormSection>
    </>
  );
});

/** One or several correct: going back to one keeps only the first option marked correct. */
function CorrectnessRule() {
  const several = useBoundField<boolean>('allowSeveral');
  const options = useBoundField<ChoiceOption[]>('options');
  const id = useId();
  function pick(next: boolean) {
    several.set(next);
    if (!next) {
      const first = options.value.findIndex((o) => o.correct);
      options.set(options.value.map((o, i) => ({ ...o, correct: i === first })));
    }
  }
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 font-bold">Correct answers</legend>
      <label className="flex items-center gap-2">
        <input type="radio" name={id} checked={!several.value} onChange={() => pick(false)} className="size-5 accent-teal" />
        <span>One option is correct</span>
      </label>
      <label className="flex items-center gap-2">
        <input type="radio" name={id} checked={Boolean(several.value)} onChange={() => pick(true)} className="size-5 accent-teal" />
        <span>Several may be correct (the student ticks every right one)</span>
      </label>
    </fieldset>
  );
}

function OptionsList() {
  const options = useBoundField<ChoiceOption[]>('options');
  const several = useBoundField<boolean>('allowSeveral');
  const group = useId();
  const items = options.value ?? [];
  return (
    <ListEditor
      path="options"
      legend="Options"
      hint={several.value ? 'Tick every correct option.' : 'Choose the one correct option.'}
      items={items}
      onChange={options.set}
      itemName={(index) => `Option ${index + 1}`}
      newItem={() => ({ id: newKey(6), text: '', correct: false, feedback: '' })}
      addLabel="Add an option"
      max={LIMITS.optionsMax}
      itemKey={(item) => item.id}
      error={options.zodError}
      renderItem={(item, index) => (
        <OptionFields
          index={index}
          several={Boolean(several.value)}
          group={group}
          onPickOnly={() => options.set(items.map((o, j) => ({ ...o, correct: j === index })))}
        />
      )}
    />
  );
}

function OptionFields({ index, several, group, onPickOnly }: { index: number; several: boolean; group: string; onPickOnly: () => void }) {
  const { lessonId } = useFormEnv();
  const text = useBoundField<string>(`options.${index}.text`);
  const correct = useBoundField<boolean>(`options.${index}.correct`);
  const feedback = useBoundField<string>(`options.${index}.feedback`);
  const name = `Option ${index + 1}`;
  return (
    <>
      <MarkdownField
        label={`${name} text`}
        value={text.value ?? ''}
        onChange={text.set}
        error={text.error}
        lessonId={lessonId || undefined}
        small
        maxLength={LIMITS.optionTextMax}
      />
      <label className="flex items-center gap-2 font-bold">
        <input
          type={several ? 'checkbox' : 'radio'}
          name={several ? undefined : group}
          checked={Boolean(correct.value)}
          onChange={(event) => (several ? correct.set(event.target.checked) : onPickOnly())}
          className="size-5 accent-teal"
        />
        {several ? `${name} is correct` : `${name} is the correct answer`}
      </label>
      {correct.error ? <p className="text-sm font-bold text-danger">{correct.error}</p> : null}
      <MarkdownField
        label={`Feedback for ${name.toLowerCase()}`}
        hint="Shown to a student who picked this option."
        value={feedback.value ?? ''}
        onChange={feedback.set}
        error={feedback.error}
        lessonId={lessonId || undefined}
        small
        maxLength={LIMITS.feedbackMax}
      />
    </>
  );
}
