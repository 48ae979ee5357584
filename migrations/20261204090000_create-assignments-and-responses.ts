import type { Knex } from 'knex';

const instant = { useTz: true } as const;

export async function up(knex: Knex): Promise<void> {
  // A published lesson version given to one class; dates are instants (typed in the school's zone).
  await knex.schema.createTable('assignments', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE').index();
    t.uuid('lesson_id').notNullable().references('lessons.id').onDelete('CASCADE').index();
    // Only a move to a corrected version of the same lesson changes it.
    t.uuid('lesson_version_id').notNullable().references('lesson_versions.id').onDelete('RESTRICT');
    t.integer('version_number').notNullable();
    t.uuid('class_id').notNullable().references('classes.id').onDelete('CASCADE').index();
    t.uuid('created_by').references('users.id').onDelete('SET NULL');
    t.timestamp('opens_at', instant).notNullable();
    t.timestamp('due_at', instant).notNullable();
    t.timestamp('late_until', instant);
    t.text('feedback').notNullable();
    t.text('reveal').notNullable();
    t.double('completion_watch_share').notNullable().defaultTo(0.9);
    t.timestamp('created_at', instant).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', instant).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(`ALTER TABLE assignments
    ADD CONSTRAINT assignments_feedback CHECK (feedback IN ('immediately', 'after-due', 'never')),
    ADD CONSTRAINT assignments_reveal CHECK (reveal IN ('after-last-attempt', 'after-due', 'never')),
    ADD CONSTRAINT assignments_share CHECK (completion_watch_share BETWEEN 0 AND 1),
    ADD CONSTRAINT assignments_dates CHECK (due_at > opens_at AND (late_until IS NULL OR late_until > due_at))`);

  // Every move to a corrected version, with what the regrade did.
  await knex.schema.createTable('assignment_version_moves', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('assignment_id').notNullable().references('assignments.id').onDelete('CASCADE').index();
    t.integer('from_version').notNullable();
    t.integer('to_version').notNullable();
    t.specificType('changed_keys', 'text[]').notNullable().defaultTo('{}');
    t.integer('responses_regraded').notNullable().defaultTo(0);
    t.integer('grades_changed').notNullable().defaultTo(0);
    t.uuid('moved_by').references('users.id').onDelete('SET NULL');
    t.timestamp('moved_at', instant).notNullable().defaultTo(knex.fn.now());
  });

  // One row per student and assignment: the lock that numbers attempts, the safety acknowledgement,
  // the resume point and the per-second viewing coverage (one bit per second of the recording).
  await knex.schema.createTable('student_progress', (t) => {
    t.uuid('assignment_id').notNullable().references('assignments.id').onDelete('CASCADE');
    t.uuid('student_id').notNullable().references('users.id').onDelete('CASCADE').index();
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE');
    t.primary(['assignment_id', 'student_id']);
    t.timestamp('first_opened_at', instant);
    t.timestamp('safety_acknowledged_at', instant);
    t.integer('position_ms').notNullable().defaultTo(0);
    t.binary('coverage').notNullable().defaultTo(knex.raw("'\\x'::bytea"));
    t.integer('watched_seconds').notNullable().defaultTo(0);
    t.timestamp('viewing_updated_at', instant);
    t.timestamp('completed_at', instant);
    // The student's last visit to their results page ("grade updated" is newer than it).
    t.timestamp('results_seen_at', instant);
    t.timestamp('grade_updated_at', instant);
    t.timestamp('updated_at', instant).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw('CREATE INDEX student_progress_viewing ON student_progress (viewing_updated_at)');

  // The values the engine drew for one student at one numeric checkpoint, on their first view.
  await knex.schema.createTable('student_variables', (t) => {
    t.uuid('assignment_id').notNullable().references('assignments.id').onDelete('CASCADE');
    t.uuid('student_id').notNullable().references('users.id').onDelete('CASCADE');
    t.text('checkpoint_key').notNullable();
    t.primary(['assignment_id', 'student_id', 'checkpoint_key']);
    t.jsonb('values').notNullable();
    t.timestamp('drawn_at', instant).notNullable().defaultTo(knex.fn.now());
  });

  // One answer, immutable. Exactly once: a resend carries the same idempotency key; the attempt
  // number is given under the progress row's lock.
  await knex.schema.createTable('responses', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('school_id').notNullable().references('schools.id').onDelete('CASCADE');
    t.uuid('assignment_id').notNullable().references('assignments.id').onDelete('CASCADE');
    t.uuid('student_id').notNullable().references('users.id').onDelete('CASCADE');
    t.text('checkpoint_key').notNullable();
    t.integer('version_number').notNullable();
    t.integer('attempt').notNullable();
    t.uuid('idempotency_key').notNullable();
    // SHA-256 of the request's canonical body: the same key with another body is refused.
    t.text('request_hash').notNullable();
    t.jsonb('answer').notNullable();
    t.text('raw_text').notNullable();
    t.double('parsed_si');
    t.jsonb('variables');
    // A prediction's explanation sent at its reveal: recorded, not counted against the attempts.
    t.boolean('is_explanation').notNullable().defaultTo(false);
    t.timestamp('answered_at', instant).notNullable();
    t.timestamp('received_at', instant).notNullable().defaultTo(knex.fn.now());
    t.boolean('late').notNullable().defaultTo(false);
    t.boolean('sent_after_reconnecting').notNullable().defaultTo(false);
    t.unique(['student_id', 'idempotency_key']);
    t.unique(['assignment_id', 'student_id', 'checkpoint_key', 'attempt']);
  });
  await knex.raw('ALTER TABLE responses ADD CONSTRAINT responses_attempt CHECK (attempt >= 1)');

  // Append-only: the latest grade of a response counts (engine, regrade after a move, or a teacher).
  await knex.schema.createTable('grades', (t) => {
    t.bigIncrements('id').primary();
    t.uuid('response_id').notNullable().references('responses.id').onDelete('CASCADE').index();
    t.uuid('assignment_id').notNullable().references('assignments.id').onDelete('CASCADE');
    t.text('checkpoint_key').notNullable();
    t.double('score').notNullable();
    t.boolean('correct');
    t.text('mistake');
    // The engine's whole reply (feedback, hints, reveal, attempts left) as graded.
    t.jsonb('detail').notNullable();
    t.text('source').notNullable();
    t.uuid('graded_by').references('users.id').onDelete('SET NULL');
    t.integer('version_number').notNullable();
    t.timestamp('graded_at', instant).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("ALTER TABLE grades ADD CONSTRAINT grades_source CHECK (source IN ('engine', 'regrade', 'teacher'))");
  await knex.raw('CREATE INDEX grades_assignment ON grades (assignment_id, id)');

  // Rollups the results pages read instead of raw rows, kept by the rollup job.
  await knex.schema.createTable('checkpoint_rollups', (t) => {
    t.uuid('assignment_id').notNullable().references('assignments.id').onDelete('CASCADE');
    t.text('checkpoint_key').notNullable();
    t.primary(['assignment_id', 'checkpoint_key']);
    t.integer('students').notNullable().defaultTo(0);
    t.integer('attempts').notNullable().defaultTo(0);
    t.integer('first_attempt_correct').notNullable().defaultTo(0);
    t.integer('correct_students').notNullable().defaultTo(0);
    // { "power-of-ten": 3, "sign": 1 } and { "<answer text>": count } of latest answers.
    t.jsonb('mistakes').notNullable().defaultTo('{}');
    t.jsonb('distribution').notNullable().defaultTo('{}');
    t.timestamp('computed_at', instant).notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable('viewing_rollups', (t) => {
    t.uuid('assignment_id').primary().references('assignments.id').onDelete('CASCADE');
    t.integer('students').notNullable().defaultTo(0);
    // Per second of the recording: how many students watched it.
    t.specificType('audience', 'integer[]').notNullable().defaultTo('{}');
    t.timestamp('computed_at', instant).notNullable().defaultTo(knex.fn.now());
  });
  // How far the rollup job has read (grades by id, viewing by time).
  await knex.schema.createTable('rollup_marks', (t) => {
    t.text('name').primary();
    t.bigInteger('last_grade_id').notNullable().defaultTo(0);
    t.timestamp('last_viewing_at', instant).notNullable().defaultTo(knex.raw("'epoch'"));
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    'rollup_marks',
    'viewing_rollups',
    'checkpoint_rollups',
    'grades',
    'responses',
    'student_variables',
    'student_progress',
    'assignment_version_moves',
    'assignments',
  ]) {
    await knex.schema.dropTable(table);
  }
}
