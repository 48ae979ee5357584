import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider, useParams, type RouteObject } from 'react-router-dom';
import type { ComponentType } from 'react';
import type { Role } from '@core/roles';
import { AppProvider } from '@/app/provider';
import { AppLayout } from '@/app/routes/app/app-layout';
import { RoleLayout } from '@/app/routes/app/role-layout';
import { createTestQueryClient } from '@/testing/test-utils';

// The lesson pages inside the real signed-in shell and role sections, as router.tsx mounts them; the studio
// and preview (other owners' pages) are replaced by a line naming where the browser went.
const page = (load: () => Promise<{ default: ComponentType }>) => async () => ({ Component: (await load()).default });

function Arrived({ what }: { what: string }) {
  const { lessonId } = useParams();
  return (
    <p>
      Arrived at the {what} of {lessonId}
    </p>
  );
}

const section = (role: Role, withTeacherPages: boolean): RouteObject => ({
  path: role,
  element: <RoleLayout role={role} />,
  children: [
    { path: 'lessons', lazy: page(() => import('@/app/routes/lessons/lessons')) },
    ...(withTeacherPages
      ? [
          { path: 'lessons/new', lazy: page(() => import('@/app/routes/lessons/lesson-new')) },
          { path: 'lessons/:lessonId/studio', element: <Arrived what="studio" /> },
        ]
      : []),
    { path: 'lessons/:lessonId', lazy: page(() => import('@/app/routes/lessons/lesson-overview')) },
    { path: 'lessons/:lessonId/preview', element: <Arrived what="preview" /> },
  ],
});

/** Renders the lesson pages at `url` in the teacher, substitute and coordinator sections. */
export function renderLessonRoute(url: string) {
  const queryClient = createTestQueryClient();
  const routes: RouteObject[] = [
    {
      element: <AppLayout />,
      hydrateFallbackElement: <p>Loading the page…</p>,
      children: [section('teacher', true), section('substitute', false), section('coordinator', false)],
    },
  ];
  const router = createMemoryRouter(routes, { initialEntries: [url] });
  const user = userEvent.setup();
  const result = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...result, user, queryClient, router };
}
