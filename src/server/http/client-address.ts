import { Server, type IncomingMessage } from "node:http";

// The address per-IP limits are keyed by. Next keeps a client-sent X-Forwarded-For as it is (it only
// fills it in when absent), so the header alone proves nothing: the address is worked out from the
// socket peer and TRUSTED_PROXY_HOPS when the request arrives, and put in a header of our own that a
// client cannot set (any incoming copy is overwritten).
export const CLIENT_ADDRESS_HEADER = "x-borewise-client";

/**
 * The client's address: with no trusted proxy the socket peer; behind N proxies (each appending to
 * X-Forwarded-For) the entry N places left of the peer. Entries further left were written by the client.
 */
export function clientAddressFrom(forwardedFor: string | undefined | null, peer: string | undefined | null, trustedHops: number): string {
  const chain = [...(forwardedFor ?? "").split(",").map((s) => s.trim()).filter(Boolean), peer?.trim() || "unknown"];
  const index = Math.max(0, chain.length - 1 - trustedHops);
  return (chain[index] ?? "unknown").slice(0, 64);
}

let installed = false;
/** Stamps every incoming request of this process with its client address (called once, from instrumentation). */
export function installClientAddress(trustedHops: number): void {
  if (installed) return;
  installed = true;
  const emit = Server.prototype.emit as (this: Server, event: string | symbol, ...args: unknown[]) => boolean;
  Server.prototype.emit = function (this: Server, event: string | symbol, ...args: unknown[]) {
    if (event === "request") {
      const req = args[0] as IncomingMessage;
      const forwarded = req.headers["x-forwarded-for"];
      req.headers[CLIENT_ADDRESS_HEADER] = clientAddressFrom(Array.isArray(forwarded) ? forwarded.join(",") : forwarded, req.socket?.remoteAddress, trustedHops);
    }
    return emit.call(this, event, ...args);
  } as typeof Server.prototype.emit;
}
