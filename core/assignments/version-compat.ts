import { CHECKPOINT_KIND_LABELS, isAnswered, type AnsweredCheckpoint } from '../contracts/checkpoints';
import type { LessonContent } from '../contracts/lessons';
import { canonicalJson } from '../lessons/canonical-json';
import { checkpointLabel } from '../lessons/checkpoint-label';

function answerable(content: LessonContent): Map<string, AnsweredCheckpoint> {
  const sorted = [...content.checkpoints].sort((a, b) => a.atMs - b.atMs);
  return new Map(sorted.filter(isAnswered).map((c) => [c.key, c]));
}

const kindName = (checkpoint: AnsweredCheckpoint) => CHECKPOINT_KIND_LABELS[checkpoint.kind].toLowerCase();

/**
 * Why an assignment cannot move from one version to another: a move keeps the students' answers,
 * so both versions must have the same answerable checkpoints (by key) of the same kinds. One
 * sentence per difference, in the order the checkpoints come; empty when the move is possible.
 */
export function moveProblems(from: LessonContent, to: LessonContent): string[] {
  const before = answerable(from);
  const after = answerable(to);
  const problems: string[] = [];
  for (const [key, old] of before) {
    const next = after.get(key);
    if (next === undefined) {
      problems.push(`The question “${checkpointLabel(old)}” (${key}) is not in the new version, so its answers would have nowhere to go.`);
    } else if (next.kind !== old.kind) {
      problems.push(
        `The question “${checkpointLabel(old)}” (${key}) is ${kindName(old)} in the current version and ${kindName(next)} in the new one.`,
      );
    }
  }
  for (const [key, next] of after) {
    if (!before.has(key))
      problems.push(
        `The new version adds the question “${checkpointLabel(next)}” (${key}); students assigned the current version never saw it.`,
      );
  }
  return problems;
}

/** Answerable checkpoints in both versions whose content differs (their answers are regraded), in the new version's time order. */
export function changedAnswerableKeys(from: LessonContent, to: LessonContent): string[] {
  const before = answerable(from);
  return [...answerable(to)]
    .filter(([key, next]) => {
      const old = before.get(key);
      return old !== undefined && canonicalJson(old) !== canonicalJson(next);
    })
    .map(([key]) => key);
}
