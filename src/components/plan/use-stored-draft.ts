"use client";
import { useMemo, useState, useSyncExternalStore } from "react";

const noSubscription = () => () => {};

/**
 * Wizard state that survives a reload in this tab (sessionStorage); the step itself is in the URL.
 * `accept` decides whether what was stored still belongs to this wizard (e.g. the same job).
 */
export function useStoredDraft<T>(key: string, initial: T, accept: (saved: unknown) => saved is T) {
  const stored = useSyncExternalStore(noSubscription, () => sessionStorage.getItem(key), () => null);
  const restored = useMemo(() => {
    try {
      const saved: unknown = JSON.parse(stored ?? "null");
      return saved !== null && accept(saved) ? saved : null;
    } catch {
      return null;
    }
  }, [stored, accept]);
  const [edited, setEdited] = useState<T | null>(null);
  const draft = edited ?? restored ?? initial;
  const update = (change: (d: T) => T) =>
    setEdited((prev) => {
      const next = change(prev ?? restored ?? initial);
      sessionStorage.setItem(key, JSON.stringify(next));
      return next;
    });
  return { draft, update, clear: () => sessionStorage.removeItem(key) };
}
