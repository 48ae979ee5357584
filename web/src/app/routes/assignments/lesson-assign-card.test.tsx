import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import type { LessonDto } from '@core/contracts';
import { buildLesson } from '@/features/lessons/testing/lesson-mocks';
import { buildMe } from '@/testing/mocks/data';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';

function mockLesson(lesson: LessonDto) {
  server.use(
    http.get(`/api/lessons/${lesson.id}`, () => HttpResponse.json(lesson)),
    http.get(`/api/lessons/${lesson.id}/versions`, () => HttpResponse.json({ versions: [] })),
  );
}

describe('the lesson overview’s Assign section', { timeout: 20_000 }, () => {
  it('leads a teacher from a published lesson to the assign form', async () => {
    signInAs(buildMe(['teacher']));
    const lesson = buildLesson({ state: 'published', publishedVersion: 3, unpublishedChanges: false, canEdit: false });
    mockLesson(lesson);
    renderApp(`/teacher/lessons/${lesson.id}`);
    const section = await screen.findByRole('region', { name: 'Assign' });
    expect(section).toHaveTextContent('Give version 3 (or an earlier one) to your classes');
    expect(screen.getByRole('link', { name: 'Assign to classes' })).toHaveAttribute('href', `/teacher/lessons/${lesson.id}/assign`);
  });

  it('says a draft must be published first', async () => {
    signInAs(buildMe(['teacher']));
    const lesson = buildLesson({ publishedVersion: null });
    mockLesson(lesson);
    renderApp(`/teacher/lessons/${lesson.id}`);
    const section = await screen.findByRole('region', { name: 'Assign' });
    expect(section).toHaveTextContent('Students get a published version, never the draft: publish version 1, then assign it');
    expect(screen.queryByRole('link', { name: 'Assign to classes' })).not.toBeInTheDocument();
  });

  it('asks for an archived lesson to be restored first', async () => {
    signInAs(buildMe(['teacher']));
    const lesson = buildLesson({ state: 'archived', publishedVersion: 2 });
    mockLesson(lesson);
    renderApp(`/teacher/lessons/${lesson.id}`);
    const section = await screen.findByRole('region', { name: 'Assign' });
    expect(section).toHaveTextContent('Archived lessons are not assigned: restore it from the archive first.');
    expect(screen.queryByRole('link', { name: 'Assign to classes' })).not.toBeInTheDocument();
  });

  it('is not offered in the coordinator’s section', async () => {
    signInAs(buildMe(['coordinator']));
    const lesson = buildLesson({ state: 'published', publishedVersion: 1, canEdit: false });
    mockLesson(lesson);
    renderApp(`/coordinator/lessons/${lesson.id}`);
    expect(await screen.findByRole('heading', { level: 1, name: lesson.title })).toBeInTheDocument();
    expect(screen.queryByRole('region', { name: 'Assign' })).not.toBeInTheDocument();
  });
});
