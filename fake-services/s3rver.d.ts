// s3rver 3.7.1 ships no types; this covers only what the S3 fake (s3*.ts) uses, including a few of its
// internal modules (pinned version: their shape is read from node_modules/s3rver/lib).
declare module 's3rver' {
  import type { EventEmitter } from 'node:events';
  import type { IncomingMessage, ServerResponse } from 'node:http';
  import type { Readable } from 'node:stream';

  interface S3rverBucket {
    name: string;
    configs?: (string | Buffer)[];
  }

  interface S3rverOptions {
    address?: string;
    port?: number;
    silent?: boolean;
    serviceEndpoint?: string;
    directory?: string;
    resetOnClose?: boolean;
    allowMismatchedSignatures?: boolean;
    vhostBuckets?: boolean;
    configureBuckets?: S3rverBucket[];
  }

  /** A rule of a bucket's stored CORS configuration (lib/models/config.js). */
  export interface S3rverCorsRule {
    hasWildcardOrigin: boolean;
    exposeHeaders: string[];
    maxAgeSeconds?: number;
  }

  export interface S3rverCorsConfig {
    matchRule(origin: string, method: string): S3rverCorsRule | undefined;
  }

  /** lib/stores/filesystem.js: one folder per bucket, objects and uploads as files inside it. */
  export interface S3rverFilesystemStore {
    rootDirectory: string;
    getResourcePath(bucket: string, key: string | undefined, resource: string): string;
    getBucket(bucket: string): Promise<{ name: string } | null>;
    getSubresource(bucket: string, key: undefined, type: 'cors'): Promise<S3rverCorsConfig | null>;
    deleteObject(bucket: string, key: string): Promise<void>;
    putMetadata(bucket: string, key: string, metadata: Record<string, unknown>, md5?: string): Promise<void>;
    putPart(bucket: string, uploadId: string, partNumber: string, content: Readable): Promise<{ size: number; md5: string }>;
    putObjectMultipart(bucket: string, uploadId: string, parts: { number: number; etag: string }[]): Promise<{ size: number; md5: string }>;
  }

  /** A Koa application; `callback()` is its Node request listener. */
  class S3rver extends EventEmitter {
    constructor(options?: S3rverOptions);
    store: S3rverFilesystemStore;
    configureBuckets(): Promise<void>;
    callback(): (req: IncomingMessage, res: ServerResponse) => void;
    reset(): void;
  }

  export default S3rver;
}

declare module 's3rver/lib/models/error.js' {
  /** s3rver's S3 error: `status` comes from the code (S3's table), `toXML()` renders `<Error>`. */
  class S3Error extends Error {
    constructor(code: string, message?: string, detail?: Record<string, string | number>);
    code: string;
    status: number;
    detail: Record<string, string | number>;
    toXML(): string;
  }
  export default S3Error;
}

declare module 's3rver/lib/models/account.js' {
  class AWSAccount {
    id: number;
    displayName: string;
    accessKeys: Map<string, string>;
    /** Every access key id s3rver accepts, to its account (S3RVER / S3RVER by default). */
    static registry: Map<string, AWSAccount>;
  }
  export default AWSAccount;
  export const DUMMY_ACCOUNT: AWSAccount;
}
