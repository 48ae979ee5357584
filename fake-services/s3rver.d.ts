// s3rver 3.7.1 ships no types; this covers only what s3.ts uses.
declare module 's3rver' {
  import type { EventEmitter } from 'node:events';
  import type { IncomingMessage, ServerResponse } from 'node:http';

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

  /** A Koa application; `callback()` is its Node request listener. */
  class S3rver extends EventEmitter {
    constructor(options?: S3rverOptions);
    configureBuckets(): Promise<void>;
    callback(): (req: IncomingMessage, res: ServerResponse) => void;
    reset(): void;
  }

  export default S3rver;
}
