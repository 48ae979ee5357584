import { AlertIcon, CheckIcon, InfoIcon, SpinnerIcon } from '@/components/ui/icons';
import { Button } from '@/components/ui/button';
import { plural } from '@/lib/format';
import { cn } from '@/lib/cn';
import type { HoldReason, OutboxStatus } from '../outbox/answer-outbox';

type SendStatusProps = {
  status: OutboxStatus;
  online: boolean;
  /** At least one answer was given here (recorded or waiting): until then nothing is called saved. */
  anyGiven: boolean;
  /** The signed-in student's name, for the held messages. */
  name: string;
  onRetry: () => void;
  className?: string;
};

function heldText(reason: HoldReason, waiting: string, name: string): string {
  switch (reason) {
    case 'signed-out':
      return `${waiting} saved on this device, and you are signed out. Sign in again as ${name} on this device to send them.`;
    case 'other-user':
      return `${waiting} saved on this device for ${name}, but someone else is signed in on this browser now. They are sent when ${name} signs in here again.`;
    case 'other-role':
      return `${waiting} saved on this device. Switch back to your student role to send them.`;
    case 'other-school':
      return `${waiting} saved on this device for another school. Switch back to that school to send them.`;
  }
}

const HOW_ANSWERS_GO = 'Each answer is recorded as you give it. On a bad connection it is kept on this device until it gets through.';

/**
 * Where the answers are, said honestly: none given yet, all recorded ("Saved"), one on its way
 * ("Sending…"), or kept on this device until the connection (or the right sign-in) is back, with how many.
 */
export function SendStatus({ status, online, anyGiven, name, onRetry, className }: SendStatusProps) {
  const waiting = plural(status.unsent, 'answer');
  let tone: 'ok' | 'busy' | 'wait' = 'ok';
  let title: string;
  let detail: string | null = null;
  let retry = false;
  if (status.state === 'held' && status.held) {
    tone = 'wait';
    title = `Not sent (${waiting})`;
    detail = heldText(status.held, plural(status.unsent, 'answer is', 'answers are'), name);
  } else if (status.unsent === 0 && !anyGiven) {
    title = 'No answers yet';
    detail = HOW_ANSWERS_GO;
  } else if (status.unsent === 0) {
    title = 'Saved';
    detail = HOW_ANSWERS_GO;
  } else if (status.state === 'sending') {
    tone = 'busy';
    title = 'Sending…';
    detail = status.unsent > 1 ? `${waiting} on their way, one at a time.` : null;
  } else if (!online) {
    tone = 'wait';
    title = `Waiting for connection (${waiting})`;
    detail = 'You are offline. Your answers are kept on this device and sent when the connection returns; you can keep watching.';
  } else {
    tone = 'wait';
    title = `Waiting to send (${waiting})`;
    detail = 'The server could not be reached just now. Your answers are kept on this device and sent again shortly.';
    retry = true;
  }
  const Icon = tone === 'ok' ? CheckIcon : tone === 'busy' ? SpinnerIcon : status.state === 'held' ? AlertIcon : InfoIcon;
  return (
    <div
      role="status"
      aria-live="polite"
      data-send-state={status.unsent > 0 ? status.state : anyGiven ? 'saved' : 'none'}
      className={cn(
        'flex flex-wrap items-start gap-x-3 gap-y-1 rounded-md border-l-4 px-3 py-2',
        tone === 'wait' ? 'border-copper bg-copper-soft' : 'border-teal bg-teal-soft',
        className,
      )}
    >
      <Icon className={cn('mt-0.5 size-5 shrink-0', tone === 'wait' ? 'text-copper' : 'text-teal', tone === 'busy' && 'animate-spin')} />
      <div className="min-w-0 flex-1">
        <p className="font-bold">{title}</p>
        {detail ? <p className="text-sm">{detail}</p> : null}
        {status.deviceStorage ? null : (
          <p className="text-sm font-bold">
            This browser cannot keep answers on this device (a private window, or its storage is full): stay online while you answer,
            because an answer that cannot be sent is not kept.
          </p>
        )}
      </div>
      {retry ? (
        <Button size="sm" variant="secondary" onClick={onRetry}>
          Send now
        </Button>
      ) : null}
    </div>
  );
}
