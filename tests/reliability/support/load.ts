// A bounded client load: each submission is sent until it is acknowledged (200) or its deadline
// passes, with the same body (and so the same device id) every time, as the floor device's queue does.
import { appFetch } from "./app-server";

export type Attempt = { status: number | "timeout" | "network"; ms: number; retryAfter: string | null; leaksInternals: boolean; body: string };

// A stack frame or a source path in an answer tells a prober how the server is built.
const INTERNALS = /\n\s+at |node_modules|\/src\/(server|app|lib)\//;
export type Submission = { id: string; body: Record<string, unknown>; acknowledged: unknown | null; attempts: Attempt[] };

export const REQUEST_BOUND_MS = 10_000;

export async function attempt(url: string, pathname: string, init: { method?: string; body?: unknown; cookie: string }): Promise<Attempt> {
  const started = Date.now();
  try {
    const response = await appFetch({ url }, pathname, { ...init, timeoutMs: REQUEST_BOUND_MS });
    const body = await response.text();
    return { status: response.status, ms: Date.now() - started, retryAfter: response.headers.get("retry-after"), leaksInternals: INTERNALS.test(body), body: body.slice(0, 300) };
  } catch (error) {
    const name = (error as Error).name;
    return { status: name === "TimeoutError" || name === "AbortError" ? "timeout" : "network", ms: Date.now() - started, retryAfter: null, leaksInternals: false, body: String(error) };
  }
}

/** Sends every submission (at most `concurrency` at a time) until acknowledged or `deadline`. */
export async function submitAll(options: { urls: string[]; submissions: Submission[]; cookie: string; concurrency: number; deadline: number; onAck?: () => void }): Promise<void> {
  let next = 0;
  const worker = async (w: number) => {
    for (;;) {
      const submission = options.submissions[next++];
      if (!submission) return;
      for (let k = 0; submission.acknowledged === null && Date.now() < options.deadline; k++) {
        const url = options.urls[(w + k) % options.urls.length]!;
        const result = await attempt(url, "/api/floor/runs", { method: "POST", body: submission.body, cookie: options.cookie });
        submission.attempts.push(result);
        if (result.status === 200) {
          submission.acknowledged = JSON.parse(result.body);
          options.onAck?.();
        } else if (typeof result.status === "number" && result.status < 500) {
          break; // refused: the device keeps it at the head of its queue for a person to look at
        } else {
          await new Promise((r) => setTimeout(r, 200));
        }
      }
    }
  };
  await Promise.all(Array.from({ length: options.concurrency }, (_, w) => worker(w)));
}

/** What makes a failed API answer unclean: no answer within the bound, a 5xx other than 503, a 503 without Retry-After, internals in the body. */
export function uncleanFailures(attempts: Attempt[]): Attempt[] {
  return attempts.filter((a) => {
    if (a.status === "timeout" || a.status === "network") return true;
    if (a.leaksInternals) return true;
    if (a.status === 200) return false;
    if (a.status >= 500 && a.status !== 503) return true;
    return a.status === 503 && a.retryAfter === null;
  });
}

/**
 * A page that cannot load its data renders the error page: Next.js answers a page render that threw
 * with 500 (a page cannot choose 503), so a page's failure is clean when it is that page, in time,
 * without internals.
 */
export function uncleanPageFailures(attempts: Attempt[]): Attempt[] {
  return attempts.filter((a) => a.status === "timeout" || a.status === "network" || a.leaksInternals || (a.status !== 200 && a.status !== 500 && a.status !== 503));
}
