import type { UploadCreate } from '@core/contracts';
import { partSizeFor } from '@core/recordings';

/**
 * What the API needs to start or continue an upload of this file: name, size, type, last-modified time and
 * the SHA-256 of the first part. The hash lets the API tell whether a file chosen again after a restart is
 * the same one, without reading the whole file.
 */
export async function fileFacts(file: File): Promise<UploadCreate> {
  const firstPart = await file.slice(0, partSizeFor(file.size)).arrayBuffer();
  const digest = await crypto.subtle.digest('SHA-256', new Uint8Array(firstPart));
  return {
    fileName: file.name,
    size: file.size,
    type: file.type,
    lastModified: Math.max(0, Math.trunc(file.lastModified)),
    firstPartSha256: toHex(digest),
  };
}

function toHex(buffer: ArrayBuffer): string {
  return Array.from(new Uint8Array(buffer), (byte) => byte.toString(16).padStart(2, '0')).join('');
}
