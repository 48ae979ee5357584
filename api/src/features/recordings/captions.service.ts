import type { Knex } from 'knex';
import type { CaptionCreate, CaptionDto, CaptionUpdate } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import { ConflictError, NotFoundError, ValidationError } from '../../errors';
import * as captions from './captions.repository';
import { lockRecording } from './recordings.repository';
import { loadEditable, loadViewable } from './recording-access';
import { presentCaption } from './recordings.presenter';
import type { RecordingView } from './recordings.read-model';
import { validateWebVtt } from './caption-validation';

const UNIQUE_VIOLATION = '23505';
const LANGUAGE_HINT = 'Use a language tag such as en, en-GB or fr.';

/** "EN-gb" -> "en-GB": one spelling per language, so the same language cannot be added twice. */
export function canonicalLanguage(tag: string): string {
  try {
    const [canonical] = Intl.getCanonicalLocales(tag);
    if (canonical) return canonical;
  } catch {
    // RangeError: not a well-formed BCP 47 tag; answered below.
  }
  throw new ValidationError(`language: ${LANGUAGE_HINT}`, [{ path: 'language', message: LANGUAGE_HINT }]);
}

const exists = (language: string, label: string) =>
  new ConflictError(
    'caption_exists',
    `This recording already has captions in ${language} ("${label}"). Delete that track first to replace it.`,
  );

/** WebVTT caption tracks of a recording: several languages, exactly one default while any exist. */
export function createCaptionsService(db: Knex) {
  /** Runs a change with the recording locked, so defaults never race. */
  async function locked<T>(row: RecordingView, work: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
    return db.transaction(async (trx) => {
      if (!(await lockRecording(trx, row.schoolId, row.id))) throw new NotFoundError('That recording');
      return work(trx);
    });
  }

  async function captionOf(trx: Knex.Transaction, recordingId: string, captionId: string): Promise<captions.CaptionRow> {
    const caption = await captions.findCaption(trx, recordingId, captionId);
    if (!caption) throw new NotFoundError('That caption track');
    return caption;
  }

  return {
    /** Adds a track; the first one of a recording, or one sent with isDefault, becomes the default. */
    async create(actor: Actor, recordingId: string, input: CaptionCreate): Promise<CaptionDto> {
      const row = await loadEditable(db, actor, recordingId);
      const language = canonicalLanguage(input.language);
      const { cueCount } = validateWebVtt(input.vtt);
      return locked(row, async (trx) => {
        const taken = await captions.findCaptionByLanguage(trx, recordingId, language);
        if (taken) throw exists(language, taken.label);
        const isDefault = input.isDefault || (await captions.countCaptions(trx, recordingId)) === 0;
        if (isDefault) await captions.clearDefault(trx, recordingId);
        try {
          const created = await captions.insertCaption(trx, {
            recordingId,
            language,
            label: input.label,
            isDefault,
            vtt: input.vtt,
            cueCount,
          });
          return presentCaption(created);
        } catch (error) {
          if ((error as { code?: string }).code === UNIQUE_VIOLATION) throw exists(language, input.label);
          throw error;
        }
      });
    },

    async update(actor: Actor, recordingId: string, captionId: string, input: CaptionUpdate): Promise<CaptionDto> {
      return locked(await loadEditable(db, actor, recordingId), async (trx) => {
        const caption = await captionOf(trx, recordingId, captionId);
        if (input.isDefault === false && caption.isDefault) {
          const message = 'One caption track is always the default: make another track the default instead.';
          throw new ValidationError(message, [{ path: 'isDefault', message }]);
        }
        const makeDefault = input.isDefault === true && !caption.isDefault;
        if (makeDefault) await captions.clearDefault(trx, recordingId);
        await captions.updateCaption(trx, caption.id, { label: input.label, isDefault: makeDefault ? true : undefined });
        return presentCaption(await captionOf(trx, recordingId, caption.id));
      });
    },

    /** Deletes a track; when it was the default, the oldest remaining track becomes the default. */
    async remove(actor: Actor, recordingId: string, captionId: string): Promise<void> {
      await locked(await loadEditable(db, actor, recordingId), async (trx) => {
        const caption = await captionOf(trx, recordingId, captionId);
        await captions.deleteCaption(trx, caption.id);
        if (caption.isDefault) await captions.promoteOldestCaption(trx, recordingId);
      });
    },

    /** The WebVTT text of a track, for anyone who may see the recording. */
    async file(actor: Actor, recordingId: string, captionId: string): Promise<string> {
      const row = await loadViewable(db, actor, recordingId);
      const text = await captions.findCaptionText(db, row.id, captionId);
      if (text === undefined) throw new NotFoundError('That caption track');
      return text;
    },
  };
}

export type CaptionsService = ReturnType<typeof createCaptionsService>;
