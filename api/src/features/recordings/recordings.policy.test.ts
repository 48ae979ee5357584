import { describe, expect, it } from 'vitest';
import type { Role } from '@core/roles';
import type { RecordingState } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import { canEditRecording, canViewRecording } from './recordings.policy';
import { isRetryable } from './retry-rule';

const SCHOOL = 'school-1';
function actor(roles: Role[], schoolId = SCHOOL, userId = 'me'): Actor {
  const membership = { schoolId, schoolName: 'Test', timeZone: 'UTC', locale: 'en-GB', roles, departmentId: null };
  return { userId, email: 'me@test.example', name: 'Me', memberships: [membership], active: { ...membership, role: roles[0]! } };
}
const row = (ownerId: string | null, state: RecordingState = 'ready', schoolId = SCHOOL) => ({ schoolId, ownerId, state });

describe('recording policy', () => {
  it.each([
    // who, roles, the row, view, edit
    ['owner teacher', actor(['teacher']), row('me'), true, true],
    ['colleague teacher', actor(['teacher']), row('other'), true, false],
    ['admin', actor(['admin']), row('other'), true, true],
    ['coordinator only', actor(['coordinator']), row('other'), false, false],
    ['student', actor(['student']), row('other'), false, false],
    ['teacher of another school', actor(['teacher', 'admin'], 'school-2'), row('me'), false, false],
    ['owner, still uploading', actor(['teacher']), row('me', 'uploading'), true, true],
    ['colleague, still uploading', actor(['teacher']), row('other', 'uploading'), false, false],
    ['admin, someone else still uploading', actor(['admin']), row('other', 'uploading'), false, false],
    ['teacher, owner account deleted', actor(['teacher']), row(null), true, false],
  ])('%s', (_who, who, recording, view, edit) => {
    expect([canViewRecording(who, recording), canEditRecording(who, recording)]).toEqual([view, edit]);
  });
});

describe('retry rule', () => {
  it('offers a retry only for a failed recording with a failure that may pass next time', () => {
    expect(isRetryable('failed', 'processing_error')).toBe(true);
    expect(isRetryable('failed', 'timed_out')).toBe(true);
    expect(isRetryable('failed', 'unreadable')).toBe(false);
    expect(isRetryable('failed', 'not_video')).toBe(false);
    expect(isRetryable('failed', null)).toBe(false);
    expect(isRetryable('ready', 'processing_error')).toBe(false);
  });
});
