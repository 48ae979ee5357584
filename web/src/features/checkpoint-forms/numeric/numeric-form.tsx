import { memo } from 'react';
import { CHECKPOINT_KIND_LABELS, NumericCheckpointSchema } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { placeholderNames } from '@core/lessons/placeholders';
import { MarkdownField } from '@/components/rich-text/markdown-field';
import { AnsweredFields, answeredAnchors } from '../common/answered-fields';
import { BEHAVIOUR_ANCHORS, BehaviourFields } from '../common/behaviour-fields';
import { TextField } from '../common/fields';
import { useFormEnv } from '../common/form-env';
import type { KindFormProps } from '../common/form-props';
import { FormSection, FormShell } from '../common/form-shell';
import { joinMessages, useBoundField } from '../common/use-bound-field';
import { useCheckpointForm } from '../common/use-checkpoint-form';
import { DistractorsList } from './distractors-list';
import { SamplePreview } from './sample-preview';
import { ToleranceFields } from './tolerance-fields';
import { VariablesList } from './variables-list';

type Numeric = KindFormProps<'numeric'>['checkpoint'];

function anchors(checkpoint: Numeric): string[] {
  const variables = checkpoint.variables.flatMap((_, i) =>
    ['', '.name', '.unit', '.role', '.min', '.max', '.step'].map((field) => `variables.${i}${field}`),
  );
  const distractors = checkpoint.distractors.flatMap((_, i) => [
    `distractors.${i}`,
    `distractors.${i}.formula`,
    `distractors.${i}.feedback`,
  ]);
  const sigFigs = checkpoint.sigFigs ? ['sigFigs.min', 'sigFigs.max', 'sigFigs.penalty'] : [];
  return [
    'prompt',
    'expected',
    'askedUnit',
    'variables',
    'relativeTolerancePercent',
    'absoluteTolerance',
    'sigFigs',
    'requireUnit',
    'distractors',
    ...variables,
    ...distractors,
    ...sigFigs,
    ...answeredAnchors(checkpoint.hints.length),
    ...BEHAVIOUR_ANCHORS,
  ];
}

/** Same wording as the publish rule (numericProblems), so the live check and the server's never both show. */
function placeholderProblems(prompt: string, declared: readonly string[]): string | undefined {
  const list = declared.length === 0 ? 'no variables are declared yet' : `declared: ${declared.join(', ')}`;
  const unknown = placeholderNames(prompt).filter((name) => !declared.includes(name));
  return joinMessages(...unknown.map((name) => `{{${name}}} is not a declared variable (${list}).`));
}

/** A numeric question: the expected quantity or formula, variables drawn per student, tolerance and mistakes. */
export function NumericForm({ checkpoint, onChange, problems, lessonId, durationMs }: KindFormProps<'numeric'>) {
  const form = useCheckpointForm(NumericCheckpointSchema, checkpoint, onChange);
  return (
    <FormShell
      form={form}
      title={`${CHECKPOINT_KIND_LABELS.numeric} settings`}
      problems={problems}
      anchors={anchors(checkpoint)}
      env={{ lessonId, durationMs }}
    >
      <NumericFields />
    </FormShell>
  );
}

/** The fields, memoised: each reads its own value from the form (see FormShell). */
const NumericFields = memo(function NumericFields() {
  return (
    <>
      <FormSection title="Question">
        <PromptField />
        <VariablesList />
        <TextField
          path="expected"
          label="Expected answer"
          hint="A quantity such as 62.8 uT, or a formula over the variables such as mu0*N*I/(2*a) (constants: pi, e, mu0). Write units after numbers: 4.5 cm, 2 A; uT or µT for microtesla."
          mono
        />
        <TextField
          path="askedUnit"
          label="Asked unit"
          hint="The unit the question asks for, such as mT or µT; the answer must have its dimension. Empty: a plain number."
          mono
        />
        <SamplePreview />
      </FormSection>
      <FormSection title="Marking">
        <ToleranceFields />
        <DistractorsList />
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

function PromptField() {
  const prompt = useBoundField<string>('prompt');
  const variables = useBoundField<Numeric['variables']>('variables');
  const { lessonId } = useFormEnv();
  const declared = (variables.value ?? []).map((v) => v.name);
  const live = placeholderProblems(prompt.value ?? '', declared);
  const example = declared[0] ?? 'a';
  return (
    <MarkdownField
      label="Question"
      hint={`Write {{${example}}} where a student's own drawn value of ${example} should appear, with its unit.`}
      value={prompt.value ?? ''}
      onChange={prompt.set}
      error={joinMessages(prompt.zodError, live, prompt.problem)}
      lessonId={lessonId || undefined}
      maxLength={LIMITS.promptMax}
    />
  );
}
