import { useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';

export type SectionBase = '/teacher' | '/substitute' | '/coordinator';

const BASES: readonly SectionBase[] = ['/teacher', '/substitute', '/coordinator'];

/** The section a path belongs to; lesson pages are shared by the sections, and links stay inside the one in use. */
export function sectionBaseOf(pathname: string): SectionBase {
  return BASES.find((base) => pathname === base || pathname.startsWith(`${base}/`)) ?? '/teacher';
}

/** '/teacher', '/substitute' or '/coordinator', from the current location (the teacher section outside them). */
export function useSectionBase(): SectionBase {
  return sectionBaseOf(useLocation().pathname);
}

/** Every lesson URL inside one section (from config/paths; create exists in the teacher section only). */
export function lessonPaths(base: SectionBase) {
  return {
    list: paths.lessons.list(base),
    create: paths.lessons.create,
    overview: (lessonId: string) => paths.lessons.overview(base, lessonId),
    studio: (lessonId: string) => paths.lessons.studio(base, lessonId),
    preview: (lessonId: string) => paths.lessons.preview(base, lessonId),
  };
}

/** lessonPaths of the section in use. */
export function useLessonPaths() {
  return lessonPaths(useSectionBase());
}
