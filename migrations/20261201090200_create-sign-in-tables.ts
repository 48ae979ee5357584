import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // The connect-pg-simple layout, so the store needs no start-up DDL of its own.
  await knex.schema.createTable('sessions', (t) => {
    t.text('sid').primary();
    t.json('sess').notNullable();
    t.timestamp('expire', { useTz: true }).notNullable().index();
  });

  // E-mail sign-in and class-join links: only a SHA-256 hash of the token is kept.
  await knex.schema.createTable('sign_in_tokens', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.text('token_hash').notNullable().unique();
    t.text('purpose').notNullable();
    t.text('email').notNullable();
    // For a class join: the name the student gave, used when their account is created.
    t.text('name');
    t.uuid('user_id').references('users.id').onDelete('CASCADE');
    t.uuid('class_id').references('classes.id').onDelete('CASCADE');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('used_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['email', 'created_at']);
  });
  await knex.raw("ALTER TABLE sign_in_tokens ADD CONSTRAINT sign_in_tokens_purpose_known CHECK (purpose IN ('sign_in', 'join'))");

  await knex.schema.createTable('invitations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE').index();
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE').index();
    t.specificType('roles', 'text[]').notNullable();
    t.uuid('class_id').references('classes.id').onDelete('SET NULL');
    t.uuid('invited_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('accepted_at', { useTz: true });
  });

  // rate-limiter-flexible's table layout: counters shared by every API process.
  await knex.schema.createTable('rate_limits', (t) => {
    t.string('key', 255).primary();
    t.integer('points').notNullable().defaultTo(0);
    t.bigInteger('expire');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('rate_limits');
  await knex.schema.dropTable('invitations');
  await knex.schema.dropTable('sign_in_tokens');
  await knex.schema.dropTable('sessions');
}
