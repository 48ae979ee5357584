import type { DraftSavedDto, LessonContent } from '@core/contracts';
import { isApiError } from '@/lib/api-client';
import { getLesson } from '@/features/lessons/api/get-lesson';
import { saveDraft } from '@/features/lessons/api/save-draft';
import { DraftConflictError } from '../draft/autosave';

/**
 * The autosave's save: PUT the whole draft. A 409 means another save came first; who saved it and when
 * is read from the lesson itself, so the conflict panel can say so whatever shape the error body has.
 */
export async function saveStudioDraft(lessonId: string, revision: number, content: LessonContent): Promise<DraftSavedDto> {
  try {
    return await saveDraft(lessonId, { revision, content });
  } catch (error) {
    if (!isApiError(error) || error.status !== 409) throw error;
    const newer = await getLesson(lessonId);
    throw new DraftConflictError({ revision: newer.revision, savedAt: newer.savedAt, savedBy: newer.savedBy?.name ?? null });
  }
}
