import { memo, useId, useState } from 'react';
import { CHECKPOINT_KIND_LABELS, ShortTextCheckpointSchema, SPACING_RULES, type CheckpointOf } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { matchesAccepted } from '@core/lessons/short-text-match';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { AnsweredFields, answeredAnchors } from '../common/answered-fields';
import { BEHAVIOUR_ANCHORS, BehaviourFields } from '../common/behaviour-fields';
import { ChoiceField, MarkdownPathField, TextField, ToggleField } from '../common/fields';
import type { KindFormProps } from '../common/form-props';
import { FormSection, FormShell } from '../common/form-shell';
import { ListEditor } from '../common/list-editor';
import { useBoundField } from '../common/use-bound-field';
import { useCheckpointForm } from '../common/use-checkpoint-form';

type ShortText = CheckpointOf<'short-text'>;
type Spacing = ShortText['spacing'];

const SPACING: Record<Spacing, { label: string; hint: string }> = {
  exact: { label: 'Spaces as typed', hint: '“north pole” matches only “north pole”, not “north  pole”.' },
  collapse: {
    label: 'Extra spaces do not matter',
    hint: 'Runs of spaces count as one and the ends are trimmed: “ north   pole ” matches “north pole”.',
  },
  ignore: { label: 'Spaces do not count at all', hint: '“northpole” and “north pole” match each other.' },
};

function anchors(checkpoint: ShortText): string[] {
  const accepted = checkpoint.accepted.map((_, i) => `accepted.${i}`);
  return ['prompt', 'accepted', 'caseSensitive', 'spacing', ...accepted, ...answeredAnchors(checkpoint.hints.length), ...BEHAVIOUR_ANCHORS];
}

/** A short answer: the accepted answers and how strictly case and spacing are compared. */
export function ShortTextForm({ checkpoint, onChange, problems, lessonId, durationMs }: KindFormProps<'short-text'>) {
  const form = useCheckpointForm(ShortTextCheckpointSchema, checkpoint, onChange);
  return (
    <FormShell
      form={form}
      title={`${CHECKPOINT_KIND_LABELS['short-text']} settings`}
      problems={problems}
      anchors={anchors(checkpoint)}
      env={{ lessonId, durationMs }}
    >
      <ShortTextFields />
    </FormShell>
  );
}

/** The fields, memoised: each reads its own value from the form (see FormShell). */
const ShortTextFields = memo(function ShortTextFields() {
  return (
    <>
      <FormSection title="Question">
        <MarkdownPathField path="prompt" label="Question" maxLength={LIMITS.promptMax} />
        <AcceptedList />
        <ToggleField path="caseSensitive" label="Case matters" hint="When off, “Tesla” and “tesla” are the same answer." />
        <ChoiceField path="spacing" label="Spacing" choices={SPACING_RULES.map((value) => ({ value, ...SPACING[value] }))} />
        <TryAnswer />
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

function AcceptedList() {
  const accepted = useBoundField<string[]>('accepted');
  const items = accepted.value ?? [];
  return (
    <ListEditor
      path="accepted"
      legend="Accepted answers"
      hint="A student's answer is right when it matches any of these under the rules below."
      items={items}
      onChange={accepted.set}
      itemName={(index) => `Accepted answer ${index + 1}`}
      newItem={() => ''}
      addLabel="Add an accepted answer"
      max={LIMITS.acceptedAnswersMax}
      itemKey={(_, index) => String(index)}
      error={accepted.zodError}
      renderItem={(_, index) => <TextField path={`accepted.${index}`} label={`Accepted answer ${index + 1} text`} />}
    />
  );
}

/** Lets the teacher check an answer against the current rules before students do. */
function TryAnswer() {
  const accepted = useBoundField<string[]>('accepted');
  const caseSensitive = useBoundField<boolean>('caseSensitive');
  const spacing = useBoundField<Spacing>('spacing');
  const [answer, setAnswer] = useState('');
  const resultId = useId();
  const rules = { accepted: accepted.value ?? [], caseSensitive: Boolean(caseSensitive.value), spacing: spacing.value ?? 'collapse' };
  const right = answer !== '' && matchesAccepted(answer, rules);
  return (
    <Field label="Try an answer" hint="Not saved: type what a student might write to see whether it would count as right.">
      {(control) => (
        <div className="flex flex-col gap-1">
          <Input
            {...control}
            aria-describedby={[control['aria-describedby'], resultId].filter(Boolean).join(' ')}
            value={answer}
            onChange={(event) => setAnswer(event.target.value)}
            autoComplete="off"
          />
          <p id={resultId} aria-live="polite" className={right ? 'font-bold text-success' : 'text-ink-muted'}>
            {answer === '' ? '' : right ? 'Counts as right.' : 'Would not count as right.'}
          </p>
        </div>
      )}
    </Field>
  );
}
