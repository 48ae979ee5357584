import { useId, useState } from 'react';
import { signChoiceLabel } from '@core/lessons/choice-labels';
import { GeometryDiagram } from '@/components/physics';
import { cn } from '@/lib/cn';
import { ProblemMessage } from './problem-message';
import { SubmitRow } from './submit-row';
import type { AnswerFormProps } from './answer-props';

/** The choice set as large toggle buttons (pressed state in words and an outline, not colour alone), with the set-up drawn beside. */
export function SignAnswer({ checkpoint, locked, busy, problem, onSubmit }: AnswerFormProps<'sign'>) {
  const [choice, setChoice] = useState<string | null>(null);
  const problemId = useId();
  const groupId = useId();
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        onSubmit({ kind: 'sign', choice: choice ?? '' });
      }}
    >
      {checkpoint.figure ? <GeometryDiagram geometry={checkpoint.figure} className="mx-auto w-full max-w-xs" /> : null}
      <div role="group" aria-labelledby={groupId} aria-describedby={problem ? problemId : undefined} className="flex flex-col gap-2">
        <p id={groupId} className="font-bold">
          Choose your answer
        </p>
        <div className="grid grid-cols-1 gap-2 sm:grid-cols-2">
          {checkpoint.choices.map((value) => {
            const pressed = choice === value;
            return (
              <button
                key={value}
                type="button"
                aria-pressed={pressed}
                disabled={locked || busy}
                onClick={() => setChoice(value)}
                className={cn(
                  'flex min-h-12 items-center justify-center gap-2 rounded-md border px-3 py-2 font-bold',
                  pressed ? 'border-teal border-2 bg-teal-soft' : 'border-line-strong bg-surface hover:bg-sunken',
                )}
              >
                {pressed ? <span aria-hidden="true">●</span> : null}
                {signChoiceLabel(value)}
              </button>
            );
          })}
        </div>
      </div>
      <ProblemMessage id={problemId} problem={problem} />
      <SubmitRow label="Check my answer" busy={busy} locked={locked} />
    </form>
  );
}
