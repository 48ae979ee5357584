import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  // One row per recording, created when its upload starts so the library can show it at once.
  await knex.schema.createTable('recordings', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE').index();
    t.uuid('owner_id').references('users.id').onDelete('SET NULL').index();
    t.text('title').notNullable();
    t.text('original_file_name').notNullable();
    t.text('state').notNullable().defaultTo('uploading');
    t.smallint('progress').notNullable().defaultTo(0);
    t.text('failure_code');
    t.text('failure_message');
    t.bigInteger('declared_size').notNullable();
    t.bigInteger('stored_size');
    t.text('content_type');
    t.text('original_key').notNullable().unique();
    t.text('rendition_key');
    t.text('poster_key');
    t.text('rendition_mode');
    t.double('duration_seconds');
    t.integer('width');
    t.integer('height');
    t.double('frame_rate');
    t.text('video_codec');
    t.text('audio_codec');
    t.bigInteger('bitrate');
    t.smallint('rotation');
    // Tile grid and sheet keys of the thumbnail sprites: {intervalSeconds, columns, rows, tileWidth, tileHeight, sheets: [{key, tiles}]}.
    t.jsonb('thumbnails');
    t.integer('processing_attempts').notNullable().defaultTo(0);
    t.timestamp('processed_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(
    "ALTER TABLE recordings ADD CONSTRAINT recordings_state_valid CHECK (state IN ('uploading', 'processing', 'ready', 'failed'))",
  );
  await knex.raw('ALTER TABLE recordings ADD CONSTRAINT recordings_progress_range CHECK (progress BETWEEN 0 AND 100)');

  // The S3 multipart upload behind a recording: what was promised, so only that is signed.
  await knex.schema.createTable('uploads', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE');
    t.uuid('owner_id').notNullable().references('users.id').onDelete('CASCADE').index();
    t.uuid('recording_id').references('recordings.id').onDelete('SET NULL').unique();
    t.text('object_key').notNullable().unique();
    t.text('s3_upload_id').notNullable();
    t.text('file_name').notNullable();
    t.text('declared_type').notNullable();
    t.bigInteger('declared_size').notNullable();
    t.integer('part_size').notNullable();
    t.integer('part_count').notNullable();
    t.bigInteger('file_last_modified').notNullable();
    t.text('first_part_sha256').notNullable();
    t.text('status').notNullable().defaultTo('uploading');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('last_activity_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('finished_at', { useTz: true });
  });
  await knex.raw("ALTER TABLE uploads ADD CONSTRAINT uploads_status_valid CHECK (status IN ('uploading', 'completed', 'aborted'))");
  await knex.raw("CREATE INDEX uploads_open_by_activity ON uploads (last_activity_at) WHERE status = 'uploading'");

  await knex.schema.createTable('recording_captions', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('recording_id').notNullable().references('recordings.id').onDelete('CASCADE');
    t.text('language').notNullable();
    t.text('label').notNullable();
    t.boolean('is_default').notNullable().defaultTo(false);
    t.text('vtt').notNullable();
    t.integer('cue_count').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(['recording_id', 'language']);
  });
  await knex.raw('CREATE UNIQUE INDEX recording_captions_one_default ON recording_captions (recording_id) WHERE is_default');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('recording_captions');
  await knex.schema.dropTable('uploads');
  await knex.schema.dropTable('recordings');
}
