// autocannon 9.0.0 ships no types: only what the responses benchmark uses.
declare module 'autocannon' {
  namespace autocannon {
    interface Histogram {
      average: number;
      p50: number;
      p99: number;
      max: number;
    }
    interface Result {
      requests: Histogram & { total: number };
      /** Seconds. */
      duration: number;
      latency: Histogram;
      errors: number;
      timeouts: number;
      non2xx: number;
      '2xx': number;
    }
    interface Request {
      method?: string;
      path?: string;
      headers?: Record<string, string>;
      body?: string;
    }
    interface RequestSpec extends Request {
      setupRequest?(request: Request, context: Record<string, unknown>): Request;
      onResponse?(status: number, body: string, context: Record<string, unknown>): void;
    }
    interface Client {
      setRequests(requests: RequestSpec[]): void;
    }
    interface Options {
      url: string;
      connections?: number;
      duration?: number;
      requests?: RequestSpec[];
      setupClient?(client: Client): void;
    }
    interface Instance {
      on(event: 'done', listener: (result: Result) => void): this;
      on(event: 'error', listener: (error: Error) => void): this;
    }
  }
  function autocannon(options: autocannon.Options): autocannon.Instance;
  export default autocannon;
}
