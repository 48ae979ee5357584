import { lessonUrl } from './keys';

const versionQuery = (version?: number) => (version === undefined ? '' : `?version=${version}`);

/**
 * Download links (plain navigations: the API answers with an attachment). Without a version the API sends the
 * draft to the lesson's editors and the newest published version to everyone else; with one, that version.
 */
export const lessonDownloads = {
  /** The lesson file (`<title>.pinfield-lesson.json`). */
  file: (lessonId: string, version?: number) => lessonUrl(lessonId, `/export${versionQuery(version)}`),
  /** WebVTT chapters track. */
  chapters: (lessonId: string, version?: number) => lessonUrl(lessonId, `/chapters.vtt${versionQuery(version)}`),
  /** WebVTT metadata track with one cue per checkpoint. */
  checkpoints: (lessonId: string, version?: number) => lessonUrl(lessonId, `/checkpoints.vtt${versionQuery(version)}`),
};
