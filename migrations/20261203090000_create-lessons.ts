import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // A lesson: one recording plus the draft a studio autosaves; published versions freeze it.
  await knex.schema.createTable('lessons', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE').index();
    t.uuid('owner_id').references('users.id').onDelete('SET NULL').index();
    // The owner's department when the lesson was made: sharing reaches this department.
    t.uuid('department_id').references('departments.id').onDelete('SET NULL');
    // A recording cannot be deleted while a lesson uses it (the API names the lesson first).
    t.uuid('recording_id').notNullable().references('recordings.id').onDelete('RESTRICT').index();
    // Copies of draft settings for listing and search without reading the draft.
    t.text('title').notNullable();
    t.specificType('tags', 'text[]').notNullable().defaultTo('{}');
    t.text('level').notNullable().defaultTo('');
    t.integer('checkpoint_count').notNullable().defaultTo(0);
    t.boolean('shared').notNullable().defaultTo(false);
    t.timestamp('archived_at', { useTz: true });
    t.jsonb('draft').notNullable();
    // Hash of the draft's canonical JSON: equal to the newest version's when nothing is unpublished.
    t.text('draft_hash').notNullable();
    // Bumped by every save; a save names the revision it started from (two tabs cannot overwrite).
    t.integer('revision').notNullable().defaultTo(0);
    t.timestamp('saved_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid('saved_by').references('users.id').onDelete('SET NULL');
    t.integer('latest_version');
    // The lesson this one was duplicated from, if any (same school).
    t.uuid('copied_from_id').references('lessons.id').onDelete('SET NULL');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw('CREATE INDEX lessons_tags_gin ON lessons USING gin (tags)');

  // Immutable snapshots; assignments (later) point at one, so answers keep the checkpoint as it was.
  await knex.schema.createTable('lesson_versions', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('lesson_id').notNullable().references('lessons.id').onDelete('CASCADE');
    t.integer('number').notNullable();
    t.jsonb('content').notNullable();
    t.text('content_hash').notNullable();
    t.uuid('recording_id').notNullable().references('recordings.id').onDelete('RESTRICT');
    t.integer('checkpoint_count').notNullable();
    t.text('note').notNullable().defaultTo('');
    // {added, removed, edited, chaptersChanged, settings} against the previous version.
    t.jsonb('changes').notNullable();
    t.timestamp('published_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid('published_by').references('users.id').onDelete('SET NULL');
    t.unique(['lesson_id', 'number']);
  });

  // Images a teacher puts in prompts and notes; served by the API with the sniffed type.
  await knex.schema.createTable('lesson_images', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE').index();
    t.uuid('lesson_id').references('lessons.id').onDelete('SET NULL').index();
    t.uuid('uploaded_by').references('users.id').onDelete('SET NULL');
    t.text('object_key').notNullable().unique();
    t.text('content_type').notNullable();
    t.integer('size').notNullable();
    t.text('file_name').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('lesson_images');
  await knex.schema.dropTable('lesson_versions');
  await knex.schema.dropTable('lessons');
}
