import { join } from 'node:path';
import type { OidcAccount } from './oidc';
import { startOidcFake } from './oidc';
import type { RunningFake } from './server-lifecycle';
import { startS3Fake } from './s3';
import type { RunningSmtpFake } from './smtp';
import { startSmtpFake } from './smtp';

export type { OidcAccount } from './oidc';
export type { StoredMessage } from './smtp';

export interface FakeServicesOptions {
  host?: string;
  /** Parent folder for the fakes' data; S3 objects live in `<dataDir>/s3`. */
  dataDir: string;
  /** 0 picks a free port. */
  ports: { s3: number; oidc: number; smtp: number; mailWeb: number };
  oidc: { clientId: string; clientSecret: string; accounts: OidcAccount[] };
  s3: { bucket: string; corsOrigins: string[] };
}

export interface RunningFakeServices {
  urls: { s3: string; oidc: string; smtp: string; inbox: string };
  close(): Promise<void>;
}

function assertDistinctPorts(ports: FakeServicesOptions['ports']): void {
  const seen = new Map<number, string>();
  for (const [name, port] of Object.entries(ports)) {
    const other = seen.get(port);
    if (port !== 0 && other) throw new Error(`Fake services: ports.${other} and ports.${name} are both ${port}; give each its own port.`);
    seen.set(port, name);
  }
}

/** Starts the S3, OpenID Connect and SMTP stand-ins; if one fails, the others are closed again. */
export async function startFakeServices(options: FakeServicesOptions): Promise<RunningFakeServices> {
  const host = options.host ?? '127.0.0.1';
  assertDistinctPorts(options.ports);
  const [s3, oidc, smtp] = await Promise.allSettled([
    startS3Fake({
      host,
      port: options.ports.s3,
      directory: join(options.dataDir, 's3'),
      buckets: [{ name: options.s3.bucket, corsOrigins: options.s3.corsOrigins }],
    }),
    startOidcFake({ host, port: options.ports.oidc, ...options.oidc }),
    startSmtpFake({ host, smtpPort: options.ports.smtp, webPort: options.ports.mailWeb }),
  ]);

  const started: (RunningFake | RunningSmtpFake)[] = [];
  const failures: string[] = [];
  for (const result of [s3, oidc, smtp]) {
    if (result.status === 'fulfilled') started.push(result.value);
    else failures.push(result.reason instanceof Error ? result.reason.message : String(result.reason));
  }
  const closeAll = async (): Promise<void> => {
    await Promise.all(started.map((fake) => fake.close()));
  };
  if (s3.status !== 'fulfilled' || oidc.status !== 'fulfilled' || smtp.status !== 'fulfilled') {
    await closeAll();
    throw new Error(failures.join('\n'));
  }
  return {
    urls: { s3: s3.value.url, oidc: oidc.value.url, smtp: smtp.value.smtpUrl, inbox: smtp.value.inboxUrl },
    close: closeAll,
  };
}
