import type { Server } from 'node:http';
import type { AddressInfo, Server as NetServer } from 'node:net';

/** A started fake: its base URL and how to stop it. */
export interface RunningFake {
  url: string;
  close(): Promise<void>;
}

/** Listens on host:port and resolves with the bound port; a listen error rejects with a readable message. */
export function listenOn(server: NetServer, port: number, host: string, label: string): Promise<number> {
  return new Promise((resolve, reject) => {
    const onError = (error: NodeJS.ErrnoException): void => {
      server.off('listening', onListening);
      const reason = error.code === 'EADDRINUSE' ? 'the address is already in use' : error.message;
      reject(new Error(`${label} could not listen on ${host}:${port}: ${reason}`, { cause: error }));
    };
    const onListening = (): void => {
      server.off('error', onError);
      resolve((server.address() as AddressInfo).port);
    };
    server.once('error', onError);
    server.once('listening', onListening);
    server.listen(port, host);
  });
}

/** Stops an HTTP server and drops its open connections, so no keep-alive socket keeps the process alive. */
export function closeHttpServer(server: Server): Promise<void> {
  if (!server.listening) return Promise.resolve();
  return new Promise((resolve, reject) => {
    server.close((error) => (error ? reject(error) : resolve()));
    // A fake shuts down at once: in-flight requests are not worth waiting for.
    server.closeAllConnections();
  });
}

/** Formats a loopback URL, bracketing IPv6 literals. */
export function httpUrl(host: string, port: number, scheme = 'http'): string {
  const shown = host.includes(':') ? `[${host}]` : host;
  return `${scheme}://${shown}:${port}`;
}
