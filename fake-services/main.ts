// CLI entry: `tsx fake-services/main.ts`. Options come from FAKE_* variables (see fake-env.ts);
// prints "fakes ready {urls}" once everything listens; SIGTERM/SIGINT close all and exit 0.
import { readFakeEnv } from './fake-env';
import { startFakeServices } from './index';

const env = readFakeEnv(process.env);
if (!env.ok) {
  console.error(`fake services: bad environment:\n${env.problems.map((problem) => `  - ${problem}`).join('\n')}`);
  process.exit(1);
}

let fakes: Awaited<ReturnType<typeof startFakeServices>>;
try {
  fakes = await startFakeServices(env.options);
} catch (error) {
  console.error(`fake services: could not start:\n${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
}

let stopping = false;
const stop = (signal: string): void => {
  if (stopping) return;
  stopping = true;
  fakes.close().then(
    () => process.exit(0),
    (error: unknown) => {
      console.error(`fake services: error while closing after ${signal}:`, error);
      process.exit(1);
    },
  );
};
process.on('SIGTERM', () => stop('SIGTERM'));
process.on('SIGINT', () => stop('SIGINT'));

console.log(`fakes ready ${JSON.stringify(fakes.urls)}`);
