import { memo } from 'react';
import { CHECKPOINT_KIND_LABELS, NoteCheckpointSchema } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { InfoIcon } from '@/components/ui/icons';
import { BEHAVIOUR_ANCHORS, BehaviourFields } from '../common/behaviour-fields';
import { ChoiceField, MarkdownPathField } from '../common/fields';
import type { KindFormProps } from '../common/form-props';
import { FormSection, FormShell } from '../common/form-shell';
import { useBoundField } from '../common/use-bound-field';
import { useCheckpointForm } from '../common/use-checkpoint-form';

/** A note on the video: a remark, or a safety caution. */
export function NoteForm({ checkpoint, onChange, problems, lessonId, durationMs }: KindFormProps<'note'>) {
  const form = useCheckpointForm(NoteCheckpointSchema, checkpoint, onChange);
  return (
    <FormShell
      form={form}
      title={`${CHECKPOINT_KIND_LABELS.note} settings`}
      problems={problems}
      anchors={['tone', 'body', ...BEHAVIOUR_ANCHORS]}
      env={{ lessonId, durationMs }}
    >
      <NoteFields />
    </FormShell>
  );
}

/** The fields, memoised: each reads its own value from the form (see FormShell). */
const NoteFields = memo(function NoteFields() {
  return (
    <>
      <FormSection title="Note">
        <ChoiceField
          path="tone"
          label="Kind of note"
          choices={[
            { value: 'remark', label: 'Remark', hint: 'Something to notice or remember at this moment.' },
            { value: 'safety', label: 'Safety caution', hint: 'Shown with a caution sign, such as a hot coil or a charged capacitor.' },
          ]}
        />
        <SafetyLine />
        <MarkdownPathField path="body" label="Text" maxLength={LIMITS.promptMax} />
      </FormSection>
      <FormSection title="On the timeline">
        <BehaviourFields />
      </FormSection>
    </>
  );
});

function SafetyLine() {
  const tone = useBoundField<string>('tone');
  if (tone.value !== 'safety') return null;
  return (
    <p className="flex items-start gap-1.5 rounded-md bg-copper-soft p-2 text-sm">
      <InfoIcon className="mt-0.5 size-4 shrink-0" />
      <span>A caution here adds to the school’s own safety rules and local regulations, which always apply.</span>
    </p>
  );
}
