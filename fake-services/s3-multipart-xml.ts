import { DUMMY_ACCOUNT } from 's3rver/lib/models/account.js';
import type { StoredPart, StoredUpload } from './s3-uploads-store';

/** S3's response documents for ListParts and ListMultipartUploads (API reference shapes). */

const NAMESPACE = 'http://s3.amazonaws.com/doc/2006-03-01/';

export function escapeXml(value: string): string {
  return value.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&apos;');
}

/** `<Name>text</Name>`; undefined leaves the element out. */
function text(name: string, value: string | number | boolean | undefined): string {
  return value === undefined ? '' : `<${name}>${escapeXml(String(value))}</${name}>`;
}

/** With `encoding-type=url`, S3 URL-encodes keys and prefixes in the answer. */
export function encoder(encodingType: string | undefined): (value: string) => string {
  return encodingType === 'url' ? (value) => encodeURIComponent(value).replace(/%2F/g, '/') : (value) => value;
}

const owner = (name: string): string =>
  `<${name}>${text('ID', String(DUMMY_ACCOUNT.id))}${text('DisplayName', DUMMY_ACCOUNT.displayName)}</${name}>`;

/** S3 quotes ETags in XML too (`&quot;…&quot;`), as in the ETag header. */
const etag = (hex: string): string => text('ETag', `"${hex}"`);

export interface PartsPage {
  upload: StoredUpload;
  marker: number;
  maxParts: number;
  parts: StoredPart[];
  truncated: boolean;
  encodingType: string | undefined;
}

export function listPartsXml(page: PartsPage): string {
  const encode = encoder(page.encodingType);
  const last = page.parts.at(-1);
  const parts = page.parts
    .map(
      (part) =>
        `<Part>${text('PartNumber', part.partNumber)}${text('LastModified', part.lastModified.toISOString())}${etag(part.etag)}${text('Size', part.size)}</Part>`,
    )
    .join('');
  return (
    `<ListPartsResult xmlns="${NAMESPACE}">` +
    text('Bucket', page.upload.bucket) +
    text('Key', encode(page.upload.key)) +
    text('UploadId', page.upload.uploadId) +
    owner('Initiator') +
    owner('Owner') +
    text('StorageClass', 'STANDARD') +
    text('PartNumberMarker', page.marker) +
    text('NextPartNumberMarker', last ? last.partNumber : page.marker) +
    text('MaxParts', page.maxParts) +
    text('IsTruncated', page.truncated) +
    text('EncodingType', page.encodingType) +
    parts +
    '</ListPartsResult>'
  );
}

export interface UploadsPage {
  bucket: string;
  prefix: string;
  delimiter: string | undefined;
  keyMarker: string;
  uploadIdMarker: string;
  maxUploads: number;
  uploads: StoredUpload[];
  commonPrefixes: string[];
  truncated: boolean;
  nextKeyMarker: string | undefined;
  nextUploadIdMarker: string | undefined;
  encodingType: string | undefined;
}

export function listUploadsXml(page: UploadsPage): string {
  const encode = encoder(page.encodingType);
  const uploads = page.uploads
    .map(
      (upload) =>
        `<Upload>${text('Key', encode(upload.key))}${text('UploadId', upload.uploadId)}${owner('Initiator')}${owner('Owner')}` +
        `${text('StorageClass', 'STANDARD')}${text('Initiated', upload.initiated.toISOString())}</Upload>`,
    )
    .join('');
  const prefixes = page.commonPrefixes.map((prefix) => `<CommonPrefixes>${text('Prefix', encode(prefix))}</CommonPrefixes>`).join('');
  return (
    `<ListMultipartUploadsResult xmlns="${NAMESPACE}">` +
    text('Bucket', page.bucket) +
    text('KeyMarker', encode(page.keyMarker)) +
    text('UploadIdMarker', page.uploadIdMarker) +
    text('NextKeyMarker', page.nextKeyMarker === undefined ? undefined : encode(page.nextKeyMarker)) +
    text('NextUploadIdMarker', page.nextUploadIdMarker) +
    text('Prefix', encode(page.prefix)) +
    text('Delimiter', page.delimiter === undefined ? undefined : encode(page.delimiter)) +
    text('MaxUploads', page.maxUploads) +
    text('IsTruncated', page.truncated) +
    text('EncodingType', page.encodingType) +
    uploads +
    prefixes +
    '</ListMultipartUploadsResult>'
  );
}
