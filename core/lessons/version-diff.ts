import type { Checkpoint } from '../contracts/checkpoints';
import type { LessonContent, VersionChanges } from '../contracts/lessons';
import { canonicalJson } from './canonical-json';
import { checkpointLabel } from './checkpoint-label';

const byTime = (a: Checkpoint, b: Checkpoint) => a.atMs - b.atMs;

/** Top-level fields whose values differ, in a stable order (the next version's fields first). */
function differingFields(previous: Record<string, unknown>, next: Record<string, unknown>, skip: string[] = []): string[] {
  const names = [...new Set([...Object.keys(next), ...Object.keys(previous)])];
  return names.filter((name) => !skip.includes(name) && canonicalJson(previous[name]) !== canonicalJson(next[name]));
}

/** Chapters compared as a set of ranges: the order they were listed in does not matter. */
function chaptersText(content: LessonContent): string {
  return canonicalJson([...content.chapters].sort((a, b) => a.startMs - b.startMs || a.key.localeCompare(b.key)));
}

/**
 * What changed from the previous version to the next, checkpoint by checkpoint by key: added,
 * removed, and edited with the top-level fields that differ ('atMs', 'expected', 'options'); whether
 * the chapters changed; which settings fields differ. Without a previous version everything is added.
 */
export function diffContent(previous: LessonContent | null, next: LessonContent): VersionChanges {
  const nextSorted = [...next.checkpoints].sort(byTime);
  if (previous === null) {
    return {
      added: nextSorted.map((c) => ({ key: c.key, label: checkpointLabel(c) })),
      removed: [],
      edited: [],
      chaptersChanged: next.chapters.length > 0,
      settings: [],
    };
  }
  const before = new Map(previous.checkpoints.map((c) => [c.key, c]));
  const after = new Set(next.checkpoints.map((c) => c.key));
  const added: VersionChanges['added'] = [];
  const edited: VersionChanges['edited'] = [];
  for (const checkpoint of nextSorted) {
    const old = before.get(checkpoint.key);
    if (!old) {
      added.push({ key: checkpoint.key, label: checkpointLabel(checkpoint) });
      continue;
    }
    const fields = differingFields(old, checkpoint, ['key']);
    if (fields.length > 0) edited.push({ key: checkpoint.key, label: checkpointLabel(checkpoint), fields });
  }
  const removed = [...previous.checkpoints]
    .sort(byTime)
    .filter((c) => !after.has(c.key))
    .map((c) => ({ key: c.key, label: checkpointLabel(c) }));
  return {
    added,
    removed,
    edited,
    chaptersChanged: chaptersText(previous) !== chaptersText(next),
    settings: differingFields(previous.settings, next.settings),
  };
}
