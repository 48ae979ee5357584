import type { LessonContent } from '@core/contracts';
import { checkpointLabel } from '@core/lessons/checkpoint-label';
import { formatTime } from '@core/lessons/time-format';

/** Where in the lesson a problem's path points, in words: "Checkpoint 4, “Field at the centre” (0:12.5)". */
export function problemPlace(path: string, content: LessonContent): string {
  const [area, index] = path.split('.');
  const position = Number(index);
  if (area === 'checkpoints' && Number.isInteger(position)) {
    const checkpoint = content.checkpoints[position];
    return checkpoint
      ? `Checkpoint ${position + 1}, “${checkpointLabel(checkpoint)}” (${formatTime(checkpoint.atMs)})`
      : `Checkpoint ${position + 1}`;
  }
  if (area === 'chapters' && Number.isInteger(position)) {
    const chapter = content.chapters[position];
    return chapter?.title ? `Chapter ${position + 1}, “${chapter.title}”` : `Chapter ${position + 1}`;
  }
  if (area === 'settings') return 'Lesson settings';
  return 'The lesson';
}
