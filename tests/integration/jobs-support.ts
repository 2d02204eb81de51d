// Helpers shared by the jobs-domain integration tests (jobs-*, readings-*, pistons-*, csv-import-*, uploads-*).
import type { Actor } from "@/shared/auth/policy";
import { createJob } from "@/server/jobs/mutations";
import { getJobDetail } from "@/server/jobs/detail";

/** An invented six-cylinder job input (demo-style numbers, not from any real engine). */
export function jobInput(overrides: Record<string, unknown> = {}) {
  return {
    customerName: "Test customer",
    engineDescription: "inline six, 3.4 L, grey-iron block",
    boreMaterial: "grey_iron",
    cylinderCount: 6,
    standardBoreUm: 92_000,
    boreLengthUm: 140_000,
    bottomClearanceUm: 12_000,
    torquePlate: true,
    dueDate: "2030-05-01",
    notes: "integration test",
    ...overrides,
  };
}

/** Levels top/middle/bottom around a diameter, with a given taper (bottom larger) and out-of-round. */
export function levels(baseUm: number, taperUm = 0, roundUm = 0) {
  return [
    { name: "top", aUm: baseUm, bUm: baseUm + roundUm },
    { name: "middle", aUm: baseUm + taperUm / 2, bUm: baseUm + taperUm / 2 + roundUm },
    { name: "bottom", aUm: baseUm + taperUm, bUm: baseUm + taperUm + roundUm },
  ];
}

export async function makeJob(actor: Actor, overrides: Record<string, unknown> = {}) {
  const { id } = await createJob({ actor, input: jobInput(overrides) });
  const detail = await getJobDetail({ actor, jobId: id });
  return { jobId: id, detail, cylinderIds: detail.cylinders.map((c) => c.id) };
}

export async function expectAppError(promise: Promise<unknown>, code: string): Promise<{ message: string; fieldErrors?: Record<string, string[]> }> {
  try {
    await promise;
  } catch (error) {
    const e = error as { code?: string; name?: string; issues?: unknown; message: string; fieldErrors?: Record<string, string[]> };
    const actual = e.name === "ZodError" ? "bad_request" : e.code;
    if (actual !== code) throw new Error(`expected ${code}, got ${actual}: ${e.message}`);
    return { message: e.message, fieldErrors: e.fieldErrors };
  }
  throw new Error(`expected ${code}, but it succeeded`);
}

/** A multipart request to a route handler from our own origin, carrying the test session cookie. */
export function formRequest(path: string, cookieHeader: string, fields: Record<string, string | File>, init: { origin?: string | null; contentLength?: number } = {}): Request {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  const headers = new Headers({ host: "127.0.0.1:3000", cookie: cookieHeader });
  if (init.origin !== null) headers.set("origin", init.origin ?? "http://127.0.0.1:3000");
  if (init.contentLength !== undefined) headers.set("content-length", String(init.contentLength));
  return new Request(new URL(path, "http://127.0.0.1:3000"), { method: "POST", headers, body: form });
}

export const routeContext = <P>(params: P) => ({ params: Promise.resolve(params) });
