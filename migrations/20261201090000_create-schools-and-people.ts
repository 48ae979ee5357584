import type { Knex } from 'knex';

const ROLES = "'admin','coordinator','teacher','substitute','student'";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('schools', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('name').notNullable();
    t.text('time_zone').notNullable();
    t.text('locale').notNullable();
    // Verified e-mail domains whose owners may join a class with its code.
    t.specificType('email_domains', 'text[]').notNullable().defaultTo('{}');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('departments', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE');
    t.text('name').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw('CREATE UNIQUE INDEX departments_school_name_unique ON departments (school_id, lower(name))');

  await knex.schema.createTable('users', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('email').notNullable().unique();
    t.text('name').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('last_sign_in_at', { useTz: true });
  });
  await knex.raw('ALTER TABLE users ADD CONSTRAINT users_email_lower CHECK (email = lower(email))');

  // One row per external sign-in account (the provider's stable `sub`), linked to a user.
  await knex.schema.createTable('identities', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE').index();
    t.text('provider').notNullable();
    t.text('subject').notNullable();
    t.text('email').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['provider', 'subject']);
  });

  await knex.schema.createTable('memberships', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE').index();
    t.specificType('roles', 'text[]').notNullable();
    t.uuid('department_id').references('departments.id').onDelete('SET NULL').index();
    t.text('status').notNullable().defaultTo('invited');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['user_id', 'school_id']);
  });
  await knex.raw(`ALTER TABLE memberships
    ADD CONSTRAINT memberships_roles_known CHECK (cardinality(roles) >= 1 AND roles <@ ARRAY[${ROLES}]::text[]),
    ADD CONSTRAINT memberships_status_known CHECK (status IN ('invited', 'active'))`);
  await knex.raw('CREATE INDEX memberships_roles_gin ON memberships USING gin (roles)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('memberships');
  await knex.schema.dropTable('identities');
  await knex.schema.dropTable('users');
  await knex.schema.dropTable('departments');
  await knex.schema.dropTable('schools');
}
