import net from 'node:net';

/**
 * A loopback TCP proxy in front of PostgreSQL that a test can cut and restore, to play a database outage
 * without stopping the shared cluster.
 */
export class TcpProxy {
  private server: net.Server | null = null;
  private sockets = new Set<net.Socket>();
  port = 0;

  constructor(
    private readonly targetHost: string,
    private readonly targetPort: number,
  ) {}

  async open(port = this.port): Promise<number> {
    this.server = net.createServer((client) => {
      const upstream = net.connect(this.targetPort, this.targetHost);
      this.sockets.add(client).add(upstream);
      const drop = () => {
        client.destroy();
        upstream.destroy();
        this.sockets.delete(client);
        this.sockets.delete(upstream);
      };
      client.pipe(upstream).pipe(client);
      client.on('error', drop).on('close', drop);
      upstream.on('error', drop).on('close', drop);
    });
    await new Promise<void>((resolve) => this.server!.listen(port, '127.0.0.1', resolve));
    this.port = (this.server!.address() as net.AddressInfo).port;
    return this.port;
  }

  /** Refuses new connections and drops the open ones. */
  async cut(): Promise<void> {
    for (const s of this.sockets) s.destroy();
    this.sockets.clear();
    await new Promise<void>((resolve) => (this.server ? this.server.close(() => resolve()) : resolve()));
    this.server = null;
  }
}
