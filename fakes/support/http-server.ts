import { createServer, type RequestListener } from 'node:http';
import type { Server as NetServer, Socket } from 'node:net';

export interface ListeningServer {
  /** The bound port: callers may ask for 0 and learn the real one here. */
  port: number;
  close(): Promise<void>;
}

/**
 * Starts an HTTP server whose close() does not wait for idle keep-alive sockets:
 * clients such as the Stripe SDK keep connections open, which would otherwise hold
 * close() (and a test run) until the keep-alive timeout passes.
 */
export async function listenHttp(
  handler: RequestListener,
  port: number,
  host: string,
): Promise<ListeningServer> {
  const server = createServer(handler);
  const sockets = new Set<Socket>();
  server.on('connection', (socket) => {
    sockets.add(socket);
    socket.once('close', () => sockets.delete(socket));
  });
  const bound = await bind(server, port, host);
  return {
    port: bound,
    close: () =>
      new Promise<void>((resolve, reject) => {
        server.close((error) => (error ? reject(error) : resolve()));
        // Every socket, not just idle ones (closeAllConnections misses upgraded sockets).
        for (const socket of sockets) socket.destroy();
      }),
  };
}

/** Listens and resolves with the port actually bound, or rejects (e.g. EADDRINUSE). */
export function bind(server: NetServer, port: number, host: string): Promise<number> {
  return new Promise<number>((resolve, reject) => {
    const onError = (error: Error): void => reject(error);
    server.once('error', onError);
    server.listen(port, host, () => {
      server.off('error', onError);
      const address = server.address();
      if (address === null || typeof address === 'string') {
        reject(new Error(`Expected a TCP address, got ${String(address)}`));
        return;
      }
      resolve(address.port);
    });
  });
}
