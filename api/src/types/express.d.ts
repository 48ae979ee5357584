import type { Actor } from '../auth/actor';

declare module 'express-session' {
  interface SessionData {
    userId?: string;
    activeSchoolId?: string;
    activeRole?: string;
    oauthReturn?: string;
  }
}

declare module 'express-serve-static-core' {
  interface Request {
    /** The signed-in person and their active membership, loaded once per request. */
    actor?: Actor;
  }
}
