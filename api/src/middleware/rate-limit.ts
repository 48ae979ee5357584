import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import type { Knex } from 'knex';
import { RateLimitedError } from '../errors';

const FIFTEEN_MINUTES = 15 * 60;

/** Sign-in counters kept in PostgreSQL, so every API process shares them. */
export interface SignInLimits {
  /** Counts one sign-in request for this e-mail and client address; throws RateLimitedError past either ceiling. */
  consume(email: string, address: string): Promise<void>;
}

export function createSignInLimits(knex: Knex, perEmail: number, perAddress: number): SignInLimits {
  const common = { storeClient: knex, storeType: 'knex', tableName: 'rate_limits', tableCreated: true, duration: FIFTEEN_MINUTES };
  const byEmail = new RateLimiterPostgres({ ...common, keyPrefix: 'signin-email', points: perEmail });
  // A whole class signs in at once from one school address: this ceiling is classroom-sized.
  const byAddress = new RateLimiterPostgres({ ...common, keyPrefix: 'signin-address', points: perAddress });

  async function take(limiter: RateLimiterPostgres, key: string, message: string): Promise<void> {
    try {
      await limiter.consume(key);
    } catch (rejection) {
      if (rejection instanceof RateLimiterRes) {
        const seconds = Math.max(1, Math.ceil(rejection.msBeforeNext / 1000));
        throw new RateLimitedError(`${message} Try again in ${Math.ceil(seconds / 60)} minute${seconds > 60 ? 's' : ''}.`, seconds);
      }
      throw rejection;
    }
  }

  return {
    async consume(email, address) {
      await take(byAddress, address, 'Too many sign-in requests from this network.');
      await take(byEmail, email, 'Too many sign-in links were requested for this e-mail address.');
    },
  };
}
