import { DraftSavedDtoSchema, type DraftSave } from '@core/contracts';
import { api } from '@/lib/api-client';
import { lessonUrl } from './keys';

/**
 * Saves the whole draft. A draft with problems is still saved (the answer lists them); another tab's newer
 * revision answers 409 edit_conflict with EditConflictDetailsSchema details. The studio's autosave calls this.
 */
export const saveDraft = (lessonId: string, body: DraftSave) => api.put(lessonUrl(lessonId, '/draft'), body, DraftSavedDtoSchema);
