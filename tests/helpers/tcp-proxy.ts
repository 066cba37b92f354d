import net from 'node:net';

/**
 * A TCP proxy in front of PostgreSQL that a test can take down and bring back, the way a stopped database looks from
 * the app: every open connection is cut and new ones are refused (the port stops listening) until `up()`.
 */
export class TcpProxy {
  private readonly connections = new Set<net.Socket>();
  private server: net.Server | undefined;
  port = 0;

  private constructor(private readonly target: { host: string; port: number }) {}

  static async start(target: { host: string; port: number }): Promise<TcpProxy> {
    const proxy = new TcpProxy(target);
    await proxy.up();
    return proxy;
  }

  /** Rewrites a database URL to go through the proxy. */
  urlFor(databaseUrl: string): string {
    const url = new URL(databaseUrl);
    url.hostname = '127.0.0.1';
    url.port = String(this.port);
    return url.toString();
  }

  get isUp(): boolean {
    return this.server !== undefined;
  }

  async up(): Promise<void> {
    if (this.server) return;
    const server = net.createServer((client) => {
      const upstream = net.connect(this.target.port, this.target.host);
      for (const s of [client, upstream]) {
        this.connections.add(s);
        s.on('close', () => this.connections.delete(s));
        s.on('error', () => undefined);
      }
      client.pipe(upstream);
      upstream.pipe(client);
      client.on('close', () => upstream.destroy());
      upstream.on('close', () => client.destroy());
    });
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(this.port, '127.0.0.1', () => resolve());
    });
    this.port = (server.address() as net.AddressInfo).port;
    this.server = server;
  }

  /** Cuts every connection and stops listening: connecting now fails at once with ECONNREFUSED. */
  async down(): Promise<void> {
    const server = this.server;
    if (!server) return;
    this.server = undefined;
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    for (const s of this.connections) s.destroy();
    await closed;
  }

  async close(): Promise<void> {
    await this.down();
  }
}
