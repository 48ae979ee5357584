/** Every object of a recording lives under one prefix, so deleting a recording is one prefix sweep. */
export function recordingPrefix(schoolId: string, recordingId: string): string {
  return `schools/${schoolId}/recordings/${recordingId}/`;
}

/** Fixed names under the prefix: a retried job overwrites the same keys instead of adding objects. */
export const recordingKeys = {
  original: (prefix: string) => `${prefix}original`,
  rendition: (prefix: string) => `${prefix}web.mp4`,
  poster: (prefix: string) => `${prefix}poster.jpg`,
  thumbnailSheet: (prefix: string, index: number) => `${prefix}thumbnails/sheet-${String(index + 1).padStart(3, '0')}.jpg`,
};
