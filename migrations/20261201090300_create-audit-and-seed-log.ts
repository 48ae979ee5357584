import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('audit_events', (t) => {
    t.bigIncrements('id').primary();
    t.uuid('school_id').references('schools.id').onDelete('CASCADE');
    t.uuid('actor_id').references('users.id').onDelete('SET NULL');
    t.uuid('subject_id').references('users.id').onDelete('SET NULL');
    t.text('action').notNullable();
    t.jsonb('data').notNullable().defaultTo('{}');
    t.text('ip');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['school_id', 'created_at']);
    t.index(['subject_id']);
  });

  // Demo seed steps, run once each, in order, like migrations.
  await knex.schema.createTable('seed_steps', (t) => {
    t.text('name').primary();
    t.timestamp('ran_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('seed_steps');
  await knex.schema.dropTable('audit_events');
}
