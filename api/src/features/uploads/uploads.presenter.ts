import type { OpenUploadDto, UploadDto } from '@core/contracts';
import type { StoredPart } from '../../storage/object-storage';
import type { UploadRow } from './uploads.repository';

export function presentUpload(row: UploadRow): UploadDto {
  return {
    id: row.id,
    recordingId: row.recordingId!,
    key: row.objectKey,
    fileName: row.fileName,
    size: row.declaredSize,
    lastModified: row.fileLastModified,
    partSize: row.partSize,
    partCount: row.partCount,
    createdAt: new Date(row.createdAt).toISOString(),
    lastActivityAt: new Date(row.lastActivityAt).toISOString(),
  };
}

export function presentOpenUpload(row: UploadRow, parts: StoredPart[]): OpenUploadDto {
  return {
    ...presentUpload(row),
    uploadedBytes: parts.reduce((sum, part) => sum + part.size, 0),
    uploadedParts: parts.length,
  };
}
