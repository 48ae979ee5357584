import express from 'express';
import helmet from 'helmet';
import type { Knex } from 'knex';
import type pg from 'pg';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import { csrfSync } from 'csrf-sync';
import type { Env } from './env';
import type { Mailer } from './mail/mailer';
import type { ObjectStorage } from './storage/object-storage';
import type { JobQueue } from './jobs/job-queue';
import { createSessionMiddleware } from './auth/session';
import { createCacheInvalidation } from './auth/cache-invalidation';
import { createPassport } from './auth/google';
import { loadActor } from './middleware/load-actor';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { publicAccess } from './middleware/access';
import { createSignInLimits } from './middleware/rate-limit';
import { createAuthService } from './features/auth/auth.service';
import { authRoutes } from './features/auth/auth.routes';
import { meRoutes } from './features/me/me.routes';
import { createClassesService } from './features/classes/classes.service';
import { classesRoutes } from './features/classes/classes.routes';
import { createDepartmentsService } from './features/departments/departments.service';
import { departmentsRoutes } from './features/departments/departments.routes';
import { createPeopleService } from './features/people/people.service';
import { peopleRoutes } from './features/people/people.routes';
import { schoolsRoutes } from './features/schools/schools.routes';
import { createUploadsService } from './features/uploads/uploads.service';
import { uploadsRoutes } from './features/uploads/uploads.routes';
import { createRecordingsServices } from './features/recordings/recordings.service';
import { recordingsRoutes } from './features/recordings/recordings.routes';
import { createLessonsServices } from './features/lessons/lessons.service';
import { lessonsRoutes } from './features/lessons/lessons.routes';
import { createLessonPreviewService } from './features/lessons/lesson-preview.service';
import { lessonPreviewRoutes } from './features/lessons/lesson-preview.routes';
import { createLessonTransferService } from './features/lessons/lesson-transfer.service';
import { lessonTransferRoutes } from './features/lessons/lesson-transfer.routes';
import { lessonVttRoutes } from './features/lessons/lesson-vtt.routes';
import { createLessonImagesService } from './features/lesson-images/lesson-images.service';
import { lessonImagesRoutes } from './features/lesson-images/lesson-images.routes';
import { createAssignmentContexts } from './features/responses/assignment-context';
import { createResponsesService } from './features/responses/responses.service';
import { responsesRoutes } from './features/responses/responses.routes';
import { createSubmitRateLimit } from './features/responses/submit-rate-limit';
import { createMediaUrls } from './features/recordings/media-urls';
import { createRecordingMediaService } from './features/recordings/recording-media.service';
import { createWatchService } from './features/watch/watch.service';
import { watchRoutes } from './features/watch/watch.routes';
import { beaconBody, csrfTokenOf, VIEWING_BEACON_ROUTE } from './features/watch/viewing-beacon';
import { createAssignmentsService } from './features/assignments/assignments.service';
import { assignmentsRoutes } from './features/assignments/assignments.routes';
import { webApp } from './web-app';

export interface AppDeps {
  env: Env;
  db: Knex;
  pool: pg.Pool;
  mailer: Mailer;
  logger: Logger;
  storage: ObjectStorage;
  jobs: JobQueue;
  demoAccounts: { email: string; name: string; label: string }[];
}

const LESSON_BODY_LIMIT = '4mb';

function trustProxy(value: string): boolean | number | string {
  if (value === 'true' || value === 'false') return value === 'true';
  return /^\d+$/.test(value) ? Number(value) : value;
}

/** The one composition root: builds services from their dependencies and mounts every route. */
export function createApp({ env, db, pool, mailer, logger, storage, jobs, demoAccounts }: AppDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  // API replies are per person and mostly no-store: hashing every body for an ETag buys nothing.
  app.set('etag', false);
  app.set('trust proxy', trustProxy(env.TRUST_PROXY));

  // The header, except for the viewing beacon (sendBeacon cannot set one): its token is in the body.
  const csrf = csrfSync({ getTokenFromRequest: csrfTokenOf });
  // Sessions, actors and assignment contexts are cached per process; every change reaches every process at once.
  const invalidation = createCacheInvalidation({ pool, logger });
  const passport = createPassport(env);
  const limits = createSignInLimits(db, env.SIGNIN_LIMIT_PER_EMAIL, env.SIGNIN_LIMIT_PER_ADDRESS);
  const auth = createAuthService({ db, mailer, limits, publicUrl: env.PUBLIC_URL, logger });
  const people = createPeopleService({ db, mailer, publicUrl: env.PUBLIC_URL, logger });
  const classes = createClassesService(db);
  const departments = createDepartmentsService(db);
  const authConfig = { demoMode: env.DEMO_MODE, demoAccounts: env.DEMO_MODE ? demoAccounts : [] };

  const https = env.PUBLIC_URL.startsWith('https://');
  const storageOrigin = new URL(env.S3_ENDPOINT).origin;
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Posters, part uploads and playback go straight between the browser and storage.
          'img-src': ["'self'", 'data:', 'blob:', storageOrigin],
          'connect-src': ["'self'", storageOrigin],
          'font-src': ["'self'", 'data:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'media-src': ["'self'", 'blob:', storageOrigin],
          // Upgrading would break a plain-http local or classroom-network install.
          'upgrade-insecure-requests': https ? [] : null,
        },
      },
      strictTransportSecurity: https,
    }),
  );
  if (env.LOG_LEVEL !== 'silent') {
    app.use(
      pinoHttp({
        logger,
        autoLogging: { ignore: (req) => req.url === '/api/health' || !req.url?.startsWith('/api/') },
        // One short line per request: headers and cookies stay out of the log.
        serializers: {
          req: (req: { method: string; url: string }) => ({ method: req.method, url: req.url }),
          res: (res: { statusCode: number }) => ({ status: res.statusCode }),
        },
      }),
    );
  }

  const api = express.Router();
  api.get('/health', publicAccess(), async (_req, res) => {
    await db.raw('SELECT 1');
    res.json({ ok: true });
  });
  // A whole lesson draft or lesson file may pass the general limit (LIMITS.lessonFileBytesMax and up to 200 checkpoints).
  api.use(['/lessons/import', '/lessons/:lessonId/draft'], express.json({ limit: LESSON_BODY_LIMIT }));
  api.use(express.json({ limit: env.BODY_LIMIT }));
  api.use(VIEWING_BEACON_ROUTE, beaconBody(env.BODY_LIMIT));
  api.use(createSessionMiddleware({ pool, secret: env.SESSION_SECRET, secure: env.PUBLIC_URL.startsWith('https://'), invalidation }));
  // Only the Google sign-in routes use passport (with session: false): no other request pays for it.
  api.use('/auth', passport.initialize());
  api.use(csrf.csrfSynchronisedProtection);
  api.use(loadActor(db, invalidation));
  const contexts = createAssignmentContexts({ db, invalidation });
  // The busiest route, first: a request does not walk every other router's routes to reach it.
  api.use(responsesRoutes(createResponsesService({ db, pool, contexts, rateLimit: createSubmitRateLimit(env.SUBMIT_RATE_PER_MINUTE) })));

  api.use('/auth', authRoutes({ db, auth, passport, csrf, config: authConfig }));
  api.use('/me', meRoutes({ csrf }));
  api.use('/admin', peopleRoutes(people));
  api.use(classesRoutes(classes));
  api.use(departmentsRoutes(departments));
  api.use(schoolsRoutes(db));
  api.use(uploadsRoutes(createUploadsService({ db, storage, jobs, env })));
  api.use(recordingsRoutes(createRecordingsServices({ db, storage, jobs, playbackMinutes: env.PLAYBACK_URL_MINUTES })));
  const lessons = createLessonsServices({ db, storage, playbackMinutes: env.PLAYBACK_URL_MINUTES });
  api.use(lessonsRoutes(lessons));
  api.use(lessonPreviewRoutes(createLessonPreviewService({ db })));
  api.use(lessonTransferRoutes(createLessonTransferService({ db, lessons: lessons.lessons })));
  api.use(lessonVttRoutes({ db }));
  api.use(lessonImagesRoutes(createLessonImagesService({ db, storage })));
  const mediaUrls = createMediaUrls(storage, env.PLAYBACK_URL_MINUTES);
  const recordingMedia = createRecordingMediaService({ db, storage, urls: mediaUrls });
  api.use(watchRoutes(createWatchService({ db, contexts, media: recordingMedia, urls: mediaUrls }), { publicUrl: env.PUBLIC_URL }));
  api.use(assignmentsRoutes(createAssignmentsService({ db, contexts })));
  api.use(apiNotFound);

  app.use('/api', api);
  app.use(webApp(env.WEB_DIST));
  app.use(errorHandler(logger));
  return app;
}
