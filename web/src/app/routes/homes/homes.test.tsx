import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import type { DepartmentOverviewDto } from '@core/contracts';
import { buildClass, buildMe, buildStudentClass, nextId } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

describe('role homes', () => {
  it('teacher: classes with student counts and join codes, and where lessons are built and assigned', async () => {
    signInAs(buildMe(['teacher']));
    server.use(
      http.get('/api/teacher/classes', () =>
        HttpResponse.json({ classes: [buildClass({ name: '10B Physics', studentCount: 27, joinCode: 'QW3RTY9P' })] }),
      ),
    );
    renderApp('/teacher');
    const card = (await screen.findByRole('link', { name: '10B Physics' })).closest('section');
    expect(card).toHaveTextContent('27 students enrolled');
    expect(card).toHaveTextContent('QW3RTY9P');
    expect(within(card as HTMLElement).getByRole('button', { name: 'Copy the join code of 10B Physics' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Lessons page' })).toHaveAttribute('href', '/teacher/lessons');
  });

  it('teacher: says how classes arrive when there are none', async () => {
    signInAs(buildMe(['teacher']));
    server.use(http.get('/api/teacher/classes', () => HttpResponse.json({ classes: [] })));
    renderApp('/teacher');
    expect(await screen.findByText('No classes yet')).toBeInTheDocument();
    expect(screen.getByText(/Your school admin creates classes/)).toBeInTheDocument();
  });

  it('student: empty state, then joining by code adds the class', async () => {
    signInAs(buildMe(['student']));
    let joined = false;
    server.use(
      http.get('/api/student/assignments', () => HttpResponse.json({ assignments: [], serverTime: '2026-12-01T10:00:00.000Z' })),
      http.get('/api/student/classes', () => HttpResponse.json({ classes: joined ? [buildStudentClass({ name: '10B Physics' })] : [] })),
      http.post('/api/student/enrolments', async ({ request }) => {
        expect(await request.json()).toEqual({ code: 'QW3RTY9P' });
        joined = true;
        return HttpResponse.json(buildStudentClass({ name: '10B Physics' }), { status: 201 });
      }),
    );
    const { user } = renderApp('/student');
    expect(await screen.findByText('You are not in a class yet')).toBeInTheDocument();
    await user.type(screen.getByLabelText(/Class code/), 'qw3rty9p');
    await user.click(screen.getByRole('button', { name: 'Join class' }));
    expect(await screen.findByText('You joined 10B Physics')).toBeInTheDocument();
    expect(await screen.findByRole('heading', { name: '10B Physics' })).toBeInTheDocument();
  });

  it('student: a code no class has is explained next to the field', async () => {
    signInAs(buildMe(['student']));
    server.use(
      http.get('/api/student/assignments', () => HttpResponse.json({ assignments: [], serverTime: '2026-12-01T10:00:00.000Z' })),
      http.get('/api/student/classes', () => HttpResponse.json({ classes: [] })),
      http.post('/api/student/enrolments', () => apiError(404, 'not_found', 'No class in your school has the code QW3RTY9P.')),
    );
    const { user } = renderApp('/student');
    await user.type(await screen.findByLabelText(/Class code/), 'QW3RTY9P');
    await user.click(screen.getByRole('button', { name: 'Join class' }));
    expect(await screen.findByText('No class in your school has the code QW3RTY9P.')).toBeInTheDocument();
    expect(screen.getByLabelText(/Class code/)).toHaveAttribute('aria-invalid', 'true');
  });

  it('coordinator: the department’s staff and classes with counts', async () => {
    signInAs(buildMe(['coordinator']));
    // The overview leaves join codes out.
    const { joinCode: _joinCode, ...deptClass } = buildClass({ name: '10B Physics', studentCount: 27 });
    const department: DepartmentOverviewDto = {
      id: nextId(),
      name: 'Physics',
      staff: [{ id: nextId(), name: 'Ada Quill', email: 'ada.quill@brackenmoor.example', roles: ['teacher', 'coordinator'] }],
      classes: [deptClass],
    };
    server.use(http.get('/api/departments/overview', () => HttpResponse.json({ departments: [department] })));
    renderApp('/coordinator');
    expect(await screen.findByRole('heading', { name: 'Physics' })).toBeInTheDocument();
    expect(screen.getByText('1 member of staff · 1 class · 27 students')).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Staff of Physics' })).toHaveTextContent('Teacher, Coordinator');
  });

  it('substitute: what cover plans will bring, and the departments covered', async () => {
    signInAs(buildMe(['substitute']));
    server.use(http.get('/api/departments/overview', () => HttpResponse.json({ departments: [] })));
    renderApp('/substitute');
    expect(await screen.findByText('No cover plans yet')).toBeInTheDocument();
    expect(await screen.findByText('You are not covering a department yet')).toBeInTheDocument();
  });
});
