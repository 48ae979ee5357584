import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import type { ClassDetailDto } from '@core/contracts';
import { buildClass, buildClassDetail, buildMe, buildPerson, nextId } from '@/testing/mocks/data';
import { apiError } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

const DEPT_ID = nextId();
const teacher = buildPerson({ name: 'Ada Quill', email: 'ada.quill@brackenmoor.example', roles: ['teacher'] });

describe('admin classes', () => {
  it('creates a class with its department and teacher and shows the new join code', async () => {
    signInAs(buildMe(['admin']));
    let body: unknown;
    let teacherQuery = '';
    server.use(
      http.get('/api/admin/classes', () => HttpResponse.json({ classes: [] })),
      http.get('/api/admin/departments', () =>
        HttpResponse.json({ departments: [{ id: DEPT_ID, name: 'Physics', classCount: 0, memberCount: 1 }] }),
      ),
      http.get('/api/admin/people', ({ request }) => {
        teacherQuery = new URL(request.url).search;
        return HttpResponse.json({ people: [teacher], total: 1, page: 1, pageSize: 100 });
      }),
      http.post('/api/admin/classes', async ({ request }) => {
        body = await request.json();
        return HttpResponse.json(buildClass({ name: '10B Physics', joinCode: 'QW3RTY9P' }), { status: 201 });
      }),
    );
    const { user } = renderApp('/admin/classes');
    expect(await screen.findByText(/No classes yet/)).toBeInTheDocument();
    await user.type(screen.getByLabelText('Class name'), '10B Physics');
    await user.selectOptions(screen.getByLabelText('Department'), 'Physics');
    await user.selectOptions(await screen.findByLabelText('Teacher'), 'Ada Quill (ada.quill@brackenmoor.example)');
    await user.click(screen.getByRole('button', { name: /Create class/ }));
    expect(await screen.findByText('Class “10B Physics” created')).toBeInTheDocument();
    expect(screen.getByText('QW3RTY9P')).toBeInTheDocument();
    expect(body).toEqual({ name: '10B Physics', departmentId: DEPT_ID, teacherId: teacher.userId });
    expect(teacherQuery).toBe('?role=teacher&page=1&pageSize=100');
  });

  it('puts the server’s message about the name next to the name field', async () => {
    signInAs(buildMe(['admin']));
    server.use(
      http.get('/api/admin/classes', () => HttpResponse.json({ classes: [] })),
      http.get('/api/admin/departments', () => HttpResponse.json({ departments: [] })),
      http.get('/api/admin/people', () => HttpResponse.json({ people: [], total: 0, page: 1, pageSize: 100 })),
      http.post('/api/admin/classes', () => apiError(409, 'class_exists', 'A class called “10B Physics” already exists in this school.')),
    );
    const { user } = renderApp('/admin/classes');
    await user.type(await screen.findByLabelText('Class name'), '10B Physics');
    await user.click(screen.getByRole('button', { name: /Create class/ }));
    expect(await screen.findByText('A class called “10B Physics” already exists in this school.')).toBeInTheDocument();
    expect(screen.getByLabelText('Class name')).toHaveAttribute('aria-invalid', 'true');
  });

  it('enrols chosen students and removes one after a confirmation', async () => {
    signInAs(buildMe(['admin']));
    const rowan = buildPerson({ name: 'Rowan Ashby', email: 'rowan@brackenmoor.example' });
    const mira = buildPerson({ name: 'Mira Okafor', email: 'mira@brackenmoor.example' });
    let detail: ClassDetailDto = buildClassDetail({
      name: '10B Physics',
      students: [{ userId: mira.userId, name: mira.name, email: mira.email, enrolledAt: '2025-01-06T09:00:00.000Z' }],
    });
    let enrolBody: unknown;
    let removed = '';
    server.use(
      http.get(`/api/classes/${detail.id}`, () => HttpResponse.json(detail)),
      http.get('/api/admin/people', () => HttpResponse.json({ people: [rowan, mira], total: 2, page: 1, pageSize: 50 })),
      http.post(`/api/admin/classes/${detail.id}/enrolments`, async ({ request }) => {
        enrolBody = await request.json();
        detail = {
          ...detail,
          students: [
            ...detail.students,
            { userId: rowan.userId, name: rowan.name, email: rowan.email, enrolledAt: '2025-02-01T09:00:00.000Z' },
          ],
        };
        return HttpResponse.json(detail);
      }),
      http.delete(`/api/admin/classes/${detail.id}/enrolments/:userId`, ({ params }) => {
        removed = String(params.userId);
        detail = { ...detail, students: detail.students.filter((student) => student.userId !== removed) };
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const { user } = renderApp(`/admin/classes/${detail.id}`);
    expect(await screen.findByRole('heading', { name: 'Students (1)' })).toBeInTheDocument();
    // Mira is already enrolled: shown, but not selectable.
    expect(await screen.findByRole('checkbox', { name: /Mira Okafor/ })).toBeDisabled();
    await user.click(screen.getByRole('checkbox', { name: /Rowan Ashby/ }));
    await user.click(screen.getByRole('button', { name: 'Enrol 1 student' }));
    expect(await screen.findByRole('heading', { name: 'Students (2)' })).toBeInTheDocument();
    expect(enrolBody).toEqual({ userIds: [rowan.userId] });

    const table = screen.getByRole('table', { name: 'Students in 10B Physics' });
    await user.click(within(table).getByRole('button', { name: 'Remove Mira Okafor from the class' }));
    await user.click(within(table).getByRole('button', { name: 'Yes, remove Mira Okafor' }));
    expect(await screen.findByRole('heading', { name: 'Students (1)' })).toBeInTheDocument();
    expect(removed).toBe(mira.userId);
  });
});
