import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, createTestApp, signedInClient, type TestApp } from '../../../test/test-app';
import { buildMember, buildSchool } from '../../../test/factories';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('GET /api/me and PUT /api/me/active', () => {
  it('401 when signed out', async () => {
    expect((await new Client(t).get('/api/me')).status).toBe(401);
  });

  it('a teacher who is also coordinator switches roles', async () => {
    const person = await buildMember(t.db, { roles: ['coordinator', 'teacher'] });
    const client = await signedInClient(t, person.email);
    const me = await client.get('/api/me');
    expect(me.body.active).toEqual({ schoolId: person.schoolId, role: 'teacher' });
    expect(me.body.memberships[0].roles).toEqual(['coordinator', 'teacher']);

    const switched = await client.send('put', '/api/me/active', { schoolId: person.schoolId, role: 'coordinator' });
    expect(switched.status).toBe(200);
    expect(switched.body.active.role).toBe('coordinator');
    expect((await client.get('/api/me')).body.active.role).toBe('coordinator');
    expect((await client.get('/api/departments/overview')).status).toBe(200);
  });

  it('403 when switching to a role or school one does not hold', async () => {
    const person = await buildMember(t.db, { roles: ['teacher'] });
    const other = await buildSchool(t.db);
    const client = await signedInClient(t, person.email);
    const role = await client.send('put', '/api/me/active', { schoolId: person.schoolId, role: 'admin' });
    expect(role.status).toBe(403);
    expect(role.body.error.message).toMatch(/You do not have the admin role in/);
    const school = await client.send('put', '/api/me/active', { schoolId: other.id, role: 'teacher' });
    expect(school.status).toBe(403);
    expect(school.body.error.message).toBe('You are not a member of that school.');
  });

  it('a substitute in two schools picks the active one, and data follows it', async () => {
    const first = await buildMember(t.db, { roles: ['substitute'] });
    const second = await buildSchool(t.db);
    await t.db('memberships').insert({ user_id: first.id, school_id: second.id, roles: ['substitute'], status: 'active' });
    const client = await signedInClient(t, first.email);
    expect((await client.get('/api/me')).body.memberships).toHaveLength(2);
    const switched = await client.send('put', '/api/me/active', { schoolId: second.id, role: 'substitute' });
    expect(switched.body.active.schoolId).toBe(second.id);
  });
});
