import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { buildClass, buildMember, enrol } from '../../../test/factories';

let t: TestApp;
beforeAll(async () => {
  // The shipped defaults: 5 links per address per 15 minutes, a classroom-sized ceiling per client address.
  t = await createTestApp({ SIGNIN_LIMIT_PER_EMAIL: '5' });
});
afterAll(() => t.close());

describe('sign-in rate limits', () => {
  it('limits six rapid requests for one e-mail while 40 students from one address all sign in', async () => {
    const cls = await buildClass(t.db);
    const students = [];
    for (let i = 0; i < 40; i++) {
      const student = await buildMember(t.db, {
        roles: ['student'],
        schoolId: cls.schoolId,
        email: `pupil-${i}-${cls.id.slice(0, 6)}@test.example`,
      });
      await enrol(t.db, cls.id, student.id);
      students.push(student);
    }
    const target = await buildMember(t.db, { roles: ['teacher'] });
    const statuses = [];
    for (let i = 0; i < 6; i++) statuses.push((await new Client(t).send('post', '/api/auth/email-link', { email: target.email })).status);
    expect(statuses).toEqual([202, 202, 202, 202, 202, 429]);
    const limited = await new Client(t).send('post', '/api/auth/email-link', { email: target.email });
    expect(limited.body.error.code).toBe('rate_limited');
    expect(limited.body.error.message).toMatch(/Too many sign-in links were requested for this e-mail address/);
    expect(Number(limited.headers['retry-after'])).toBeGreaterThan(0);

    // Same client address (loopback) for the whole class.
    const signedIn = await Promise.all(students.map(async (student) => (await new Client(t).signIn(student.email)).user.email));
    expect(signedIn.sort()).toEqual(students.map((s) => s.email).sort());
  });
});
