import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, createTestApp, signedInClient, type TestApp } from '../../../test/test-app';
import { buildClass, buildMember } from '../../../test/factories';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function adminClient() {
  const admin = await buildMember(t.db, { roles: ['admin'] });
  return { admin, client: await signedInClient(t, admin.email) };
}

describe('POST /api/admin/invitations', () => {
  it('403 for a teacher', async () => {
    const teacher = await buildMember(t.db, { roles: ['teacher'] });
    const res = await (
      await signedInClient(t, teacher.email)
    ).send('post', '/api/admin/invitations', { email: 'x@test.example', name: 'X', roles: ['teacher'] });
    expect(res.status).toBe(403);
  });

  it('400 lists each bad field', async () => {
    const { client } = await adminClient();
    const res = await client.send('post', '/api/admin/invitations', { email: 'nope', name: '', roles: [] });
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([
      { path: 'email', message: 'Enter a valid e-mail address, like name@school.example.' },
      { path: 'name', message: 'Enter a name.' },
      { path: 'roles', message: 'Choose at least one role.' },
    ]);
  });

  it('invites a person who then signs in and lands in the school', async () => {
    const { admin, client } = await adminClient();
    const res = await client.send('post', '/api/admin/invitations', {
      email: 'New.Teacher@Test.example',
      name: 'New Teacher',
      roles: ['teacher', 'coordinator'],
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email: 'new.teacher@test.example', status: 'invited', roles: ['teacher', 'coordinator'] });
    const mail = t.sent.at(-1)!;
    expect(mail.to).toBe('new.teacher@test.example');
    expect(mail.subject).toMatch(/invited/);
    expect(await t.db('audit_events').where({ action: 'invitation_sent', actor_id: admin.id }).first('id')).toBeDefined();

    const invitee = new Client(t);
    await invitee.signIn('new.teacher@test.example');
    expect((await invitee.get('/api/me')).body.active).toEqual({ schoolId: admin.schoolId, role: 'teacher' });
    const listed = await client.get('/api/admin/people?q=new.teacher');
    expect(listed.body.people[0].status).toBe('active');
  });

  it('409 when the person is already a member', async () => {
    const { admin, client } = await adminClient();
    const member = await buildMember(t.db, { roles: ['student'], schoolId: admin.schoolId });
    const res = await client.send('post', '/api/admin/invitations', { email: member.email, name: 'Again', roles: ['student'] });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('already_member');
  });
});

describe('roster import', () => {
  it('previews per-row errors and imports nothing while any row is bad', async () => {
    const { admin, client } = await adminClient();
    const cls = await buildClass(t.db, { schoolId: admin.schoolId, name: '8B Physics' });
    const csv = [
      'email,name,roles,class',
      'lena.roster@test.example,Lena Roster,student,8B Physics',
      'broken-address,No At,student,',
      'sam.roster@test.example,Sam Roster,wizard,',
      'lena.roster@test.example,Lena Twice,student,',
    ].join('\n');
    const preview = await client.send('post', '/api/admin/roster/preview', { csv });
    expect(preview.status).toBe(200);
    expect(preview.body.valid).toBe(false);
    expect(preview.body.rows.map((r: { line: number; errors: string[] }) => [r.line, r.errors])).toEqual([
      [2, []],
      [3, ['Enter a valid e-mail address, like name@school.example.']],
      [4, ['Unknown role “wizard”: use admin, coordinator, teacher, substitute or student, separated by ;']],
      [5, ['This address is already on line 2.']],
    ]);

    const rejected = await client.send('post', '/api/admin/roster/import', { csv });
    expect(rejected.status).toBe(400);
    expect(rejected.body.error.code).toBe('roster_invalid');
    expect(rejected.body.error.message).toBe('The roster has 3 problems; nothing was imported.');
    expect(rejected.body.error.details[0]).toEqual({ path: 'line 3', message: 'Enter a valid e-mail address, like name@school.example.' });
    expect(await t.db('users').where({ email: 'lena.roster@test.example' }).first()).toBeUndefined();
    expect(await t.db('enrolments').where({ class_id: cls.id })).toHaveLength(0);
  });

  it('imports a clean roster: invitations sent and students enrolled', async () => {
    const { admin, client } = await adminClient();
    const cls = await buildClass(t.db, { schoolId: admin.schoolId, name: '9C Physics' });
    const csv =
      'Email,Name,Roles,Class\r\nmo.import@test.example,Mo Import,student,9c physics\r\nkai.import@test.example,Kai Import,teacher;coordinator,\r\n';
    const res = await client.send('post', '/api/admin/roster/import', { csv });
    expect(res.status).toBe(201);
    expect(res.body).toEqual({ invited: 2, enrolled: 1 });
    expect(t.sent.slice(-2).map((m) => m.to)).toEqual(['mo.import@test.example', 'kai.import@test.example']);
    const enrolled = await t.db('enrolments as e').join('users as u', 'u.id', 'e.student_id').where('e.class_id', cls.id).pluck('u.email');
    expect(enrolled).toEqual(['mo.import@test.example']);
  });

  it('reports a missing header column', async () => {
    const { client } = await adminClient();
    const res = await client.send('post', '/api/admin/roster/preview', { csv: 'mail,who\na@b.example,A' });
    expect(res.body.errors).toEqual(['The header row must name the columns email, name, roles, class; missing: email, name, roles.']);
    expect(res.body.valid).toBe(false);
  });
});

describe('PATCH /api/admin/people/:userId', () => {
  it('refuses to remove the school’s last admin, and records role changes', async () => {
    const { admin, client } = await adminClient();
    const refused = await client.send('patch', `/api/admin/people/${admin.id}`, { roles: ['teacher'] });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('last_admin');

    const second = await buildMember(t.db, { roles: ['teacher'], schoolId: admin.schoolId });
    const promoted = await client.send('patch', `/api/admin/people/${second.id}`, { roles: ['teacher', 'admin'] });
    expect(promoted.status).toBe(200);
    expect(promoted.body.roles).toEqual(['teacher', 'admin']);
    const demoted = await client.send('patch', `/api/admin/people/${admin.id}`, { roles: ['teacher'] });
    expect(demoted.status).toBe(200);
    const audit = await t.db('audit_events').where({ action: 'roles_changed', subject_id: second.id }).first('data');
    expect(audit.data).toEqual({ from: ['teacher'], to: ['teacher', 'admin'] });
  });

  it('404 for a person of another school', async () => {
    const { client } = await adminClient();
    const outsider = await buildMember(t.db, { roles: ['teacher'] });
    expect((await client.send('patch', `/api/admin/people/${outsider.id}`, { roles: ['student'] })).status).toBe(404);
  });

  it('400 when nothing is sent to change', async () => {
    const { admin, client } = await adminClient();
    const res = await client.send('patch', `/api/admin/people/${admin.id}`, {});
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('Send roles or departmentId to change.');
  });
});

describe('GET /api/admin/people', () => {
  it('searches by name or e-mail within the school, filters by role and pages', async () => {
    const { admin, client } = await adminClient();
    await buildMember(t.db, { roles: ['student'], schoolId: admin.schoolId, name: 'Quorra Searchable' });
    await buildMember(t.db, { roles: ['student'], name: 'Quorra Elsewhere' });
    const res = await client.get('/api/admin/people?q=quorra&role=student&pageSize=10');
    expect(res.status).toBe(200);
    expect(res.body.people.map((p: { name: string }) => p.name)).toEqual(['Quorra Searchable']);
    expect(res.body.total).toBe(1);
    const bad = await client.get('/api/admin/people?role=wizard');
    expect(bad.status).toBe(400);
  });
});
