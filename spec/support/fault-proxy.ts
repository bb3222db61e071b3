import net, { type AddressInfo, type Socket } from 'node:net';

/**
 * A loopback TCP proxy in front of a server process for chaos runs: it can lose answers (the
 * request reaches the server, whose answer is cut off, as when a connection resets after the
 * commit), follow the server to a new port after a restart, and tell when a push is on its way
 * (to kill the server mid-push).
 */
export class FaultProxy {
  /** Share of requests whose answer is lost, 0–1. */
  dropResponses = 0;
  droppedResponses = 0;
  private readonly sockets = new Set<Socket>();
  private readonly pushWaiters: (() => void)[] = [];
  private server!: net.Server;

  private constructor(
    private targetPort: number,
    private readonly random: () => number,
  ) {}

  static async start(targetPort: number, random: () => number): Promise<FaultProxy> {
    const proxy = new FaultProxy(targetPort, random);
    proxy.server = net.createServer((client) => proxy.connect(client));
    await new Promise<void>((resolve) => proxy.server.listen(0, '127.0.0.1', resolve));
    return proxy;
  }

  get port(): number {
    return (this.server.address() as AddressInfo).port;
  }

  get baseUrl(): string {
    return `http://127.0.0.1:${this.port}`;
  }

  /** The server moved (restarted on another port). */
  retarget(port: number): void {
    this.targetPort = port;
  }

  /** Resolves when the next push request passes through. */
  nextPush(): Promise<void> {
    return new Promise((resolve) => this.pushWaiters.push(resolve));
  }

  async close(): Promise<void> {
    for (const socket of this.sockets) socket.destroy();
    await new Promise<void>((resolve) => this.server.close(() => resolve()));
  }

  private connect(client: Socket): void {
    const upstream = net.connect(this.targetPort, '127.0.0.1');
    // Requests on a kept-alive connection go one at a time: decide afresh as each one starts.
    let dropAnswer = false;
    for (const socket of [client, upstream]) {
      this.sockets.add(socket);
      socket.on('close', () => this.sockets.delete(socket));
      socket.on('error', () => undefined);
    }
    const cut = () => {
      client.destroy();
      upstream.destroy();
    };
    client.on('close', cut);
    upstream.on('close', cut);
    client.on('data', (chunk: Buffer) => {
      const start = chunk.subarray(0, 20).toString('latin1');
      if (/^(GET|POST|PUT|DELETE|PATCH) \//.test(start)) dropAnswer = this.random() < this.dropResponses;
      if (start.startsWith('POST /api/sync/push')) this.pushWaiters.splice(0).forEach((w) => w());
      upstream.write(chunk);
    });
    upstream.on('data', (chunk: Buffer) => {
      if (dropAnswer) {
        this.droppedResponses++;
        cut();
        return;
      }
      client.write(chunk);
    });
  }
}
