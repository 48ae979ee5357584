import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { RateLimitedError } from '../../errors';

/** Answers per student per minute; counted in each API process's memory (a ceiling per process, not shared). */
export interface SubmitRateLimit {
  take(studentId: string): Promise<void>;
}

export function createSubmitRateLimit(perMinute: number): SubmitRateLimit {
  const limiter = new RateLimiterMemory({ keyPrefix: 'submit', points: perMinute, duration: 60 });
  return {
    async take(studentId) {
      try {
        await limiter.consume(studentId);
      } catch (rejection) {
        if (!(rejection instanceof RateLimiterRes)) throw rejection;
        const seconds = Math.max(1, Math.ceil(rejection.msBeforeNext / 1000));
        throw new RateLimitedError(
          `Too many answers in one minute (at most ${perMinute}); this one was not saved. Send it again in ${seconds} s.`,
          seconds,
        );
      }
    },
  };
}
