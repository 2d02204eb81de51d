// What the floor device keeps for itself (localStorage, so nothing typed is lost on reload or when the
// tablet sleeps): the card each cylinder is on, its drafts, and the queue of entries to send, in the
// order they were made. Each entry carries the id made on the device, so sending it twice is answered
// once by the server. Components read it with useStored(), which re-renders on every change.
import { useMemo, useSyncExternalStore } from "react";

export type QueuedEntry = { id: string; url: "/api/floor/runs" | "/api/floor/inspections"; body: unknown; madeAt: string; error?: string };

const QUEUE_KEY = "borewise.floor.queue.v1";
const ANSWERS_KEY = "borewise.floor.answers.v1";
const CHANGE_EVENT = "borewise-floor-store";
export const cylinderKey = (planId: string, cylinder: number) => `borewise.floor.cylinder.v1.${planId}.${cylinder}`;

function readRaw(key: string): string | null {
  try {
    return window.localStorage.getItem(key);
  } catch {
    return null;
  }
}

function parse<T>(raw: string | null, fallback: T): T {
  if (!raw) return fallback;
  try {
    return JSON.parse(raw) as T;
  } catch {
    return fallback;
  }
}

function write(key: string, value: unknown): void {
  window.localStorage.setItem(key, JSON.stringify(value));
  window.dispatchEvent(new Event(CHANGE_EVENT));
}

function subscribe(onChange: () => void): () => void {
  window.addEventListener(CHANGE_EVENT, onChange);
  window.addEventListener("storage", onChange);
  return () => {
    window.removeEventListener(CHANGE_EVENT, onChange);
    window.removeEventListener("storage", onChange);
  };
}

/** The stored value under `key` (null on the server and before anything was stored). */
export function useStored<T>(key: string): T | null {
  const raw = useSyncExternalStore(subscribe, () => readRaw(key), () => null);
  return useMemo(() => parse<T | null>(raw, null), [raw]);
}

export const readQueue = (): QueuedEntry[] => parse<QueuedEntry[]>(readRaw(QUEUE_KEY), []);
export const writeQueue = (queue: QueuedEntry[]) => write(QUEUE_KEY, queue);
export const useQueue = (): QueuedEntry[] => useStored<QueuedEntry[]>(QUEUE_KEY) ?? [];
export function enqueue(entry: Omit<QueuedEntry, "madeAt">): void {
  const queue = readQueue();
  if (queue.some((e) => e.id === entry.id)) return;
  writeQueue([...queue, { ...entry, madeAt: new Date().toISOString() }]);
}

export const useAnswers = (): Record<string, unknown> => useStored<Record<string, unknown>>(ANSWERS_KEY) ?? {};
export function saveAnswer(id: string, answer: unknown): void {
  write(ANSWERS_KEY, { ...parse<Record<string, unknown>>(readRaw(ANSWERS_KEY), {}), [id]: answer });
}

export const readCylinder = <T>(key: string): T | null => parse<T | null>(readRaw(key), null);
export const writeCylinder = (key: string, value: unknown) => write(key, value);

function subscribeOnline(onChange: () => void): () => void {
  window.addEventListener("online", onChange);
  window.addEventListener("offline", onChange);
  return () => {
    window.removeEventListener("online", onChange);
    window.removeEventListener("offline", onChange);
  };
}
export const useOnline = (): boolean => useSyncExternalStore(subscribeOnline, () => navigator.onLine, () => true);

const noSubscribe = () => () => {};
/** False while the server renders and hydrates, true once the device's own storage is read. */
export const useHydrated = (): boolean => useSyncExternalStore(noSubscribe, () => true, () => false);
