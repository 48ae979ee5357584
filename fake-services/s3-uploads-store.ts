import { spawn } from 'node:child_process';
import { createHash, randomUUID } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { mkdir, open, readdir, readFile, rename, rm, stat, writeFile } from 'node:fs/promises';
import type { FileHandle } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { Transform } from 'node:stream';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { S3rverFilesystemStore } from 's3rver';
import S3Error from 's3rver/lib/models/error.js';

/**
 * s3rver's own on-disk multipart state, read and written in place (s3rver 3.7.1, lib/stores/filesystem.js):
 *   <root>/<bucket>/._S3rver_uploads/<uploadId>/key        the object key (written once, at CreateMultipartUpload)
 *   <root>/<bucket>/._S3rver_uploads/<uploadId>/metadata   JSON of the create request's headers (content-type, ...)
 *   <root>/<bucket>/._S3rver_uploads/<uploadId>/<n>        the bytes of part n (1..10000)
 *   <root>/<bucket>/._S3rver_uploads/<uploadId>/<n>.md5    its MD5 in hex, i.e. the part's ETag
 * uploadId is 32 lower-case hex digits (crypto.randomBytes(16)). The folder is the upload: it exists
 * from create until complete or abort removes it, so a restarted fake still lists its open uploads.
 * The initiated time is the mtime of `key`. A completed object is s3rver's usual trio beside its key:
 * `<name>._S3rver_object`, `<name>._S3rver_object.md5`, `<name>._S3rver_metadata.json`.
 */

export interface StoredUpload {
  bucket: string;
  uploadId: string;
  key: string;
  initiated: Date;
}

export interface StoredPart {
  partNumber: number;
  size: number;
  /** Hex MD5, without quotes. */
  etag: string;
  lastModified: Date;
}

const UPLOAD_ID = /^[0-9a-f]{32}$/;
const PART_FILE = /^[1-9]\d{0,4}$/;
/** S3 refuses parts under 5 MiB except the last (https://docs.aws.amazon.com/AmazonS3/latest/userguide/qfacts.html). */
export const MIN_PART_BYTES = 5 * 1024 * 1024;
export const MAX_PART_NUMBER = 10_000;

export function noSuchUpload(uploadId: string): S3Error {
  return new S3Error(
    'NoSuchUpload',
    'The specified upload does not exist. The upload ID may be invalid, or the upload may have been aborted or completed.',
    { UploadId: uploadId },
  );
}

export function invalidPartNumber(value: string): S3Error {
  return new S3Error('InvalidArgument', `Part number must be an integer between 1 and ${MAX_PART_NUMBER}, inclusive`, {
    ArgumentName: 'partNumber',
    ArgumentValue: value,
  });
}

/** A part number as S3 takes it in a query: 1..10000, written plainly. */
export function isPartNumber(value: string): boolean {
  return PART_FILE.test(value) && Number(value) <= MAX_PART_NUMBER;
}

function isMissing(error: unknown): boolean {
  return (error as NodeJS.ErrnoException).code === 'ENOENT';
}

/** cat(1) per batch: each child gets the parts as inherited descriptors, within the usual fd limit. */
const PARTS_PER_CAT = 200;

/**
 * Joins parts into `outFd` with cat(1), which copies inside the kernel (copy_file_range): about five
 * times faster than Node streams, so completing 1 GiB takes well under a second, as S3's own join
 * costs the client nothing. The parts are passed as open descriptors, so an abort that removes the
 * files meanwhile cannot change what is joined.
 */
async function concatenate(handles: FileHandle[], outFd: number): Promise<void> {
  for (let start = 0; start < handles.length; start += PARTS_PER_CAT) {
    const batch = handles.slice(start, start + PARTS_PER_CAT);
    const child = spawn(
      'cat',
      batch.map((_, i) => `/dev/fd/${i + 3}`),
      { stdio: ['ignore', outFd, 'pipe', ...batch.map((handle) => handle.fd)] },
    );
    let stderr = '';
    child.stderr?.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
    const code = await new Promise<number | null>((resolve, reject) => {
      child.on('error', reject);
      child.on('close', resolve);
    });
    if (code !== 0) throw new Error(`joining the parts failed: cat exited with ${code}: ${stderr.trim()}`);
  }
}

/**
 * Creates a new file, making its folder first. A delete of the folder's last other object can remove
 * the folder in between (s3rver tidies emptied folders), so that case is tried again.
 */
async function openNewInFolder(path: string): Promise<FileHandle> {
  for (let attempt = 1; ; attempt += 1) {
    await mkdir(dirname(path), { recursive: true });
    try {
      return await open(path, 'wx');
    } catch (error) {
      if (!isMissing(error) || attempt === 3) throw error;
    }
  }
}

/** S3's multipart ETag: the MD5 of the parts' binary MD5s, then `-<count>` (not the MD5 of the whole object). */
function multipartEtag(partMd5s: string[]): string {
  const digest = createHash('md5');
  for (const md5 of partMd5s) digest.update(Buffer.from(md5, 'hex'));
  return `${digest.digest('hex')}-${partMd5s.length}`;
}

/** Multipart uploads as s3rver keeps them on disk, plus the operations s3rver lacks. */
export function createUploadsStore(store: S3rverFilesystemStore) {
  const uploadsDir = (bucket: string): string => store.getResourcePath(bucket, undefined, 'uploads');
  const uploadDir = (bucket: string, uploadId: string): string => join(uploadsDir(bucket), uploadId);

  async function find(bucket: string, uploadId: string): Promise<StoredUpload | null> {
    // The id names a folder: anything but s3rver's own form could step outside it.
    if (!UPLOAD_ID.test(uploadId)) return null;
    const keyFile = join(uploadDir(bucket, uploadId), 'key');
    try {
      const [key, info] = await Promise.all([readFile(keyFile, 'utf8'), stat(keyFile)]);
      return { bucket, uploadId, key, initiated: info.mtime };
    } catch (error) {
      if (isMissing(error)) return null;
      throw error;
    }
  }

  /** Every open upload of a bucket, in S3's order: by key, then oldest first. */
  async function list(bucket: string): Promise<StoredUpload[]> {
    let names: string[];
    try {
      names = await readdir(uploadsDir(bucket));
    } catch (error) {
      if (isMissing(error)) return [];
      throw error;
    }
    const found = await Promise.all(names.map((name) => find(bucket, name)));
    return found
      .filter((upload): upload is StoredUpload => upload !== null)
      .sort(
        (a, b) =>
          Buffer.compare(Buffer.from(a.key), Buffer.from(b.key)) ||
          a.initiated.getTime() - b.initiated.getTime() ||
          (a.uploadId < b.uploadId ? -1 : 1),
      );
  }

  /** The upload's finished parts by number; a part still being written is not listed. */
  async function parts(upload: StoredUpload): Promise<StoredPart[]> {
    const dir = uploadDir(upload.bucket, upload.uploadId);
    let names: string[];
    try {
      names = await readdir(dir);
    } catch (error) {
      if (isMissing(error)) throw noSuchUpload(upload.uploadId);
      throw error;
    }
    const listed = await Promise.all(
      names
        .filter((name) => PART_FILE.test(name))
        .map(async (name): Promise<StoredPart | null> => {
          try {
            const [etag, info] = await Promise.all([readFile(join(dir, `${name}.md5`), 'utf8'), stat(join(dir, name))]);
            return { partNumber: Number(name), size: info.size, etag: etag.trim(), lastModified: info.mtime };
          } catch (error) {
            if (isMissing(error)) return null;
            throw error;
          }
        }),
    );
    return listed.filter((part): part is StoredPart => part !== null).sort((a, b) => a.partNumber - b.partNumber);
  }

  /** Removes the upload and all its parts. */
  async function abort(upload: StoredUpload): Promise<void> {
    // Retries: a part arriving during the removal can leave the folder briefly non-empty.
    await rm(uploadDir(upload.bucket, upload.uploadId), { recursive: true, force: true, maxRetries: 5 });
  }

  /**
   * Stores one part: written under a temporary name, then renamed, so an interrupted upload never
   * leaves a short part that ListParts would report as stored. Replaces s3rver's putPart.
   */
  async function writePart(
    bucket: string,
    uploadId: string,
    partNumber: string,
    content: Readable,
  ): Promise<{ size: number; md5: string }> {
    const dir = uploadDir(bucket, uploadId);
    if (!isPartNumber(partNumber)) throw invalidPartNumber(partNumber);
    if (!UPLOAD_ID.test(uploadId)) throw noSuchUpload(uploadId);
    const temporary = join(dir, `.${partNumber}.${randomUUID()}.partial`);
    const digest = createHash('md5');
    let size = 0;
    const count = new Transform({
      transform(chunk: Buffer, _encoding, done) {
        digest.update(chunk);
        size += chunk.length;
        done(null, chunk);
      },
    });
    try {
      // 'wx' does not create the folder: an aborted upload stays aborted.
      await pipeline(content, count, createWriteStream(temporary, { flags: 'wx' }));
      const md5 = digest.digest('hex');
      await writeFile(`${temporary}.md5`, md5);
      await rename(`${temporary}.md5`, join(dir, `${partNumber}.md5`));
      await rename(temporary, join(dir, partNumber));
      return { size, md5 };
    } catch (error) {
      await Promise.all([rm(temporary, { force: true }), rm(`${temporary}.md5`, { force: true })]);
      if ((await find(bucket, uploadId)) === null) throw noSuchUpload(uploadId);
      // The client went away (or broke off) before the whole body arrived.
      if (!content.readableEnded) {
        throw new S3Error('IncompleteBody', 'You did not provide the number of bytes specified by the Content-Length HTTP header.');
      }
      throw error;
    }
  }

  async function openParts(dir: string, uploadId: string, wanted: { number: number; etag: string }[]): Promise<FileHandle[]> {
    const handles: FileHandle[] = [];
    try {
      for (const [index, part] of wanted.entries()) {
        const invalid = new S3Error(
          'InvalidPart',
          "One or more of the specified parts could not be found.  The part may not have been uploaded, or the specified entity tag may not have matched the part's entity tag.",
          { UploadId: uploadId, PartNumber: part.number, ETag: part.etag },
        );
        const md5 = await readFile(join(dir, `${part.number}.md5`), 'utf8').catch(() => null);
        if (md5 === null || md5.trim() !== part.etag.toLowerCase()) throw invalid;
        // Open now: bytes already opened stay readable even if an abort removes the files meanwhile.
        const handle = await open(join(dir, String(part.number)), 'r').catch(() => null);
        if (!handle) throw invalid;
        handles.push(handle);
        const { size } = await handle.stat();
        if (index < wanted.length - 1 && size < MIN_PART_BYTES) {
          throw new S3Error('EntityTooSmall', 'Your proposed upload is smaller than the minimum allowed object size.', {
            ProposedSize: size,
            MinSizeAllowed: MIN_PART_BYTES,
            PartNumber: part.number,
            ETag: part.etag,
          });
        }
      }
      return handles;
    } catch (error) {
      await Promise.all(handles.map((handle) => handle.close()));
      throw error;
    }
  }

  /**
   * Joins the listed parts into the object, checking them as S3 does (ascending numbers, known ETags,
   * 5 MiB minimum but for the last), then forgets the upload. Replaces s3rver's putObjectMultipart,
   * which neither checks the parts nor survives a part file vanishing mid-read.
   */
  async function complete(
    bucket: string,
    uploadId: string,
    wanted: { number: number; etag: string }[],
  ): Promise<{ size: number; md5: string }> {
    const upload = await find(bucket, uploadId);
    if (!upload) throw noSuchUpload(uploadId);
    for (const [index, part] of wanted.entries()) {
      const previous = wanted[index - 1];
      // A number that is no part number at all fails below as a part that could not be found.
      if (previous && part.number <= previous.number) {
        throw new S3Error('InvalidPartOrder', 'The list of parts was not in ascending order. Parts must be ordered by part number.', {
          UploadId: uploadId,
        });
      }
    }
    const dir = uploadDir(bucket, uploadId);
    const metadata = JSON.parse(await readFile(join(dir, 'metadata'), 'utf8')) as Record<string, unknown>;
    metadata['content-type'] ??= 'binary/octet-stream';
    const handles = await openParts(dir, uploadId, wanted);
    const objectPath = store.getResourcePath(bucket, upload.key, 'object');
    const temporary = `${objectPath}.${randomUUID()}.partial`;
    let size = 0;
    try {
      const out = await openNewInFolder(temporary);
      try {
        await concatenate(handles, out.fd);
      } finally {
        await out.close();
      }
      for (const handle of handles) size += (await handle.stat()).size;
      // Renamed into place only when whole: a HeadObject right after completion sees the full size.
      await rename(temporary, objectPath);
    } catch (error) {
      await rm(temporary, { force: true });
      throw error;
    } finally {
      await Promise.all(handles.map((handle) => handle.close()));
    }
    const md5 = multipartEtag(wanted.map((part) => part.etag.toLowerCase()));
    await store.putMetadata(bucket, upload.key, metadata, md5);
    await abort(upload);
    return { size, md5 };
  }

  return { uploadDir, find, list, parts, abort, writePart, complete };
}

export type UploadsStore = ReturnType<typeof createUploadsStore>;

/** Routes s3rver's UploadPart and CompleteMultipartUpload storage through the checked versions above. */
export function installUploadsStore(store: S3rverFilesystemStore): UploadsStore {
  const uploads = createUploadsStore(store);
  store.putPart = uploads.writePart;
  store.putObjectMultipart = uploads.complete;
  return uploads;
}
