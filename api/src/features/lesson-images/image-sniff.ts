import { fileTypeFromBuffer } from 'file-type';
import { describeMime } from '../../processing/file-kinds';

/** Pictures every browser shows and that cannot carry script (SVG can, so it is refused). */
export const LESSON_IMAGE_TYPES = ['image/png', 'image/jpeg', 'image/gif', 'image/webp'] as const;
export type LessonImageType = (typeof LESSON_IMAGE_TYPES)[number];

const ACCEPTED = 'PNG, JPEG, GIF or WebP';

export type SniffedImage = { ok: true; mime: LessonImageType; extension: string } | { ok: false; message: string };

/** SVG is text, so file-type names it XML or nothing: look for its root element near the start. */
function looksLikeSvg(bytes: Buffer): boolean {
  return /<svg[\s>/]/i.test(bytes.subarray(0, 4096).toString('latin1'));
}

/**
 * The real type of an uploaded image from its bytes (file-type), never from its name or the
 * declared type: a PDF renamed `.png` is still a PDF. Returns the sentence the teacher reads when
 * it is not one of the accepted types.
 */
export async function sniffImage(bytes: Buffer): Promise<SniffedImage> {
  const found = await fileTypeFromBuffer(bytes);
  if ((LESSON_IMAGE_TYPES as readonly string[]).includes(found?.mime ?? '')) {
    return { ok: true, mime: found!.mime as LessonImageType, extension: found!.ext };
  }
  if (looksLikeSvg(bytes)) {
    return {
      ok: false,
      message: `This file is an SVG drawing, which Pinfield does not accept because it can carry scripts: save it as a PNG or JPEG and add it again.`,
    };
  }
  const kind = describeMime(found?.mime, found?.ext);
  if (!kind.recognised) return { ok: false, message: `Pinfield does not recognise this file as an image: use ${ACCEPTED}.` };
  if (kind.mime.startsWith('image/')) {
    return { ok: false, message: `This file is ${kind.label}, which not every browser shows: save it as ${ACCEPTED} and add it again.` };
  }
  return { ok: false, message: `This file is ${kind.label}, not an image (${ACCEPTED}).` };
}
