import { CHECKPOINT_KIND_LABELS, SignCheckpointSchema, SIGN_CHOICES, type SignChoiceSet, type SignGeometry } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { FieldError } from '@/components/ui/field';
import { SIGN_CHOICE_SET_LABELS, signChoiceLabel } from '@core/lessons/choice-labels';
import { AnsweredFields, answeredAnchors } from '../common/answered-fields';
import { BEHAVIOUR_ANCHORS, BehaviourFields } from '../common/behaviour-fields';
import { ChoiceField, MarkdownPathField } from '../common/fields';
import type { KindFormProps } from '../common/form-props';
import { FormSection, FormShell } from '../common/form-shell';
import { useProblemsAt } from '../common/problem-placement';
import { useBoundField } from '../common/use-bound-field';
import { useCheckpointForm } from '../common/use-checkpoint-form';
import { DerivedAnswer } from './derived-answer';
import { conductorOf, GeometryFields } from './geometry-fields';

type Answer = KindFormProps<'sign'>['checkpoint']['answer'];

const CHOICE_SETS = Object.keys(SIGN_CHOICES) as SignChoiceSet[];

/** A starting set-up: a loop in the xy-plane and a point on its axis. */
const STARTING_GEOMETRY: SignGeometry = { conductor: conductorOf('loop'), point: [0, 0, 0.02], component: 'z' };

/** Everything about a derived answer shows beside the diagram; a hand-set one at its choices. */
function anchors(source: Answer['source'], hintCount: number): string[] {
  const answer = source === 'set' ? 'answer.choice' : 'answer.geometry';
  return ['prompt', 'choiceSet', 'answer', answer, ...answeredAnchors(hintCount), ...BEHAVIOUR_ANCHORS];
}

/** Check your sign: the prompt, the choice set and the correct choice, set by hand or derived from a set-up. */
export function SignForm({ checkpoint, onChange, problems, lessonId, durationMs }: KindFormProps<'sign'>) {
  const form = useCheckpointForm(SignCheckpointSchema, checkpoint, onChange);
  return (
    <FormShell
      form={form}
      title={`${CHECKPOINT_KIND_LABELS.sign} settings`}
      problems={problems}
      anchors={anchors(checkpoint.answer.source, checkpoint.hints.length)}
      env={{ lessonId, durationMs }}
    >
      <FormSection title="Question">
        <MarkdownPathField path="prompt" label="Question" maxLength={LIMITS.promptMax} />
        <ChoiceSetField />
      </FormSection>
      <FormSection title="Correct answer">
        <AnswerFields />
      </FormSection>
      <FormSection title="Scoring and help">
        <AnsweredFields />
      </FormSection>
      <FormSection title="On the timeline">
        <BehaviourFields />
      </FormSection>
    </FormShell>
  );
}

function ChoiceSetField() {
  const choiceSet = useBoundField<SignChoiceSet>('choiceSet');
  const answer = useBoundField<Answer>('answer');
  return (
    <ChoiceField
      path="choiceSet"
      label="The student chooses"
      choices={CHOICE_SETS.map((value) => ({ value, label: SIGN_CHOICE_SET_LABELS[value] }))}
      onPick={(next) => {
        choiceSet.set(next);
        // A hand-set answer from another set cannot stay: the teacher picks again from the new one.
        const current = answer.value;
        if (current?.source === 'set' && !(SIGN_CHOICES[next] as readonly string[]).includes(current.choice)) {
          answer.set({ source: 'set', choice: SIGN_CHOICES[next][0] });
        }
      }}
    />
  );
}

function AnswerFields() {
  const choiceSet = useBoundField<SignChoiceSet>('choiceSet');
  const answer = useBoundField<Answer>('answer');
  const set = choiceSet.value ?? 'axis';
  const current = answer.value;
  const problems = useProblemsAt('answer');
  return (
    <div className="flex flex-col gap-4">
      <FieldError message={problems} />
      <ChoiceField
        path="answer.source"
        label="How the correct answer is set"
        choices={[
          { value: 'set', label: 'I choose it', hint: 'Pick the correct choice yourself.' },
          {
            value: 'geometry',
            label: 'Derive it from a set-up',
            hint: 'Describe a loop or wire and a point; the engine applies the right-hand rule.',
          },
        ]}
        onPick={(source) => {
          if (source === current?.source) return;
          answer.set(
            source === 'set' ? { source: 'set', choice: SIGN_CHOICES[set][0] } : { source: 'geometry', geometry: STARTING_GEOMETRY },
          );
        }}
      />
      {current?.source === 'set' ? (
        <ChoiceField
          path="answer.choice"
          label="Correct choice"
          choices={SIGN_CHOICES[set].map((value) => ({ value, label: signChoiceLabel(value) }))}
        />
      ) : null}
      {current?.source === 'geometry' ? (
        <div className="grid gap-6 lg:grid-cols-2">
          <GeometryFields choiceSet={set} />
          <DerivedAnswer geometry={current.geometry} choiceSet={set} />
        </div>
      ) : null}
    </div>
  );
}
