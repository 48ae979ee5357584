import type { IncomingMessage, RequestListener, ServerResponse } from 'node:http';
import type S3rver from 's3rver';
import AWSAccount from 's3rver/lib/models/account.js';
import S3Error from 's3rver/lib/models/error.js';
import type { S3Target } from './s3-http';
import { applyCors, parseTarget, sendError } from './s3-http';
import { routeMultipart } from './s3-multipart-routes';
import { checkSignature } from './s3-sigv4';
import { tolerateConcurrentDeletes } from './s3-store-fixes';
import { installUploadsStore } from './s3-uploads-store';

/** s3rver's accounts (S3RVER / S3RVER unless more are registered), as access key id -> secret. */
function knownSecrets(): Map<string, string> {
  const secrets = new Map<string, string>();
  for (const [accessKeyId, account] of AWSAccount.registry) {
    const secret = account.accessKeys.get(accessKeyId);
    if (secret !== undefined) secrets.set(accessKeyId, secret);
  }
  return secrets;
}

function isObjectRead(target: S3Target): boolean {
  return (target.method === 'GET' || target.method === 'HEAD') && target.key !== undefined;
}

/**
 * The fake's request listener: checks SigV4 signatures (s3rver does not), answers the multipart
 * operations s3rver lacks, and hands everything else to s3rver unchanged.
 */
export function createS3Handler(s3: S3rver, options: { pageLimit: number }): RequestListener {
  const passOn = s3.callback();
  const uploads = installUploadsStore(s3.store);
  tolerateConcurrentDeletes(s3.store);

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    let method = (req.method ?? 'GET').toUpperCase();
    let target: S3Target | undefined;
    try {
      target = parseTarget(req);
      method = target.method;
      // A CORS preflight carries no credentials, on S3 as here: s3rver's CORS rules answer it.
      const auth =
        method === 'OPTIONS'
          ? 'anonymous'
          : checkSignature({ method, path: target.path, rawQuery: target.rawQuery, headers: req.headers }, knownSecrets(), new Date());
      // The bucket is private, as the product's must be: an unsigned request reads and writes nothing.
      if (auth === 'anonymous' && method !== 'OPTIONS') throw new S3Error('AccessDenied', 'Access Denied');
      if (isObjectRead(target)) {
        // Media is served with nosniff so a browser never runs an upload as another type. Real S3
        // does not send it: in production the bucket's CDN/proxy adds it.
        res.setHeader('X-Content-Type-Options', 'nosniff');
      }
      if (await routeMultipart({ target, req, res, uploads, store: s3.store, auth, pageLimit: options.pageLimit })) return;
      passOn(req, res);
    } catch (error) {
      if (!(error instanceof S3Error)) console.error('[s3 fake] request failed:', error);
      const refusal =
        error instanceof S3Error ? error : new S3Error('InternalError', 'We encountered an internal error. Please try again.');
      // With CORS headers, a browser can read the refusal (say, an expired part URL) instead of a network error.
      if (target) await applyCors(s3.store, target, req, res);
      await sendError(res, req, refusal, method);
    }
  }

  return (req, res) => {
    void handle(req, res);
  };
}
