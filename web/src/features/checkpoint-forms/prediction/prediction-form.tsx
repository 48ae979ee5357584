import { memo, useId, useRef } from 'react';
import { CHECKPOINT_KIND_LABELS, PredictionCheckpointSchema, type CheckpointOf } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { markdownToPlain } from '@core/lessons/plain-text';
import { newKey } from '@core/lessons/new-key';
import { AnsweredFields, answeredAnchors } from '../common/answered-fields';
import { BEHAVIOUR_ANCHORS, BehaviourFields } from '../common/behaviour-fields';
import { ChoiceField, MarkdownPathField, ToggleField } from '../common/fields';
import type { KindFormProps } from '../common/form-props';
import { FormSection, FormShell } from '../common/form-shell';
import { ListEditor } from '../common/list-editor';
import { useBoundField } from '../common/use-bound-field';
import { useCheckpointForm } from '../common/use-checkpoint-form';
import { RevealTimeField } from './reveal-time-field';

type Prediction = CheckpointOf<'prediction'>;
type Response = Prediction['response'];
type ChoicesResponse = Extract<Response, { mode: 'choices' }>;

function anchors(checkpoint: Prediction): string[] {
  const options =
    checkpoint.response.mode === 'choices'
      ? checkpoint.response.options.flatMap((_, i) => [`response.options.${i}`, `response.options.${i}.text`])
      : [];
  return [
    'prompt',
    'response',
    'response.mode',
    'response.options',
    'response.correctOptionId',
    'revealAtMs',
    'revealText',
    'askExplanation',
    'scored',
    ...options,
    ...answeredAnchors(checkpoint.hints.length),
    ...BEHAVIOUR_ANCHORS,
  ];
}

/** Predict, observe, explain: the question, the choices or free text, and the later reveal. */
export function PredictionForm({ checkpoint, onChange, problems, lessonId, durationMs }: KindFormProps<'prediction'>) {
  const form = useCheckpointForm(PredictionCheckpointSchema, checkpoint, onChange);
  return (
    <FormShell
      form={form}
      title={`${CHECKPOINT_KIND_LABELS.prediction} settings`}
      problems={problems}
      anchors={anchors(checkpoint)}
      env={{ lessonId, durationMs }}
    >
      <PredictionFields />
    </FormShell>
  );
}

/** The fields, memoised: each reads its own value from the form (see FormShell). */
const PredictionFields = memo(function PredictionFields() {
  return (
    <>
      <FormSection title="Prediction">
        <MarkdownPathField path="prompt" label="Question" hint="What should the students predict?" maxLength={LIMITS.promptMax} />
        <ResponseFields />
      </FormSection>
      <FormSection title="Reveal">
        <RevealTimeField />
        <MarkdownPathField
          path="revealText"
          label="Reveal text"
          hint="Shown beside the student's prediction at the reveal."
          maxLength={LIMITS.promptMax}
        />
        <ToggleField
          path="askExplanation"
          label="Ask “explain the difference”"
          hint="At the reveal the student may write why what happened differs from their prediction."
        />
      </FormSection>
      <FormSection title="Scoring">
        <ScoringFields />
        <AnsweredFields />
      </FormSection>
      <FormSection title="On the timeline">
        <BehaviourFields />
      </FormSection>
    </>
  );
});

function ResponseFields() {
  const response = useBoundField<Response>('response');
  const scored = useBoundField<boolean>('scored');
  // Switching to free text and back within the session brings the same choices back.
  const lastChoices = useRef<ChoicesResponse | null>(null);
  const value = response.value;
  function pick(mode: Response['mode']) {
    if (mode === value.mode) return;
    if (value.mode === 'choices') {
      lastChoices.current = value;
      if (scored.value) scored.set(false);
      response.set({ mode: 'text' });
      return;
    }
    response.set(
      lastChoices.current ?? {
        mode: 'choices',
        options: [
          { id: newKey(6), text: '' },
          { id: newKey(6), text: '' },
        ],
        correctOptionId: null,
      },
    );
  }
  return (
    <>
      <ChoiceField
        path="response.mode"
        label="Students answer with"
        onPick={pick}
        choices={[
          { value: 'choices', label: 'Choices', hint: 'They pick one of your choices; the class’s spread is kept for results.' },
          { value: 'text', label: 'Free text', hint: 'They write their prediction in their own words.' },
        ]}
      />
      {value.mode === 'choices' ? <ChoicesList response={value} /> : null}
    </>
  );
}

function ChoicesList({ response }: { response: ChoicesResponse }) {
  const options = useBoundField<ChoicesResponse['options']>('response.options');
  const correct = useBoundField<string | null>('response.correctOptionId');
  const items = options.value ?? response.options;
  function change(next: ChoicesResponse['options']) {
    options.set(next);
    if (correct.value !== null && !next.some((o) => o.id === correct.value)) correct.set(null);
  }
  return (
    <ListEditor
      path="response.options"
      legend="Choices"
      items={items}
      onChange={change}
      itemName={(index) => `Choice ${index + 1}`}
      newItem={() => ({ id: newKey(6), text: '' })}
      addLabel="Add a choice"
      max={LIMITS.optionsMax}
      itemKey={(item) => item.id}
      error={options.zodError}
      renderItem={(_, index) => (
        <MarkdownPathField
          path={`response.options.${index}.text`}
          label={`Choice ${index + 1} text`}
          small
          maxLength={LIMITS.optionTextMax}
        />
      )}
    />
  );
}

/** Scoring only makes sense with choices: then one of them is the correct prediction. */
function ScoringFields() {
  const response = useBoundField<Response>('response');
  const scored = useBoundField<boolean>('scored');
  const correct = useBoundField<string | null>('response.correctOptionId');
  const group = useId();
  const choices = response.value.mode === 'choices' ? response.value.options : null;
  return (
    <div className="flex flex-col gap-3">
      <ToggleField
        path="scored"
        label="Score this prediction"
        disabled={choices === null}
        hint={
          choices === null
            ? 'Only a prediction with choices can be scored.'
            : 'Off: predictions are never right or wrong, only compared with what happened.'
        }
      />
      {scored.value && choices ? (
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 font-bold">Correct prediction</legend>
          {choices.map((option, index) => (
            <label key={option.id} className="flex items-center gap-2">
              <input
                type="radio"
                name={group}
                checked={correct.value === option.id}
                onChange={() => correct.set(option.id)}
                className="size-5 accent-teal"
              />
              <span>
                Choice {index + 1}
                {option.text.trim() ? `: ${markdownToPlain(option.text)}` : ''}
              </span>
            </label>
          ))}
        </fieldset>
      ) : null}
      {correct.error ? <p className="text-sm font-bold text-danger">{correct.error}</p> : null}
    </div>
  );
}
