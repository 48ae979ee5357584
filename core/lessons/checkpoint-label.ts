import { CHECKPOINT_KIND_LABELS, type Checkpoint } from '../contracts/checkpoints';
import { firstWords, markdownToPlain } from './plain-text';

/** The text a checkpoint opens with: its prompt, an equation card's caption, a note's body. */
function leadingText(checkpoint: Checkpoint): string {
  switch (checkpoint.kind) {
    case 'equation':
      return checkpoint.caption;
    case 'note':
      return checkpoint.body;
    default:
      return checkpoint.prompt;
  }
}

/**
 * What a checkpoint is called on the timeline, in lists, results and messages: the teacher's label,
 * else the first words of its prompt without Markdown, else the kind's name.
 */
export function checkpointLabel(checkpoint: Checkpoint): string {
  const label = checkpoint.label.trim();
  if (label !== '') return label;
  const words = firstWords(markdownToPlain(leadingText(checkpoint)));
  return words !== '' ? words : CHECKPOINT_KIND_LABELS[checkpoint.kind];
}
