import { useId, useState } from 'react';
import { Field } from '@/components/ui/field';
import { Textarea } from '@/components/ui/input';
import { ChoiceList } from './choice-list';
import { ProblemMessage } from './problem-message';
import { SubmitRow } from './submit-row';
import type { AnswerFormProps } from './answer-props';

/** The prediction at the pin: a choice or free text. The reveal comes later in the recording. */
export function PredictionAnswer({ checkpoint, locked, busy, problem, onSubmit }: AnswerFormProps<'prediction'>) {
  const [chosen, setChosen] = useState<string[]>([]);
  const [text, setText] = useState('');
  const problemId = useId();
  const options = checkpoint.options;
  return (
    <form
      className="flex flex-col gap-3"
      onSubmit={(event) => {
        event.preventDefault();
        onSubmit(
          options
            ? { kind: 'prediction', optionId: chosen[0] ?? null, text: null, explanation: null }
            : { kind: 'prediction', optionId: null, text, explanation: null },
        );
      }}
    >
      {options ? (
        <ChoiceList
          legend="What do you predict?"
          options={options}
          several={false}
          chosen={chosen}
          disabled={locked || busy}
          onChange={setChosen}
          describedBy={problem ? problemId : undefined}
        />
      ) : (
        <Field label="What do you predict?" hint="Write it in a sentence or two; you will see it again when the video shows what happens.">
          {(control) => (
            <Textarea {...control} rows={3} value={text} disabled={locked || busy} onChange={(event) => setText(event.target.value)} />
          )}
        </Field>
      )}
      <ProblemMessage id={problemId} problem={problem} />
      <SubmitRow label="Save my prediction" busy={busy} locked={locked} />
    </form>
  );
}
