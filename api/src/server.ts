import pg from 'pg';
import { loadEnv } from './env';
import { createKnex } from './db/knex';
import { createSmtpMailer } from './mail/mailer';
import { createLogger } from './logger';
import { createApp } from './app';
import { demoAccounts } from './seed/demo-roster';

function fail(message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(1);
}

let env;
try {
  env = loadEnv();
} catch (error) {
  fail((error as Error).message);
}

const logger = createLogger(env.LOG_LEVEL);
const db = createKnex(env.DATABASE_URL);
const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5 });
const mailer = createSmtpMailer(env.SMTP_URL, env.MAIL_FROM);
const app = createApp({ env, db, pool, mailer, logger, demoAccounts });

const server = app.listen(env.PORT, env.HOST, () => {
  logger.info({ url: env.PUBLIC_URL }, 'pinfield api listening');
});
server.on('error', (error) => fail(`Could not listen on ${env.HOST}:${env.PORT}: ${error.message}`));

async function shutdown(signal: string): Promise<void> {
  logger.info({ signal }, 'shutting down');
  server.close();
  server.closeAllConnections();
  mailer.close();
  await Promise.allSettled([db.destroy(), pool.end()]);
  process.exit(0);
}
process.once('SIGTERM', () => void shutdown('SIGTERM'));
process.once('SIGINT', () => void shutdown('SIGINT'));
