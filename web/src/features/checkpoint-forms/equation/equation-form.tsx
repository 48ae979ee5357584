import { useMemo } from 'react';
import { CHECKPOINT_KIND_LABELS, EquationCheckpointSchema, type LessonProblem, type LiveModel } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { liveModelProblems } from '@core/lessons/models';
import { LatexField } from '@/components/physics/latex-field';
import { BEHAVIOUR_ANCHORS, BehaviourFields } from '../common/behaviour-fields';
import { MarkdownPathField } from '../common/fields';
import type { KindFormProps } from '../common/form-props';
import { FormSection, FormShell } from '../common/form-shell';
import { useBoundField } from '../common/use-bound-field';
import { useCheckpointForm } from '../common/use-checkpoint-form';
import { EquationPreview } from './equation-preview';
import { LiveModelFields, liveModelAnchors } from './live-model-fields';

/** The model's own rules, checked as the teacher types, beside the ones the last save returned. */
function withLocalProblems(problems: readonly LessonProblem[], model: LiveModel | null): LessonProblem[] {
  if (!model) return [...problems];
  const seen = new Set(problems.map((p) => `${p.path}\n${p.message}`));
  const local = liveModelProblems(model)
    .map((p) => ({ path: p.path ? `model.${p.path}` : 'model', message: p.message }))
    .filter((p) => !seen.has(`${p.path}\n${p.message}`));
  return [...problems, ...local];
}

/** An equation card: the formula (LaTeX), a caption, and optionally a live model with sliders and a plot. */
export function EquationForm({ checkpoint, onChange, problems, lessonId, durationMs }: KindFormProps<'equation'>) {
  const form = useCheckpointForm(EquationCheckpointSchema, checkpoint, onChange);
  const all = useMemo(() => withLocalProblems(problems, checkpoint.model), [problems, checkpoint.model]);
  return (
    <FormShell
      form={form}
      title={`${CHECKPOINT_KIND_LABELS.equation} settings`}
      problems={all}
      anchors={['latex', 'caption', ...liveModelAnchors(checkpoint.model), ...BEHAVIOUR_ANCHORS]}
      env={{ lessonId, durationMs }}
    >
      <FormSection title="Formula">
        <LatexBoundField />
        <MarkdownPathField path="caption" label="Caption" hint="Shown under the formula (Markdown)." maxLength={LIMITS.promptMax} />
      </FormSection>
      <FormSection title="Live model">
        <LiveModelFields />
      </FormSection>
      <FormSection title="Preview">
        <EquationPreview />
      </FormSection>
      <FormSection title="On the timeline">
        <BehaviourFields />
      </FormSection>
    </FormShell>
  );
}

function LatexBoundField() {
  const latex = useBoundField<string>('latex');
  return (
    <LatexField
      label="Formula (LaTeX)"
      hint={`Display-mode LaTeX, such as B = \\frac{\\mu_0 N I}{2a}. At most ${LIMITS.latexMax} characters.`}
      value={latex.value ?? ''}
      onChange={latex.set}
      error={latex.error}
    />
  );
}
