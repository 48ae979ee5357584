import { useState } from 'react';
import type { CheckpointAnswer, StudentCheckpoint } from '@core/contracts';
import { RichText } from '@/components/rich-text/rich-text';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { AlertIcon, CheckIcon } from '@/components/ui/icons';
import { Textarea } from '@/components/ui/input';
import { isPending, latestAnswer, type AttemptRecord } from '../logic/attempts';
import { RevealText } from './grade-panel';

type PredictionCheckpoint = Extract<StudentCheckpoint, { kind: 'prediction' }>;
type PredictionAnswer = Extract<CheckpointAnswer, { kind: 'prediction' }>;

function predictionText(checkpoint: PredictionCheckpoint, answer: PredictionAnswer): string {
  if (answer.optionId !== null) return checkpoint.options?.find((o) => o.id === answer.optionId)?.text ?? answer.optionId;
  return answer.text ?? '';
}

type RevealPanelProps = {
  checkpoint: PredictionCheckpoint;
  record: AttemptRecord;
  busy: boolean;
  /** The reveal policy holds what happened back for now: say when it comes instead of asking for it. */
  revealNote?: string | null;
  onSubmit: (answer: CheckpointAnswer) => void;
};

/**
 * At the reveal time: the student's own prediction beside what happened, and the optional "Explain
 * the difference". What happened comes from the server's grade; when the first reply did not carry
 * it yet, sending the prediction again (with the explanation) asks for it. A prediction still waiting
 * on this device, or a policy that shows answers later, gets a sentence instead of that button.
 */
export function RevealPanel({ checkpoint, record, busy, revealNote = null, onSubmit }: RevealPanelProps) {
  const [explanation, setExplanation] = useState('');
  const latest = latestAnswer(record);
  const answer = latest?.kind === 'prediction' ? latest : null;
  if (!answer) return <p>You did not make a prediction here. Watch what happens next.</p>;
  const waiting = isPending(record);
  const reveal = !waiting && record.grade && !record.grade.invalid ? record.grade.reveal : null;
  const heldBack = waiting
    ? 'Your prediction is saved on this device and not graded yet; what happened is shown here once it has reached the server. Watch the video to see it.'
    : revealNote;
  const explained = answer.explanation !== null;
  const send = () => onSubmit({ ...answer, explanation: explanation.trim() === '' ? null : explanation });
  return (
    // Side by side only where the panel itself is wide enough (beside the video it is a narrow column).
    <div className="@container flex flex-col gap-4">
      <div className="grid gap-3 @md:grid-cols-2">
        <section aria-label="Your prediction" className="rounded-md border border-line-strong bg-surface px-3 py-2">
          <p className="font-bold">Your prediction</p>
          <RichText markdown={predictionText(checkpoint, answer)} />
        </section>
        <section aria-label="What happened" className="rounded-md border border-teal bg-teal-soft px-3 py-2">
          <p className="font-bold">What happened</p>
          {reveal && checkpoint.scored && record.grade?.correct !== null ? (
            <p className="flex items-center gap-2 font-bold">
              {record.grade?.correct ? <CheckIcon className="size-5 text-success" /> : <AlertIcon className="size-5 text-danger" />}
              {record.grade?.correct ? 'Your prediction matched.' : 'Your prediction did not match.'}
            </p>
          ) : null}
          {reveal ? (
            <RevealText
              answer={checkpoint.scored ? reveal.answer : ''}
              explanation={reveal.explanation}
              explanationLabel="The teacher’s account"
            />
          ) : heldBack ? (
            <p>{heldBack}</p>
          ) : (
            <p>Press “Show what happened” to compare.</p>
          )}
        </section>
      </div>
      {explained ? (
        <div>
          <p className="font-bold">Your explanation</p>
          <RichText markdown={answer.explanation ?? ''} />
        </div>
      ) : checkpoint.askExplanation ? (
        <Field label="Explain the difference (optional)" hint="What did you expect, what happened instead, and why?">
          {(control) => (
            <Textarea {...control} rows={3} value={explanation} disabled={busy} onChange={(event) => setExplanation(event.target.value)} />
          )}
        </Field>
      ) : null}
      {!reveal && !heldBack ? (
        <div>
          <Button busy={busy} onClick={send} className="w-full sm:w-auto">
            Show what happened
          </Button>
        </div>
      ) : checkpoint.askExplanation && !explained ? (
        <div>
          <Button busy={busy} variant="secondary" onClick={send} className="w-full sm:w-auto">
            Send my explanation
          </Button>
        </div>
      ) : null}
    </div>
  );
}
