// A TCP proxy between the app and PostgreSQL, so a test can take "the database" away and bring it back
// without touching the shared test cluster that other test files are using.
import net from 'node:net';

export interface TcpProxy {
  /** The port the proxy listens on (127.0.0.1). */
  readonly port: number;
  /** Closes the listener and cuts every open connection: to the app, PostgreSQL is gone. */
  stop(): Promise<void>;
  /** Listens again on the same port: PostgreSQL is back. */
  start(): Promise<void>;
}

/**
 * Starts a proxy on a free port of 127.0.0.1 that forwards every connection to `target`.
 *
 * @param target - where PostgreSQL really listens
 */
export async function startTcpProxy(target: { host: string; port: number }): Promise<TcpProxy> {
  const open = new Set<net.Socket>();
  const track = (socket: net.Socket) => {
    open.add(socket);
    socket.on('close', () => open.delete(socket));
  };
  const server = net.createServer((client) => {
    const upstream = net.connect(target.port, target.host);
    track(client);
    track(upstream);
    // Either side failing or closing ends both, as a lost network would.
    for (const [a, b] of [
      [client, upstream],
      [upstream, client],
    ] as const) {
      a.on('error', () => b.destroy());
      a.on('close', () => b.destroy());
      a.pipe(b);
    }
  });
  const listen = (port: number) =>
    new Promise<number>((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, '127.0.0.1', () => {
        server.off('error', reject);
        resolve((server.address() as net.AddressInfo).port);
      });
    });
  const port = await listen(0);
  return {
    port,
    async stop() {
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      for (const socket of open) socket.destroy();
      await closed;
    },
    async start() {
      await listen(port);
    },
  };
}
