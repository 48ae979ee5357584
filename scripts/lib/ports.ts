import { createServer } from 'node:net';

/** The two port profiles of the brief: `npm start`/`npm run dev` and `npm test` never share a port. */
export interface PortProfile {
  readonly app: number;
  readonly postgres: number;
  readonly s3: number;
  readonly oidc: number;
  readonly smtp: number;
  readonly mailWeb: number;
  /** Only the test profile drives a browser. */
  readonly cdp: number | null;
  /** Vite dev server (only `npm run dev`). */
  readonly viteDev: number | null;
}

export type ProfileName = 'start' | 'test';

export const HOST = '127.0.0.1';

export const profiles: Readonly<Record<ProfileName, PortProfile>> = {
  start: { app: 4310, postgres: 4311, s3: 4312, oidc: 4313, smtp: 4314, mailWeb: 4315, cdp: null, viteDev: 4316 },
  test: { app: 4320, postgres: 4321, s3: 4322, oidc: 4323, smtp: 4324, mailWeb: 4325, cdp: 4326, viteDev: null },
};

/** Every port a profile uses, for clash checks. */
export function portsOf(profile: PortProfile): number[] {
  return Object.values(profile).filter((p): p is number => typeof p === 'number');
}

/** Resolves when nothing listens on `host:port`; a clear error names the taken port otherwise. */
export function assertPortFree(port: number, purpose: string, hint: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', (error: NodeJS.ErrnoException) => {
      reject(
        new Error(
          error.code === 'EADDRINUSE'
            ? `Port ${port} on ${HOST} (${purpose}) is already in use. ${hint}`
            : `Cannot listen on ${HOST}:${port} (${purpose}): ${error.message}`,
        ),
      );
    });
    server.listen(port, HOST, () => server.close(() => resolve()));
  });
}
