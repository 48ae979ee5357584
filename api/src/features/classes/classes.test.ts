import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, createTestApp, lastLinkToken, signedInClient, type TestApp } from '../../../test/test-app';
import { buildClass, buildDepartment, buildMember, buildSchool, enrol } from '../../../test/factories';
import { NEUTRAL_JOIN_NOTICE } from '../auth/auth.service';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('class access', () => {
  it('a student calling a teacher route gets 403 with a JSON error', async () => {
    const student = await buildMember(t.db, { roles: ['student'] });
    const client = await signedInClient(t, student.email);
    const res = await client.get('/api/teacher/classes');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect(res.body.error.message).toMatch(/^This needs the teacher role in /);
  });

  it('a user of one school cannot read another school’s class', async () => {
    const foreign = await buildClass(t.db);
    const admin = await buildMember(t.db, { roles: ['admin', 'teacher'] });
    const client = await signedInClient(t, admin.email);
    const res = await client.get(`/api/classes/${foreign.id}`);
    expect(res.status).toBe(404);
    expect(res.body.error).toEqual({ code: 'not_found', message: 'That class was not found.' });
    expect((await client.get(`/api/admin/classes/${foreign.id}`)).status).toBe(404);
  });

  it('400 for a malformed class id', async () => {
    const teacher = await buildMember(t.db, { roles: ['teacher'] });
    const res = await (await signedInClient(t, teacher.email)).get('/api/classes/not-a-uuid');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('classId: Expected an id (a UUID).');
  });

  it('a teacher sees only their own classes, and cannot open a colleague’s roster', async () => {
    const school = await buildSchool(t.db);
    const mine = await buildClass(t.db, { schoolId: school.id });
    const colleagues = await buildClass(t.db, { schoolId: school.id });
    const me = (await t.db('users').where({ id: mine.teacherId }).first('email')).email;
    const client = await signedInClient(t, me);
    const list = await client.get('/api/teacher/classes');
    expect(list.body.classes.map((c: { id: string }) => c.id)).toEqual([mine.id]);
    expect((await client.get(`/api/classes/${mine.id}`)).status).toBe(200);
    expect((await client.get(`/api/classes/${colleagues.id}`)).status).toBe(403);
  });

  it('a coordinator opens any class of their department', async () => {
    const school = await buildSchool(t.db);
    const dept = await buildDepartment(t.db, school.id);
    const cls = await buildClass(t.db, { schoolId: school.id, departmentId: dept.id });
    const coordinator = await buildMember(t.db, { roles: ['coordinator'], schoolId: school.id, departmentId: dept.id });
    const res = await (await signedInClient(t, coordinator.email)).get(`/api/classes/${cls.id}`);
    expect(res.status).toBe(200);
    expect(res.body.id).toBe(cls.id);
  });
});

describe('joining a class by code', () => {
  it('a student on the school’s domain joins with a code and an e-mailed link', async () => {
    const school = await buildSchool(t.db, { emailDomains: ['joiners.example'] });
    const cls = await buildClass(t.db, { schoolId: school.id });
    const email = 'new.student@joiners.example';
    const res = await new Client(t).send('post', '/api/auth/join', { code: cls.joinCode.toLowerCase(), email, name: 'New Student' });
    expect(res.status).toBe(202);
    expect(res.body.message).toBe(NEUTRAL_JOIN_NOTICE);

    const client = new Client(t);
    const verified = await client.send('post', '/api/auth/email-link/verify', { token: lastLinkToken(t.sent, email) });
    expect(verified.status).toBe(200);
    expect(verified.body.active).toEqual({ schoolId: school.id, role: 'student' });
    const classes = await client.get('/api/student/classes');
    expect(classes.body.classes.map((c: { id: string }) => c.id)).toEqual([cls.id]);
  });

  it('an address off the school’s domains gets the same answer and no mail', async () => {
    const cls = await buildClass(t.db);
    const before = t.sent.length;
    const res = await new Client(t).send('post', '/api/auth/join', {
      code: cls.joinCode,
      email: 'outsider@elsewhere.example',
      name: 'Out Sider',
    });
    expect(res.status).toBe(202);
    expect(res.body.message).toBe(NEUTRAL_JOIN_NOTICE);
    expect(t.sent.length).toBe(before);
  });

  it('400 names a malformed code', async () => {
    const res = await new Client(t).send('post', '/api/auth/join', { code: 'abc', email: 'a@b.example', name: 'A B' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('code: A class code has 8 letters and digits, like K7QM2XPA.');
  });

  it('a signed-in student adds a class of their school by code, not one of another school', async () => {
    const cls = await buildClass(t.db);
    const other = await buildClass(t.db);
    const student = await buildMember(t.db, { roles: ['student'], schoolId: cls.schoolId });
    const client = await signedInClient(t, student.email);
    const joined = await client.send('post', '/api/student/enrolments', { code: cls.joinCode });
    expect(joined.status).toBe(201);
    expect(joined.body).toMatchObject({ id: cls.id, name: cls.name });
    const foreign = await client.send('post', '/api/student/enrolments', { code: other.joinCode });
    expect(foreign.status).toBe(404);
  });
});

describe('admin class management', () => {
  it('creates a class with a join code, enrols and removes students', async () => {
    const admin = await buildMember(t.db, { roles: ['admin'] });
    const teacher = await buildMember(t.db, { roles: ['teacher'], schoolId: admin.schoolId });
    const student = await buildMember(t.db, { roles: ['student'], schoolId: admin.schoolId });
    const client = await signedInClient(t, admin.email);
    const created = await client.send('post', '/api/admin/classes', { name: '9A Physics', departmentId: null, teacherId: teacher.id });
    expect(created.status).toBe(201);
    expect(created.body.joinCode).toMatch(/^[A-HJ-NP-Z2-9]{8}$/);
    const enrolled = await client.send('post', `/api/admin/classes/${created.body.id}/enrolments`, { userIds: [student.id] });
    expect(enrolled.body.students.map((s: { userId: string }) => s.userId)).toEqual([student.id]);
    const notStudent = await client.send('post', `/api/admin/classes/${created.body.id}/enrolments`, { userIds: [teacher.id] });
    expect(notStudent.status).toBe(400);
    expect(notStudent.body.error.message).toBe('1 of the people chosen are not students of this school.');
    expect((await client.send('delete', `/api/admin/classes/${created.body.id}/enrolments/${student.id}`)).status).toBe(204);
  });

  it('refuses a teacher from another school', async () => {
    const admin = await buildMember(t.db, { roles: ['admin'] });
    const outsider = await buildMember(t.db, { roles: ['teacher'] });
    const res = await (
      await signedInClient(t, admin.email)
    ).send('post', '/api/admin/classes', { name: 'X', departmentId: null, teacherId: outsider.id });
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([{ path: 'teacherId', message: 'Choose a teacher of this school.' }]);
  });
});

describe('homes', () => {
  it('a student sees their classes, without join codes', async () => {
    const cls = await buildClass(t.db);
    const student = await buildMember(t.db, { roles: ['student'], schoolId: cls.schoolId });
    await enrol(t.db, cls.id, student.id);
    const res = await (await signedInClient(t, student.email)).get('/api/student/classes');
    expect(res.body.classes).toHaveLength(1);
    expect(res.body.classes[0]).not.toHaveProperty('joinCode');
  });
});
