import { useId, useState } from 'react';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { ProblemMessage } from './problem-message';
import { SubmitRow } from './submit-row';
import type { AnswerFormProps } from './answer-props';

/** A number with its unit, typed freely; the server reads it (a unit it cannot read comes back as a problem, no attempt used). */
export function NumericAnswer({ checkpoint, locked, busy, problem, onSubmit }: AnswerFormProps<'numeric'>) {
  const [text, setText] = useState('');
  const problemId = useId();
  const unit = checkpoint.askedUnit.trim();
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        onSubmit({ kind: 'numeric', text });
      }}
    >
      <Field
        label={unit ? `Your answer, in ${unit}` : 'Your answer'}
        hint={unit ? `Type the number and its unit, for example 2.5 ${unit}.` : 'Type the number.'}
      >
        {({ id, ...control }) => (
          <div className="flex items-center gap-2">
            <Input
              id={id}
              aria-describedby={[control['aria-describedby'], problem ? problemId : null].filter(Boolean).join(' ') || undefined}
              invalid={Boolean(problem)}
              mono
              autoComplete="off"
              spellCheck={false}
              value={text}
              disabled={locked || busy}
              onChange={(event) => setText(event.target.value)}
              className="min-w-0 flex-1"
            />
            {unit ? (
              <span className="shrink-0 font-mono text-ink-muted" aria-hidden="true">
                {unit}
              </span>
            ) : null}
          </div>
        )}
      </Field>
      <ProblemMessage id={problemId} problem={problem} />
      <SubmitRow label="Check my answer" busy={busy} locked={locked} />
    </form>
  );
}
