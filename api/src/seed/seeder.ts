import type { Knex } from 'knex';
import { createKnex } from '../db/knex';
import { seedPeopleAndClasses } from './steps/001-people-and-classes';
import { seedDemoRecordings } from './steps/002-demo-recordings';
import { seedDemoLessons } from './steps/003-demo-lessons';
import { seedDemoAssignment } from './steps/004-demo-assignment';

/** The app's settings as variables (storage address, bucket …), as the app itself would read them. */
export type SeedSettings = Record<string, string | undefined>;

export interface SeedStep {
  name: string;
  run(trx: Knex.Transaction, settings: SeedSettings): Promise<void>;
}

/** Demo seed steps in order; a step that has run is recorded and never runs again. Append, never edit. */
export const SEED_STEPS: SeedStep[] = [
  { name: '001-people-and-classes', run: seedPeopleAndClasses },
  { name: '002-demo-recordings', run: seedDemoRecordings },
  { name: '003-demo-lessons', run: seedDemoLessons },
  { name: '004-demo-assignment', run: (trx) => seedDemoAssignment(trx) },
];

// Any fixed number: two starts at once must not seed twice.
const SEED_LOCK = 727_001;

/** Runs the seed steps that have not run yet; returns their names. */
export async function seed(databaseUrl: string, steps: SeedStep[] = SEED_STEPS, settings: SeedSettings = process.env): Promise<string[]> {
  const knex = createKnex(databaseUrl, { min: 0, max: 1 });
  try {
    return await knex.transaction(async (trx) => {
      await trx.raw('SELECT pg_advisory_xact_lock(?)', [SEED_LOCK]);
      const done = new Set((await trx('seed_steps').select<{ name: string }[]>('name')).map((row) => row.name));
      const ran: string[] = [];
      for (const step of steps.filter((s) => !done.has(s.name))) {
        await step.run(trx, settings);
        await trx('seed_steps').insert({ name: step.name });
        ran.push(step.name);
      }
      return ran;
    });
  } finally {
    await knex.destroy();
  }
}
