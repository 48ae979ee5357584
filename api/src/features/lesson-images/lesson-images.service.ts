import { randomUUID } from 'node:crypto';
import type { Readable } from 'node:stream';
import { GetObjectCommand } from '@aws-sdk/client-s3';
import type { Knex } from 'knex';
import type { LessonImageDto } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import { AppError, NotFoundError, ValidationError } from '../../errors';
import { StorageUnavailableError, type ObjectStorage } from '../../storage/object-storage';
import { loadEditableLesson } from '../lessons/lesson-access';
import { sniffImage } from './image-sniff';
import { findLessonImage, insertLessonImage, lessonImageKey, type LessonImageRow } from './lesson-images.repository';

export const lessonImageUrl = (imageId: string) => `/api/lesson-images/${imageId}`;

/** Alt text from the file name: no extension, nothing that would end the Markdown image early. */
export function altTextOf(fileName: string): string {
  const alt = fileName
    .replace(/\.[A-Za-z0-9]{1,5}$/, '')
    .replace(/[[\]\\()<>*_`!]/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();
  return alt === '' ? 'image' : alt;
}

function present(row: LessonImageRow): LessonImageDto {
  const url = lessonImageUrl(row.id);
  return { id: row.id, url, markdown: `![${altTextOf(row.fileName)}](${url})`, contentType: row.contentType, size: row.size };
}

function isMissingObject(error: unknown): boolean {
  const e = error as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e?.name === 'NoSuchKey' || e?.name === 'NotFound' || e?.$metadata?.httpStatusCode === 404;
}

/** Images teachers put in prompts and notes: stored in the school's storage, served with their sniffed type. */
export function createLessonImagesService({ db, storage }: { db: Knex; storage: ObjectStorage }) {
  return {
    /** Checked before the body is read, so a refused upload costs no transfer. */
    loadEditableLesson: (actor: Actor, lessonId: string) => loadEditableLesson(db, actor, lessonId),

    async upload(actor: Actor, lessonId: string, fileName: string, bytes: Buffer): Promise<LessonImageDto> {
      const lesson = await loadEditableLesson(db, actor, lessonId);
      if (bytes.length === 0) {
        throw new ValidationError(
          `“${fileName}” is empty (0 bytes): choose the image again.`,
          [{ path: 'body', message: 'The file is empty.' }],
          'image_invalid',
        );
      }
      const sniffed = await sniffImage(bytes);
      if (!sniffed.ok) throw new AppError(415, 'image_type_refused', sniffed.message);
      const id = randomUUID();
      const row: LessonImageRow = {
        id,
        schoolId: lesson.schoolId,
        lessonId: lesson.id,
        objectKey: lessonImageKey(lesson.schoolId, id),
        contentType: sniffed.mime,
        size: bytes.length,
        fileName,
      };
      // The object first: a row never points at bytes that were not stored.
      await storage.put(row.objectKey, bytes, row.contentType, bytes.length);
      try {
        await insertLessonImage(db, { ...row, uploadedBy: actor.userId });
      } catch (error) {
        await storage.deleteKeys([row.objectKey]).catch(() => undefined);
        throw error;
      }
      return present(row);
    },

    /** An image of the caller's school with a stream of its bytes; anything else is the same 404. */
    async open(actor: Actor, imageId: string): Promise<{ image: LessonImageRow; body: Readable }> {
      const image = await findLessonImage(db, actor.active.schoolId, imageId);
      if (!image) throw new NotFoundError('That image');
      try {
        const object = await storage.client.send(new GetObjectCommand({ Bucket: storage.bucket, Key: image.objectKey }));
        return { image, body: object.Body as Readable };
      } catch (error) {
        if (isMissingObject(error)) throw new NotFoundError('The file of that image');
        throw new StorageUnavailableError(error);
      }
    },
  };
}

export type LessonImagesService = ReturnType<typeof createLessonImagesService>;
