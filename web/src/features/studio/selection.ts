import type { LessonContent } from '@core/contracts';
import type { Selection } from './panel/problems-list';

/** What a problem path opens: 'checkpoints.3.prompt' selects that checkpoint, 'chapters.0.endMs' that chapter. */
export function selectionFromProblemPath(content: LessonContent, path: string | null): Selection {
  if (!path) return null;
  const [area, index] = path.split('.');
  const position = Number(index);
  if (!Number.isInteger(position)) return null;
  if (area === 'checkpoints') {
    const checkpoint = content.checkpoints[position];
    return checkpoint ? { type: 'checkpoint', key: checkpoint.key } : null;
  }
  if (area === 'chapters') {
    const chapter = content.chapters[position];
    return chapter ? { type: 'chapter', key: chapter.key } : null;
  }
  return null;
}
