import type { Role } from '@core/roles';

/** Every URL of the web app, in one place; pages link with these, never with string literals. */
export const paths = {
  landing: '/',
  signIn: '/signin',
  signInLink: '/signin/link',
  join: '/join',
  teacher: {
    home: '/teacher',
    class: (classId: string) => `/teacher/classes/${classId}`,
    recordings: '/teacher/recordings',
    recording: (recordingId: string) => `/teacher/recordings/${recordingId}`,
    assignLesson: (lessonId: string) => `/teacher/lessons/${lessonId}/assign`,
    assignment: (assignmentId: string) => `/teacher/assignments/${assignmentId}`,
  },
  /** Lesson pages live in each staff section ('/teacher', '/substitute', '/coordinator'): pass the section's base. */
  lessons: {
    list: (base: string) => `${base}/lessons`,
    create: (recordingId?: string) => `/teacher/lessons/new${recordingId ? `?recording=${encodeURIComponent(recordingId)}` : ''}`,
    overview: (base: string, lessonId: string) => `${base}/lessons/${lessonId}`,
    studio: (base: string, lessonId: string) => `${base}/lessons/${lessonId}/studio`,
    preview: (base: string, lessonId: string) => `${base}/lessons/${lessonId}/preview`,
  },
  student: {
    home: '/student',
    watch: (assignmentId: string) => `/student/assignments/${assignmentId}`,
    results: (assignmentId: string) => `/student/assignments/${assignmentId}/results`,
  },
  coordinator: { home: '/coordinator' },
  substitute: { home: '/substitute' },
  admin: {
    people: '/admin/people',
    invite: '/admin/people/invite',
    roster: '/admin/roster',
    classes: '/admin/classes',
    class: (classId: string) => `/admin/classes/${classId}`,
    departments: '/admin/departments',
    school: '/admin/school',
  },
  /** Full-page navigations to the API (not fetch): the provider redirects back to the API's callback. */
  api: { google: '/api/auth/google' },
} as const;

const HOMES: Record<Role, string> = {
  teacher: paths.teacher.home,
  student: paths.student.home,
  coordinator: paths.coordinator.home,
  substitute: paths.substitute.home,
  admin: paths.admin.people,
};

/** Where a person acting in `role` starts. */
export function roleHome(role: Role): string {
  return HOMES[role];
}
