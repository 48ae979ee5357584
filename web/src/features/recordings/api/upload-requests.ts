import {
  RecordingDtoSchema,
  SignedPartDtoSchema,
  StoredPartListDtoSchema,
  UploadDtoSchema,
  type UploadComplete,
  type UploadCreate,
  type UploadResume,
} from '@core/contracts';
import { api } from '@/lib/api-client';

// The calls the uploader makes while sending one file; the bytes themselves go straight to storage.
const base = (uploadId: string) => `/api/uploads/${encodeURIComponent(uploadId)}`;

/** Starts an upload: the API checks the facts, creates the recording (state uploading) and the storage multipart upload. */
export const createUpload = (body: UploadCreate) => api.post('/api/uploads', body, UploadDtoSchema);

/** Continues an unfinished upload with a re-chosen file; 409 file_mismatch says what differs. */
export const resumeUpload = (uploadId: string, body: UploadResume) => api.post(`${base(uploadId)}/resume`, body, UploadDtoSchema);

/** A presigned PUT URL for one part, signed for exactly that part's length. */
export const signPart = (uploadId: string, partNumber: number) =>
  api.post(`${base(uploadId)}/parts/${partNumber}`, {}, SignedPartDtoSchema);

/** The parts storage already holds, so a resumed upload sends only the others. */
export const listStoredParts = (uploadId: string) => api.get(`${base(uploadId)}/parts`, StoredPartListDtoSchema);

export const completeUpload = (uploadId: string, body: UploadComplete) => api.post(`${base(uploadId)}/complete`, body, RecordingDtoSchema);

export const abortUpload = (uploadId: string) => api.delete(base(uploadId));
