/**
 * The server's clock as this page knows it: every reply carries `serverTime`, and the offset from the
 * local clock at that moment is kept, so an answer's time is on the server's clock even when the
 * device's clock is wrong or the answer is sent much later.
 */
export class ServerClock {
  private offsetMs = 0;

  /** A reply said the server's time was `serverTime` when it arrived at local time `receivedAt`. */
  observe(serverTime: string, receivedAt: number = Date.now()): void {
    const server = Date.parse(serverTime);
    if (!Number.isNaN(server)) this.offsetMs = server - receivedAt;
  }

  /** Server time minus local time, in ms. */
  offset(): number {
    return this.offsetMs;
  }

  /** Now on the server's clock. */
  now(local: number = Date.now()): Date {
    return new Date(local + this.offsetMs);
  }
}

/** One clock for the whole tab: the watch view, answers and viewing reports all update it. */
export const serverClock = new ServerClock();
