// Runs once when a Next.js server starts. The mail outbox retry loop lives in the Node.js runtime
// only (it needs the MariaDB pool and SMTP).
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const [{ env }, { installClientAddress }] = await Promise.all([import("./env"), import("./server/http/client-address")]);
  installClientAddress(env.TRUSTED_PROXY_HOPS);
  const [{ startOutboxWorker }, { startPurgeSchedule }] = await Promise.all([import("./server/mail/worker"), import("./server/maintenance/purge")]);
  startOutboxWorker();
  startPurgeSchedule();
  // Only where Next.js leaves the signals to us (`npm start`); else its own handler exits first.
  if (env.NEXT_MANUAL_SIG_HANDLE) (await import("./server/shutdown")).installShutdown();
}
