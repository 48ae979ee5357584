import type { Ref } from 'react';
import { CHECKPOINT_KIND_LABELS, type CheckpointAnswer, type StudentCheckpoint } from '@core/contracts';
import { formatTime } from '@core/lessons/time-format';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { canTryAgain, hasAnswered, tryAgainLabel, type AttemptRecord } from '../logic/attempts';
import { maySkip, type Overlay } from '../logic/player-state';
import { CheckpointBody } from './checkpoint-body';
import { RevealPanel } from './reveal-panel';

export type CheckpointOverlayProps = {
  overlay: Overlay;
  checkpoint: StudentCheckpoint;
  record: AttemptRecord;
  busy: boolean;
  /** Sending failed (network, server): the answer was not graded and may be sent again. */
  sendError: string | null;
  headingRef: Ref<HTMLHeadingElement>;
  /** Why answers are not shown yet (the reveal policy), or null. */
  revealNote: string | null;
  onSubmit: (answer: CheckpointAnswer) => void;
  onSkip: () => void;
  onContinue: () => void;
  onTryAgain: () => void;
};

/** Why the panel opened where it did; the gate's "answer first" goes once it is answered (or the answer is queued). */
function reasonText(overlay: Overlay, answeredHere: boolean): string | null {
  const at = formatTime(overlay.stop.atMs);
  if (overlay.reason === 'returned')
    return answeredHere ? null : `Answer this checkpoint before going past ${at}. The video came back here.`;
  if (overlay.reason === 'passed') return `You moved past the checkpoint at ${at}; here it is before you go on.`;
  return null;
}

/** The panel a paused video shows at a pin or a reveal: beside the video on wide screens, below it on phones. */
export function CheckpointOverlay(props: CheckpointOverlayProps) {
  const { overlay, checkpoint, record, busy, sendError, headingRef, revealNote } = props;
  const answerable = 'attempts' in checkpoint;
  const isReveal = overlay.stop.phase === 'reveal';
  const reason = reasonText(overlay, hasAnswered(record));
  const title = checkpoint.label.trim() || CHECKPOINT_KIND_LABELS[checkpoint.kind];
  const asking = overlay.phase === 'asking';
  const gateLocked = overlay.stop.behaviour === 'gate' && answerable && !hasAnswered(record);
  const showSkip = !isReveal && maySkip(overlay) && answerable && asking && !hasAnswered(record);
  const showContinue = isReveal || !answerable || (!asking && !gateLocked) || (asking && hasAnswered(record));
  const headingId = `checkpoint-${overlay.stop.id.replace(/[^a-z0-9]/g, '-')}-heading`;
  return (
    <section
      role="dialog"
      aria-modal="false"
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-lg border border-line-strong bg-paper p-4 shadow-lg sm:p-5"
    >
      <header className="flex flex-col gap-1">
        <p className="text-sm text-ink-muted">
          {isReveal ? 'Prediction: what happened' : CHECKPOINT_KIND_LABELS[checkpoint.kind]} · {formatTime(overlay.stop.atMs)}
          {overlay.stop.behaviour === 'gate' && !isReveal ? ' · answer to go on' : ''}
        </p>
        <h2
          id={headingId}
          ref={headingRef}
          tabIndex={-1}
          className="text-xl font-bold outline-none focus-visible:ring-2 focus-visible:ring-focus"
        >
          {title}
        </h2>
      </header>
      {reason ? <Banner tone="info">{reason}</Banner> : null}
      {isReveal && checkpoint.kind === 'prediction' ? (
        <RevealPanel checkpoint={checkpoint} record={record} busy={busy} revealNote={revealNote} onSubmit={props.onSubmit} />
      ) : (
        <CheckpointBody
          checkpoint={checkpoint}
          record={record}
          phase={overlay.phase}
          busy={busy}
          revealNote={revealNote}
          onSubmit={props.onSubmit}
        />
      )}
      {sendError ? (
        <Banner tone="error" title="The answer was not sent">
          {sendError}
        </Banner>
      ) : null}
      <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
        {showSkip ? (
          <Button variant="secondary" size="lg" onClick={props.onSkip}>
            Skip for now
          </Button>
        ) : null}
        {!asking && canTryAgain(record) && !isReveal && checkpoint.kind !== 'prediction' ? (
          <Button variant="secondary" size="lg" onClick={props.onTryAgain}>
            {tryAgainLabel(record)}
          </Button>
        ) : null}
        {showContinue ? (
          <Button size="lg" onClick={props.onContinue}>
            Continue
          </Button>
        ) : null}
      </div>
    </section>
  );
}
