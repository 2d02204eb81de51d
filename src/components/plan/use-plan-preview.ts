"use client";
import { useEffect, useMemo, useState } from "react";
import useSWR from "swr";
import { planRequestSchema } from "@/shared/plans/schema";
import type { PlanPreview } from "@/server/plans/preview";

export type FieldErrors = Record<string, string[]>;
export class PreviewError extends Error {
  constructor(message: string, readonly status: number, readonly fieldErrors: FieldErrors) {
    super(message);
  }
}

export const PREVIEW_URL = "/api/plans/preview";
/**
 * Wait after the last change before asking: long enough to skip the keystrokes of one value, short
 * enough that debounce plus one round trip stays near 150 ms (measured in tests/e2e/live-preview.spec.ts).
 */
export const PREVIEW_DEBOUNCE_MS = 100;

async function fetchPreview([url, body]: [string, string]): Promise<PlanPreview> {
  const response = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body });
  const payload = await response.json().catch(() => ({}));
  if (!response.ok) throw new PreviewError(payload.message ?? "The preview failed.", response.status, payload.fieldErrors ?? {});
  return payload as PlanPreview;
}

function zodFieldErrors(issues: Array<{ path: PropertyKey[]; message: string }>): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of issues) (out[issue.path.map(String).join(".") || "_form"] ??= []).push(issue.message);
  return out;
}

function useDebounced<T>(value: T, ms: number): T {
  const [debounced, setDebounced] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setDebounced(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return debounced;
}

/**
 * The wizard's live preview: the draft is checked with the same schema as the server, and only a
 * valid draft is sent, debounced, to POST /api/plans/preview (SWR keeps the last answer on screen).
 */
export function usePlanPreview(draft: unknown) {
  const checked = useMemo(() => planRequestSchema.safeParse(draft), [draft]);
  const body = checked.success ? JSON.stringify(checked.data) : null;
  const debounced = useDebounced(body, PREVIEW_DEBOUNCE_MS);
  const swr = useSWR<PlanPreview, PreviewError>(debounced ? [PREVIEW_URL, debounced] : null, fetchPreview, { keepPreviousData: true, revalidateOnFocus: false });
  const clientErrors = checked.success ? {} : zodFieldErrors(checked.error.issues);
  const serverErrors = swr.error?.fieldErrors ?? {};
  return {
    preview: swr.data ?? null,
    fieldErrors: { ...serverErrors, ...clientErrors },
    error: checked.success ? (swr.error ?? null) : null,
    loading: swr.isLoading || swr.isValidating || body !== debounced,
    valid: checked.success,
    request: checked.success ? checked.data : null,
  };
}
