// A loopback TCP proxy that a test can cut and restore, to see the app lose its database and get it
// back without touching the real MariaDB other tests are using.
import net from "node:net";

export type TcpProxy = { port: number; cut: () => Promise<void>; restore: () => Promise<void>; close: () => Promise<void> };

export async function startTcpProxy(targetPort: number, targetHost = "127.0.0.1"): Promise<TcpProxy> {
  const sockets = new Set<net.Socket>();
  let server: net.Server | null = null;
  let port = 0;

  const listen = () =>
    new Promise<void>((resolve) => {
      server = net.createServer((client) => {
        const upstream = net.connect(targetPort, targetHost);
        for (const s of [client, upstream]) {
          sockets.add(s);
          s.on("close", () => sockets.delete(s));
          s.on("error", () => s.destroy());
        }
        client.pipe(upstream).pipe(client);
      });
      server.listen(port, "127.0.0.1", () => {
        port = (server!.address() as net.AddressInfo).port;
        resolve();
      });
    });

  const cut = () =>
    new Promise<void>((resolve) => {
      for (const s of sockets) s.destroy();
      if (!server) return resolve();
      server.close(() => resolve());
      server = null;
    });

  await listen();
  return { get port() { return port; }, cut, restore: listen, close: cut };
}
