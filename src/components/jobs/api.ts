// Client helpers for the jobs route handlers: SWR's fetcher throws on non-OK (STYLE.md pattern 8),
// and uploads (multipart: not a server action) return the server's typed error so forms can show it.
// Every other change goes through a server action (DEVELOPERS.md, "One mutation path for forms").
export type ApiError = { error: string; message: string; fieldErrors?: Record<string, string[]> };
export type ApiResult<T> = { ok: true; data: T } | { ok: false; error: ApiError };

export class FetchError extends Error {
  constructor(readonly status: number, readonly body: ApiError) {
    super(body.message);
  }
}

export async function fetchJson<T>(url: string): Promise<T> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  const body = await res.json().catch(() => ({ error: "internal", message: "The server sent something unexpected." }));
  if (!res.ok) throw new FetchError(res.status, body as ApiError);
  return body as T;
}

async function settle<T>(res: Response): Promise<ApiResult<T>> {
  const body = await res.json().catch(() => null);
  if (res.ok) return { ok: true, data: body as T };
  return { ok: false, error: (body as ApiError | null) ?? { error: "internal", message: "Something went wrong. Nothing was changed." } };
}

/** Posts a multipart form; 422 answers (e.g. a CSV with bad rows) come back as data, not errors. */
export async function sendForm<T>(url: string, form: FormData): Promise<ApiResult<T>> {
  try {
    const res = await fetch(url, { method: "POST", body: form });
    if (res.status === 422) return { ok: true, data: (await res.json()) as T };
    return settle<T>(res);
  } catch {
    return { ok: false, error: { error: "offline", message: "No connection to the server. Nothing was saved; try again." } };
  }
}

/** A zod error list as field errors keyed by dotted path, the same shape the server sends. */
export function zodFieldErrors(issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }>): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of issues) (out[issue.path.map(String).join(".") || "_form"] ??= []).push(issue.message);
  return out;
}
