import type { Knex } from 'knex';
import { DEMO_CLASSES, DEMO_SCHOOL, DEMO_STAFF, SECOND_SCHOOL, studentEmail } from '../demo-roster';

async function insertSchool(trx: Knex.Transaction, school: typeof DEMO_SCHOOL | typeof SECOND_SCHOOL) {
  const [row] = await trx('schools')
    .insert({ name: school.name, time_zone: school.timeZone, locale: school.locale, email_domains: [...school.emailDomains] })
    .returning('id');
  const schoolId = (row as { id: string }).id;
  const [dept] = await trx('departments').insert({ school_id: schoolId, name: school.department }).returning('id');
  return { schoolId, departmentId: (dept as { id: string }).id };
}

async function insertUser(trx: Knex.Transaction, email: string, name: string): Promise<string> {
  const [row] = await trx('users').insert({ email, name }).returning('id');
  return (row as { id: string }).id;
}

/** The demo schools, their staff, two classes of students, and a substitute who covers in both schools. */
export async function seedPeopleAndClasses(trx: Knex.Transaction): Promise<void> {
  const main = await insertSchool(trx, DEMO_SCHOOL);
  const second = await insertSchool(trx, SECOND_SCHOOL);
  const ids = new Map<string, string>();
  for (const person of DEMO_STAFF) {
    const userId = await insertUser(trx, person.email, person.name);
    ids.set(person.email, userId);
    const inDepartment = person.roles.some((role) => role !== 'admin');
    await trx('memberships').insert({
      user_id: userId,
      school_id: main.schoolId,
      roles: person.roles,
      department_id: inDepartment ? main.departmentId : null,
      status: 'active',
    });
    if (person.roles.includes('substitute')) {
      await trx('memberships').insert({
        user_id: userId,
        school_id: second.schoolId,
        roles: ['substitute'],
        department_id: second.departmentId,
        status: 'active',
      });
    }
  }
  for (const cls of DEMO_CLASSES) {
    const [row] = await trx('classes')
      .insert({
        school_id: main.schoolId,
        department_id: main.departmentId,
        teacher_id: ids.get(cls.teacher),
        name: cls.name,
        join_code: cls.joinCode,
      })
      .returning('id');
    const classId = (row as { id: string }).id;
    for (const name of cls.students) {
      const userId = await insertUser(trx, studentEmail(name), name);
      await trx('memberships').insert({ user_id: userId, school_id: main.schoolId, roles: ['student'], status: 'active' });
      await trx('enrolments').insert({ class_id: classId, student_id: userId });
    }
  }
  await trx('classes').insert({
    school_id: second.schoolId,
    department_id: second.departmentId,
    name: '12S Physics',
    join_code: 'TWLVSPHY',
  });
}
