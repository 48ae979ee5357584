import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('classes', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE').index();
    t.uuid('department_id').references('departments.id').onDelete('SET NULL').index();
    t.uuid('teacher_id').references('users.id').onDelete('SET NULL').index();
    t.text('name').notNullable();
    t.text('join_code').notNullable().unique();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('archived_at', { useTz: true });
  });
  await knex.raw("ALTER TABLE classes ADD CONSTRAINT classes_join_code_format CHECK (join_code ~ '^[A-Z0-9]{8}$')");

  await knex.schema.createTable('enrolments', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('class_id').notNullable().references('classes.id').onDelete('CASCADE');
    t.uuid('student_id').notNullable().references('users.id').onDelete('CASCADE').index();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['class_id', 'student_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('enrolments');
  await knex.schema.dropTable('classes');
}
