// Test helpers (imported by *.test.ts only): people signed in with a role and department, lessons made through the API.
import type { Checkpoint, LessonContent, LessonDto } from '@core/contracts';
import type { Role } from '@core/roles';
import { newCheckpoint } from '@core/lessons';
import { signedInClient, type Client, type TestApp } from '../../../test/test-app';
import { buildMember } from '../../../test/factories';
import { insertReadyRecording } from '../recordings/test-recordings';

export interface Member {
  id: string;
  name: string;
  email: string;
  schoolId: string;
  client: Client;
}

/** A signed-in member of a school (a fresh one unless given), in a department if given. */
export async function member(
  t: TestApp,
  roles: Role[],
  options: { schoolId?: string; departmentId?: string | null } = {},
): Promise<Member> {
  const person = await buildMember(t.db, { roles, schoolId: options.schoolId, departmentId: options.departmentId ?? null });
  return { ...person, client: await signedInClient(t, person.email) };
}

/** A ready 12-second recording of the school with its objects stored. */
export function readyRecording(t: TestApp, owner: { id: string; schoolId: string }, title = 'Coil and compass (test)') {
  return insertReadyRecording(t.db, t.storage, { schoolId: owner.schoolId, ownerId: owner.id, title });
}

export const createBody = (recordingId: string, overrides: Record<string, unknown> = {}) => ({
  recordingId,
  title: 'Field of a flat coil',
  description: 'We watch a compass needle near a coil.',
  tags: ['magnetism', 'coils'],
  level: 'Year 10',
  safetyNotes: '',
  ...overrides,
});

/** Creates a lesson through the API and fails loudly if it is refused. */
export async function createLesson(client: Client, recordingId: string, overrides: Record<string, unknown> = {}): Promise<LessonDto> {
  const res = await client.send('post', '/api/lessons', createBody(recordingId, overrides));
  if (res.status !== 201) throw new Error(`creating the lesson failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as LessonDto;
}

/** A multiple-choice question that meets every publish rule. */
export function goodQuestion(atMs: number, prompt = 'Which way does the needle turn?'): Checkpoint {
  const checkpoint = newCheckpoint('multiple-choice', atMs);
  const [first, second] = checkpoint.options;
  return {
    ...checkpoint,
    prompt,
    options: [
      { ...first!, text: 'Clockwise', correct: true },
      { ...second!, text: 'Anticlockwise', correct: false },
    ],
  };
}

/** A remark that meets every publish rule. */
export function goodNote(atMs: number, body = 'Watch the needle, not the coil.'): Checkpoint {
  return { ...newCheckpoint('note', atMs), body };
}

/** Saves a draft and fails loudly if it is refused; returns the answer. */
export async function saveDraft(client: Client, lessonId: string, revision: number, content: LessonContent) {
  const res = await client.send('put', `/api/lessons/${lessonId}/draft`, { revision, content });
  if (res.status !== 200) throw new Error(`saving the draft failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { revision: number; savedAt: string; problems: { path: string; message: string }[]; unpublishedChanges: boolean };
}
