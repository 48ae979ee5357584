import type { ComponentType } from 'react';
import type { RouteObject } from 'react-router-dom';
import type { Role } from '@core/roles';
import { Loading } from '@/components/ui/spinner';
import { AppLayout } from './routes/app/app-layout';
import { RoleLayout } from './routes/app/role-layout';
import { RootLayout, RouteError } from './routes/root';

// Every page is its own chunk: the signed-out landing page carries no admin or home code.
const page = (load: () => Promise<{ default: ComponentType }>) => async () => ({ Component: (await load()).default });

const roleSection = (role: Role, path: string, children: RouteObject[]): RouteObject => ({
  path,
  element: <RoleLayout role={role} />,
  children,
});

// Lessons open read-only in every staff section; the studio edits only for the lesson's owner (or an admin).
const lessonPages: RouteObject[] = [
  { path: 'lessons', lazy: page(() => import('./routes/lessons/lessons')) },
  { path: 'lessons/:lessonId', lazy: page(() => import('./routes/lessons/lesson-overview')) },
  { path: 'lessons/:lessonId/preview', lazy: page(() => import('./routes/lessons/lesson-preview')) },
  { path: 'lessons/:lessonId/studio', handle: { wide: true }, lazy: page(() => import('./routes/lessons/lesson-studio')) },
];

export const routes: RouteObject[] = [
  {
    element: <RootLayout />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <Loading className="p-6" />,
    children: [
      { index: true, lazy: page(() => import('./routes/public/landing')) },
      { path: 'signin', lazy: page(() => import('./routes/public/sign-in')) },
      { path: 'signin/link', lazy: page(() => import('./routes/public/sign-in-link')) },
      { path: 'join', lazy: page(() => import('./routes/public/join')) },
      {
        element: <AppLayout />,
        children: [
          roleSection('teacher', 'teacher', [
            { index: true, lazy: page(() => import('./routes/homes/teacher-home')) },
            { path: 'classes/:classId', lazy: page(() => import('./routes/homes/teacher-class')) },
            { path: 'recordings', lazy: page(() => import('./routes/recordings/recordings')) },
            { path: 'recordings/:recordingId', lazy: page(() => import('./routes/recordings/recording-detail')) },
            { path: 'lessons/new', lazy: page(() => import('./routes/lessons/lesson-new')) },
            { path: 'lessons/:lessonId/assign', lazy: page(() => import('./routes/assignments/assign-lesson')) },
            { path: 'assignments/:assignmentId', lazy: page(() => import('./routes/assignments/assignment-detail')) },
            ...lessonPages,
          ]),
          roleSection('student', 'student', [
            { index: true, lazy: page(() => import('./routes/homes/student-home')) },
            { path: 'assignments/:assignmentId/results', lazy: page(() => import('./routes/student/student-results')) },
            { path: 'assignments/:assignmentId', lazy: page(() => import('./routes/student/watch')) },
          ]),
          roleSection('coordinator', 'coordinator', [
            { index: true, lazy: page(() => import('./routes/homes/coordinator-home')) },
            ...lessonPages,
          ]),
          roleSection('substitute', 'substitute', [
            { index: true, lazy: page(() => import('./routes/homes/substitute-home')) },
            ...lessonPages,
          ]),
          {
            path: 'admin',
            lazy: page(() => import('./routes/admin/admin-layout')),
            children: [
              { index: true, lazy: page(() => import('./routes/admin/admin-index')) },
              { path: 'people', lazy: page(() => import('./routes/admin/people')) },
              { path: 'people/invite', lazy: page(() => import('./routes/admin/invite')) },
              { path: 'roster', lazy: page(() => import('./routes/admin/roster')) },
              { path: 'classes', lazy: page(() => import('./routes/admin/classes')) },
              { path: 'classes/:classId', lazy: page(() => import('./routes/admin/class-detail')) },
              { path: 'departments', lazy: page(() => import('./routes/admin/departments')) },
              { path: 'school', lazy: page(() => import('./routes/admin/school')) },
            ],
          },
        ],
      },
      { path: '*', lazy: page(() => import('./routes/not-found')) },
    ],
  },
];
