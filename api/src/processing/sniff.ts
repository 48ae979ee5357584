import { fileTypeFromFile } from 'file-type';
import { describeMime, type FileKind } from './file-kinds';

/**
 * The real type of a file from its first bytes (file-type), never from its name: a PDF renamed
 * `.mp4` is still a PDF. Unknown bytes (including an empty file) come back unrecognised, not video.
 */
export async function sniffFile(filePath: string): Promise<{ mime: string; label: string; isVideo: boolean }> {
  const { mime, label, isVideo } = await sniffKind(filePath);
  return { mime, label, isVideo };
}

/** sniffFile with `recognised`, for choosing the failure sentence. */
export async function sniffKind(filePath: string): Promise<FileKind> {
  const found = await fileTypeFromFile(filePath);
  return describeMime(found?.mime, found?.ext);
}

/** ISO base media files (MP4, MOV, 3GP): recognisable by their `ftyp` even when the index is missing. */
export function isIsoMediaMime(mime: string): boolean {
  return ['video/mp4', 'video/x-m4v', 'video/quicktime', 'video/3gpp', 'video/3gpp2', 'audio/mp4', 'audio/x-m4a'].includes(mime);
}
