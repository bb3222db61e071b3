import net, { type AddressInfo, type Socket } from 'node:net';

/**
 * A loopback TCP proxy in front of a real server, which a spec can cut to make that server
 * unreachable mid-test (PostgreSQL going away) without stopping it for everyone else.
 */
export interface TcpProxy {
  readonly port: number;
  /** Stop accepting and drop every open connection. */
  cut(): Promise<void>;
}

export async function startTcpProxy(targetHost: string, targetPort: number): Promise<TcpProxy> {
  const sockets = new Set<Socket>();
  const track = (socket: Socket) => {
    sockets.add(socket);
    socket.on('close', () => sockets.delete(socket));
    socket.on('error', () => socket.destroy());
  };
  const server = net.createServer((client) => {
    const upstream = net.connect(targetPort, targetHost);
    track(client);
    track(upstream);
    client.pipe(upstream).pipe(client);
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return {
    port: (server.address() as AddressInfo).port,
    cut: () =>
      new Promise((resolve) => {
        for (const socket of sockets) socket.destroy();
        server.close(() => resolve());
      }),
  };
}
