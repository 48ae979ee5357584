import { useId } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { FEEDBACK_POLICIES, FEEDBACK_POLICY_LABELS, REVEAL_POLICIES, REVEAL_POLICY_LABELS } from '@core/contracts';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { FEEDBACK_POLICY_HINTS, REVEAL_POLICY_HINTS } from '../assignment-labels';
import type { EditFormValues } from '../form-values';
import { defaultLateUntil, schoolDateTime } from '../school-time';
import { PolicyChoice } from './policy-choice';
import { SchoolTimeField } from './school-time-field';

const FEEDBACK_OPTIONS = FEEDBACK_POLICIES.map((value) => ({
  value,
  label: FEEDBACK_POLICY_LABELS[value],
  hint: FEEDBACK_POLICY_HINTS[value],
}));
const REVEAL_OPTIONS = REVEAL_POLICIES.map((value) => ({ value, label: REVEAL_POLICY_LABELS[value], hint: REVEAL_POLICY_HINTS[value] }));

type PolicyFieldsProps = { timeZone: string; locale: string; now: Date };

/**
 * The dates and policies of an assignment, shared by the assign and edit forms (inside their FormProvider):
 * dates in the school's zone, late answers, when feedback and answers show, and what counts as done.
 */
export function PolicyFields({ timeZone, locale, now }: PolicyFieldsProps) {
  const { register, control, formState, getValues, setValue } = useFormContext<EditFormValues>();
  const [opensAt, dueAt, acceptLate, lateUntil] = useWatch({ control, name: ['opensAt', 'dueAt', 'acceptLate', 'lateUntil'] });
  const { errors } = formState;
  const lateId = useId();
  const lateToggle = register('acceptLate');

  return (
    <>
      <fieldset className="flex flex-col gap-4">
        <legend className="mb-1 text-lg font-bold">Dates</legend>
        <p className="-mt-2 text-sm text-ink-muted">
          In the school’s time zone, {timeZone}, wherever you are: it is now{' '}
          <span className="font-bold text-ink">{schoolDateTime(now.toISOString(), timeZone, locale)}</span> at the school.
        </p>
        <SchoolTimeField
          label="Opens"
          hint="Students can start watching and answering from this time."
          timeZone={timeZone}
          locale={locale}
          value={opensAt}
          registration={register('opensAt')}
          error={errors.opensAt?.message}
        />
        <SchoolTimeField
          label="Due"
          hint="Answers after this time are marked late."
          timeZone={timeZone}
          locale={locale}
          value={dueAt}
          registration={register('dueAt')}
          error={errors.dueAt?.message}
        />
        <div className="flex flex-col gap-1">
          <label htmlFor={lateId} className="flex cursor-pointer items-start gap-3">
            <input
              id={lateId}
              type="checkbox"
              aria-describedby={`${lateId}-hint`}
              className="mt-1 size-5 shrink-0 accent-teal"
              {...lateToggle}
              onChange={(event) => {
                void lateToggle.onChange(event);
                // Turning late answers on suggests a deadline two days after the due time, ready to adjust.
                if (event.target.checked && getValues('lateUntil') === '') {
                  setValue('lateUntil', defaultLateUntil(getValues('dueAt')));
                }
              }}
            />
            <span className="font-bold">Accept late answers</span>
          </label>
          <p id={`${lateId}-hint`} className="pl-8 text-sm text-ink-muted">
            {acceptLate
              ? 'After the due time, students can still answer until the time below; those answers are marked late.'
              : 'Off: the assignment closes at the due time and takes no more answers.'}
          </p>
        </div>
        {acceptLate ? (
          <SchoolTimeField
            label="Accept late answers until"
            hint="The assignment closes at this time."
            timeZone={timeZone}
            locale={locale}
            value={lateUntil}
            registration={register('lateUntil')}
            error={errors.lateUntil?.message}
          />
        ) : null}
      </fieldset>

      <PolicyChoice
        legend="When students see right or wrong"
        options={FEEDBACK_OPTIONS}
        registration={register('feedback')}
        error={errors.feedback?.message}
      />
      <PolicyChoice
        legend="When students see the correct answers"
        options={REVEAL_OPTIONS}
        registration={register('reveal')}
        error={errors.reveal?.message}
      />

      <Field
        label="Share of the recording to watch"
        hint="A student is done when every required checkpoint is answered and at least this much of the recording was watched."
        error={errors.completionWatchShare?.message}
      >
        {(control) => (
          <div className="flex items-center gap-2">
            <Input {...control} {...register('completionWatchShare')} inputMode="decimal" mono autoComplete="off" className="max-w-24" />
            <span className="text-ink-muted">%</span>
          </div>
        )}
      </Field>
    </>
  );
}
