/**
 * How a teacher names a kind of file, from its MIME type (as file-type reports it from the bytes).
 * Pure, so the upload route can name a declared type with the same words the worker uses.
 */
export interface FileKind {
  mime: string;
  /** "a PDF", "a picture (JPEG)", "audio only"; for unknown bytes, UNRECOGNISED_LABEL. */
  label: string;
  /** A container that can hold video; ffprobe still decides whether it does. */
  isVideo: boolean;
  /** false when the bytes matched no known signature. */
  recognised: boolean;
}

export const UNKNOWN_MIME = 'application/octet-stream';
export const UNRECOGNISED_LABEL = 'not a file type Pinfield recognises';

const VIDEO_LABELS: Record<string, string> = {
  'video/mp4': 'an MP4 video',
  'video/x-m4v': 'an MP4 video',
  'video/quicktime': 'a QuickTime video (MOV)',
  'video/3gpp': 'a 3GP phone video',
  'video/3gpp2': 'a 3GP phone video',
  'video/webm': 'a WebM video',
  'video/matroska': 'a Matroska video (MKV)',
  'video/x-matroska': 'a Matroska video (MKV)',
  'video/vnd.avi': 'an AVI video',
  'video/x-msvideo': 'an AVI video',
  'video/mp2t': 'a camcorder video (MTS)',
  'video/mpeg': 'an MPEG video',
  'video/MP1S': 'an MPEG video',
  'video/MP2P': 'an MPEG video',
  'video/x-flv': 'a Flash video (FLV)',
  'video/ogg': 'an Ogg video',
  'video/x-ms-asf': 'a Windows Media video',
  // Containers file-type names under application/ that cameras and old software write video into.
  'application/mxf': 'a camera video (MXF)',
  'application/vnd.ms-asf': 'a Windows Media file',
  'application/vnd.rn-realmedia': 'a RealMedia file',
  'application/ogg': 'an Ogg file',
};

const OTHER_LABELS: Record<string, string> = {
  'application/pdf': 'a PDF',
  'image/jpeg': 'a picture (JPEG)',
  'image/png': 'a picture (PNG)',
  'image/gif': 'a picture (GIF)',
  'image/webp': 'a picture (WebP)',
  'image/heic': 'a picture (HEIC)',
  'image/heif': 'a picture (HEIC)',
  'image/heic-sequence': 'a moving picture (HEIC)',
  'image/heif-sequence': 'a moving picture (HEIC)',
  'image/avif': 'a picture (AVIF)',
  'image/tiff': 'a picture (TIFF)',
  'image/bmp': 'a picture (BMP)',
  'application/vnd.openxmlformats-officedocument.wordprocessingml.document': 'a Word document',
  'application/vnd.ms-word.document.macroenabled.12': 'a Word document',
  'application/vnd.openxmlformats-officedocument.presentationml.presentation': 'a PowerPoint presentation',
  'application/vnd.ms-powerpoint.presentation.macroenabled.12': 'a PowerPoint presentation',
  'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet': 'an Excel spreadsheet',
  'application/vnd.ms-excel.sheet.macroenabled.12': 'an Excel spreadsheet',
  'application/x-cfb': 'an older Office document',
  'application/rtf': 'a text document (RTF)',
  'application/zip': 'a ZIP archive',
  'application/x-7z-compressed': 'a compressed archive',
  'application/x-rar-compressed': 'a compressed archive',
  'application/gzip': 'a compressed archive',
  'application/x-tar': 'a compressed archive',
  'application/x-bzip2': 'a compressed archive',
  'application/x-xz': 'a compressed archive',
  'application/zstd': 'a compressed archive',
  'application/x-msdownload': 'a program',
  'application/x-elf': 'a program',
  'application/x-mach-binary': 'a program',
  'application/x-apple-diskimage': 'a disk image',
  'text/vtt': 'a captions file (WebVTT)',
};

/** Letters whose spoken name starts with a vowel sound take "an" ("an MP3 file", "a PSD file"). */
const AN_LETTERS = new Set(['A', 'E', 'F', 'H', 'I', 'L', 'M', 'N', 'O', 'R', 'S', 'X']);

/** Names a MIME type (and file-type's extension, for kinds without a label of their own). */
export function describeMime(mime: string | null | undefined, extension?: string): FileKind {
  if (!mime || mime === UNKNOWN_MIME) {
    return { mime: UNKNOWN_MIME, label: UNRECOGNISED_LABEL, isVideo: false, recognised: false };
  }
  const video = VIDEO_LABELS[mime] ?? (mime.startsWith('video/') ? 'a video' : undefined);
  if (video) return { mime, label: video, isVideo: true, recognised: true };
  const label =
    OTHER_LABELS[mime] ??
    (mime.startsWith('audio/') ? 'audio only' : undefined) ??
    (mime.startsWith('image/') ? 'a picture' : undefined) ??
    (mime.startsWith('font/') ? 'a font' : undefined) ??
    byExtension(extension);
  return { mime, label, isVideo: false, recognised: true };
}

function byExtension(extension: string | undefined): string {
  const name = (extension ?? '').toUpperCase();
  if (!/^[A-Z0-9]{1,8}$/.test(name)) return 'another kind of file';
  return `${AN_LETTERS.has(name[0]!) ? 'an' : 'a'} ${name} file`;
}
