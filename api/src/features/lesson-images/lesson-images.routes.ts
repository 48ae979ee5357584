import { pipeline } from 'node:stream/promises';
import express, { Router, type RequestHandler } from 'express';
import { create as contentDisposition } from 'content-disposition';
import { z } from 'zod';
import { IdSchema } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { AppError } from '../../errors';
import { requireRole, signedIn } from '../../middleware/access';
import { toValidationError, validateParams } from '../../middleware/validate';
import type { LessonImagesService } from './lesson-images.service';

const LessonParams = z.object({ lessonId: IdSchema });
const ImageParams = z.object({ imageId: IdSchema });
const MIB = 1024 * 1024;

/** Headers carry Latin-1 only, so the browser sends the name URI-encoded (encodeURIComponent). */
export const ImageUploadHeadersSchema = z.object({
  'x-file-name': z
    .string({ error: 'Send the image’s file name in the X-File-Name header (URI-encoded).' })
    .transform((value, ctx) => {
      try {
        return decodeURIComponent(value).trim();
      } catch {
        ctx.addIssue({ code: 'custom', message: 'The X-File-Name header is not a URI-encoded name (encode it with encodeURIComponent).' });
        return z.NEVER;
      }
    })
    .pipe(
      z
        .string()
        .min(1, { error: 'The X-File-Name header is empty: send the image’s file name.' })
        .max(LIMITS.fileNameMax, { error: `A file name has at most ${LIMITS.fileNameMax} characters.` })
        // eslint-disable-next-line no-control-regex -- control characters are exactly what is refused
        .refine((name) => !/[\u0000-\u001f\u007f]/.test(name), { error: 'A file name cannot contain control characters.' }),
    ),
});

function validateUploadHeaders(): RequestHandler {
  return (req, res, next) => {
    const parsed = ImageUploadHeadersSchema.safeParse(req.headers);
    if (!parsed.success) return next(toValidationError(parsed.error, 'headers'));
    res.locals.fileName = parsed.data['x-file-name'];
    next();
  };
}

/** The raw bytes, on this route only; over the limit is a 413 that says the limit. */
function imageBody(): RequestHandler {
  const raw = express.raw({ type: () => true, limit: LIMITS.lessonImageBytesMax });
  return (req, res, next) => {
    raw(req, res, (error?: unknown) => {
      if ((error as { type?: string } | undefined)?.type === 'entity.too.large') {
        const limit = LIMITS.lessonImageBytesMax / MIB;
        return next(
          new AppError(
            413,
            'payload_too_large',
            `This image is larger than ${limit} MiB: make it smaller (or save it as JPEG) and add it again.`,
          ),
        );
      }
      next(error);
    });
  };
}

/** Mounted at /api: uploading an image into a lesson, and serving it to members of the school. */
export function lessonImagesRoutes(images: LessonImagesService): Router {
  const router = Router();

  router.post(
    '/lessons/:lessonId/images',
    requireRole('teacher', 'admin'),
    validateParams(LessonParams),
    validateUploadHeaders(),
    async (req, res, next) => {
      await images.loadEditableLesson(req.actor!, res.locals.params.lessonId);
      next();
    },
    imageBody(),
    async (req, res) => {
      const bytes = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
      res.status(201).json(await images.upload(req.actor!, res.locals.params.lessonId, res.locals.fileName as string, bytes));
    },
  );

  router.get('/lesson-images/:imageId', signedIn(), validateParams(ImageParams), async (req, res) => {
    const { image, body } = await images.open(req.actor!, res.locals.params.imageId);
    res.set({
      // The type sniffed at upload, never one a browser guesses: nosniff, and no document powers.
      'Content-Type': image.contentType,
      'Content-Length': String(image.size),
      'X-Content-Type-Options': 'nosniff',
      'Content-Disposition': contentDisposition(image.fileName, { type: 'inline' }),
      'Content-Security-Policy': "default-src 'none'; sandbox",
      'Cache-Control': 'private, max-age=86400',
    });
    await pipeline(body, res);
  });

  return router;
}
