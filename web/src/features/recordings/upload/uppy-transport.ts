import AwsS3, { type AwsS3Part } from '@uppy/aws-s3';
import Uppy, { type Body, type Meta, type UppyFile } from '@uppy/core';
import { partSizeFor } from '@core/recordings';
import { completeUpload, listStoredParts, signPart } from '../api/upload-requests';

export type TransportFile = UppyFile<Meta, Body>;
export type TransportUppy = Uppy<Meta, Body>;

/** Uppy's resume hint: a file whose state carries this goes to ListParts and sends only the missing parts. */
export type MultipartState = { uploadId: string; key: string };

export type TransportOptions = {
  /** Creates (or refuses) the upload on the API; Uppy calls it once per new file. */
  createUpload: (file: TransportFile) => Promise<MultipartState>;
  /** Part sizes the API chose for files being resumed; new files use `partSizeFor(size)`, as the API does. */
  partSizeOf: (data: Blob) => number | undefined;
  onPartsListed: (file: TransportFile, storedBytes: number) => void;
  onCompleting: (file: TransportFile) => void;
  onCompleted: (file: TransportFile, recordingId: string) => void;
  /** Parallel part uploads (shared by all files). */
  limit: number;
  /** Waits before each retry of a failed part; after the last, the file fails and its row offers Retry. */
  retryDelays: number[];
};

/**
 * A headless Uppy with its S3 plugin, always multipart, talking to Pinfield's upload API for every signature
 * and bookkeeping call (the API client adds the CSRF header); the bytes go from the browser to storage.
 */
export function createTransport(options: TransportOptions): TransportUppy {
  const uppy = new Uppy<Meta, Body>({ id: 'pinfield-recordings', autoProceed: false, allowMultipleUploadBatches: true });
  uppy.use(AwsS3<Meta, Body>, {
    shouldUseMultipart: true,
    limit: options.limit,
    retryDelays: options.retryDelays,
    // Part boundaries must be the API's: it signs each part for exactly its length.
    getChunkSize: (data) => (data instanceof Blob ? options.partSizeOf(data) : undefined) ?? partSizeFor(data.size),
    createMultipartUpload: (file) => options.createUpload(file),
    signPart: async (_file, { uploadId, partNumber }) => {
      const signed = await signPart(uploadId, partNumber);
      return { method: 'PUT', url: signed.url };
    },
    listParts: async (file, { uploadId }) => {
      const { parts } = await listStoredParts(required(uploadId));
      options.onPartsListed(
        file,
        parts.reduce((sum, part) => sum + part.size, 0),
      );
      return parts.map((part): AwsS3Part => ({ PartNumber: part.partNumber, Size: part.size, ETag: part.etag }));
    },
    completeMultipartUpload: async (file, { uploadId, parts }) => {
      options.onCompleting(file);
      const recording = await completeUpload(required(uploadId), {
        parts: parts.map((part) => ({ partNumber: part.PartNumber ?? 0, etag: part.ETag ?? '' })),
      });
      options.onCompleted(file, recording.id);
      return {};
    },
    // Uppy also calls this when a part fails for good, which would throw away the parts already stored.
    // Pinfield keeps them so Retry (or a later visit) continues; Cancel deletes the upload itself.
    abortMultipartUpload: () => Promise.resolve(),
  });
  return uppy;
}

function required(uploadId: string | undefined): string {
  if (!uploadId) throw new Error('The upload has no id yet.');
  return uploadId;
}
