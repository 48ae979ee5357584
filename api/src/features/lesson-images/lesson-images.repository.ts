import type { Db } from '../../db/knex';

export interface LessonImageRow {
  id: string;
  schoolId: string;
  lessonId: string | null;
  objectKey: string;
  /** Sniffed from the bytes at upload: what the image is served as. */
  contentType: string;
  size: number;
  fileName: string;
}

/** Every image of a school lives under the school's prefix (deleting a school's objects is one sweep). */
export const lessonImageKey = (schoolId: string, imageId: string) => `schools/${schoolId}/lesson-images/${imageId}`;

export async function insertLessonImage(db: Db, image: LessonImageRow & { uploadedBy: string }): Promise<void> {
  await db('lesson_images').insert({
    id: image.id,
    school_id: image.schoolId,
    lesson_id: image.lessonId,
    uploaded_by: image.uploadedBy,
    object_key: image.objectKey,
    content_type: image.contentType,
    size: image.size,
    file_name: image.fileName,
  });
}

/** One image of one school: never by id alone. */
export async function findLessonImage(db: Db, schoolId: string, imageId: string): Promise<LessonImageRow | undefined> {
  return db('lesson_images')
    .where({ id: imageId, school_id: schoolId })
    .first<LessonImageRow | undefined>(
      'id',
      'school_id as schoolId',
      'lesson_id as lessonId',
      'object_key as objectKey',
      'content_type as contentType',
      'size',
      'file_name as fileName',
    );
}
