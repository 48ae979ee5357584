import { useId, useState } from 'react';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { ProblemMessage } from './problem-message';
import { SubmitRow } from './submit-row';
import type { AnswerFormProps } from './answer-props';

export function ShortTextAnswer({ locked, busy, problem, onSubmit }: AnswerFormProps<'short-text'>) {
  const [text, setText] = useState('');
  const problemId = useId();
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        onSubmit({ kind: 'short-text', text });
      }}
    >
      <Field label="Your answer">
        {({ id, ...control }) => (
          <Input
            id={id}
            aria-describedby={[control['aria-describedby'], problem ? problemId : null].filter(Boolean).join(' ') || undefined}
            invalid={Boolean(problem)}
            autoComplete="off"
            value={text}
            disabled={locked || busy}
            onChange={(event) => setText(event.target.value)}
          />
        )}
      </Field>
      <ProblemMessage id={problemId} problem={problem} />
      <SubmitRow label="Check my answer" busy={busy} locked={locked} />
    </form>
  );
}
