import type { CheckpointOf } from '../contracts/checkpoints';

type Rules = Pick<CheckpointOf<'short-text'>, 'caseSensitive' | 'spacing'>;

/** A text as the short-answer rules compare it: Unicode NFC, then the case and spacing rules. */
export function normaliseShortText(text: string, rules: Rules): string {
  let out = text.normalize('NFC');
  if (!rules.caseSensitive) out = out.toLowerCase();
  if (rules.spacing === 'collapse') out = out.replace(/\s+/g, ' ').trim();
  if (rules.spacing === 'ignore') out = out.replace(/\s+/g, '');
  return out;
}

/** Whether `answer` matches one of the non-empty accepted answers under the checkpoint's rules. */
export function matchesAccepted(answer: string, checkpoint: Rules & Pick<CheckpointOf<'short-text'>, 'accepted'>): boolean {
  const given = normaliseShortText(answer, checkpoint);
  return checkpoint.accepted.some((accepted) => accepted.trim() !== '' && normaliseShortText(accepted, checkpoint) === given);
}
