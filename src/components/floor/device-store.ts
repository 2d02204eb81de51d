// What the floor device keeps for itself in IndexedDB (through Dexie), so nothing typed is lost on
// reload or when the tablet sleeps: the card each cylinder is on with its drafts, the server's answers,
// and the queue of entries to send, in the order they were made. Each entry carries the id made on the
// device, so sending it twice is answered once by the server.
//
// Components read a copy held in memory (useSyncExternalStore needs a synchronous snapshot); every
// change goes to memory first, re-renders, and is written to IndexedDB at once. The copy is read from
// IndexedDB once per page load (openDeviceStore), which also moves what older builds kept in
// localStorage, one time.
import Dexie, { type EntityTable } from "dexie";
import { useSyncExternalStore } from "react";

export type QueuedEntry = { id: string; url: "/api/floor/runs" | "/api/floor/inspections"; body: unknown; madeAt: string; error?: string };
type StoredEntry = QueuedEntry & { seq?: number };
type KeptValue = { key: string; value: unknown };
type KeptAnswer = { id: string; answer: unknown };

class FloorDeviceDb extends Dexie {
  queue!: EntityTable<StoredEntry, "seq">;
  cylinders!: EntityTable<KeptValue, "key">;
  answers!: EntityTable<KeptAnswer, "id">;
  constructor() {
    super("borewise-floor");
    this.version(1).stores({ queue: "++seq, &id", cylinders: "key", answers: "id" });
  }
}

/** Where older builds kept the same things (localStorage); moved once, then removed. */
export const LEGACY_KEYS = { queue: "borewise.floor.queue.v1", answers: "borewise.floor.answers.v1", cylinderPrefix: "borewise.floor.cylinder.v1." };
export const cylinderKey = (planId: string, cylinder: number) => `${LEGACY_KEYS.cylinderPrefix}${planId}.${cylinder}`;

const EMPTY_QUEUE: QueuedEntry[] = [];
const EMPTY_ANSWERS: Record<string, unknown> = {};

let db: FloorDeviceDb | null = null;
let queue: StoredEntry[] = EMPTY_QUEUE;
let answers: Record<string, unknown> = EMPTY_ANSWERS;
const cylinders = new Map<string, unknown>();
let loaded = false;
let opening: Promise<void> | null = null;
const listeners = new Set<() => void>();
const changed = () => listeners.forEach((l) => l());

// Writes run one after another in the order they were made. A failed one (quota, private mode) leaves
// the memory copy in charge for this page's life.
let writing: Promise<unknown> = Promise.resolve();
const persist = (write: (d: FloorDeviceDb) => Promise<unknown>) => {
  const d = db;
  if (d) writing = writing.then(() => write(d)).catch(() => undefined);
};
/** Resolves once every change made so far is in IndexedDB. */
export const whenWritten = (): Promise<void> => writing.then(() => undefined);

function parseLegacy(raw: string | null): unknown {
  if (!raw) return null;
  try {
    return JSON.parse(raw) as unknown;
  } catch {
    return null;
  }
}

async function moveLegacy(d: FloorDeviceDb): Promise<void> {
  let storage: Storage;
  try {
    storage = window.localStorage;
  } catch {
    return;
  }
  const keys = Array.from({ length: storage.length }, (_, i) => storage.key(i)).filter((k): k is string => k !== null);
  const cylinderKeys = keys.filter((k) => k.startsWith(LEGACY_KEYS.cylinderPrefix));
  const oldQueue = parseLegacy(storage.getItem(LEGACY_KEYS.queue));
  const oldAnswers = parseLegacy(storage.getItem(LEGACY_KEYS.answers));
  if (!cylinderKeys.length && oldQueue === null && oldAnswers === null) return;
  await d.transaction("rw", d.queue, d.cylinders, d.answers, async () => {
    if (Array.isArray(oldQueue)) {
      for (const entry of oldQueue as QueuedEntry[]) {
        if (entry?.id && !(await d.queue.where("id").equals(entry.id).count())) await d.queue.add({ ...entry });
      }
    }
    if (oldAnswers && typeof oldAnswers === "object") {
      for (const [id, answer] of Object.entries(oldAnswers)) if (!(await d.answers.get(id))) await d.answers.put({ id, answer });
    }
    for (const key of cylinderKeys) {
      const value = parseLegacy(storage.getItem(key));
      if (value !== null && !(await d.cylinders.get(key))) await d.cylinders.put({ key, value });
    }
  });
  // Only once the move has committed: a failure above leaves localStorage as it was, to try again.
  for (const key of [LEGACY_KEYS.queue, LEGACY_KEYS.answers, ...cylinderKeys]) storage.removeItem(key);
}

async function load(): Promise<void> {
  try {
    const d = new FloorDeviceDb();
    await d.open();
    db = d;
    await moveLegacy(d);
    const [storedQueue, storedCylinders, storedAnswers] = await Promise.all([d.queue.orderBy("seq").toArray(), d.cylinders.toArray(), d.answers.toArray()]);
    // Anything changed before the read finished (a tap in the first milliseconds) is newer: it wins, and is written.
    const early = queue;
    const earlyIds = new Set(early.map((e) => e.id));
    queue = [...storedQueue.filter((e) => !earlyIds.has(e.id)), ...early];
    await d.queue.bulkAdd(early.map((e) => ({ ...e })));
    await d.answers.bulkPut(Object.entries(answers).map(([id, answer]) => ({ id, answer })));
    answers = { ...Object.fromEntries(storedAnswers.map((a) => [a.id, a.answer])), ...answers };
    await d.cylinders.bulkPut([...cylinders].map(([key, value]) => ({ key, value })));
    for (const { key, value } of storedCylinders) if (!cylinders.has(key)) cylinders.set(key, value);
  } catch {
    db = null; // No IndexedDB here: the memory copy is all there is.
  }
  loaded = true;
  changed();
}

/** Reads the device's store once per page load; every hook below starts it. */
export function openDeviceStore(): Promise<void> {
  opening ??= load();
  return opening;
}

function subscribe(onChange: () => void): () => void {
  listeners.add(onChange);
  void openDeviceStore();
  return () => listeners.delete(onChange);
}

/** The stored value under `key` (null on the server and before anything was stored). */
export function useStored<T>(key: string): T | null {
  return useSyncExternalStore(subscribe, () => (cylinders.get(key) as T | undefined) ?? null, () => null);
}
export const readCylinder = <T>(key: string): T | null => (cylinders.get(key) as T | undefined) ?? null;
export function writeCylinder(key: string, value: unknown): void {
  cylinders.set(key, value);
  changed();
  persist((d) => d.cylinders.put({ key, value }));
}

export const readQueue = (): QueuedEntry[] => queue;
export const useQueue = (): QueuedEntry[] => useSyncExternalStore(subscribe, readQueue, () => EMPTY_QUEUE);
export function enqueue(entry: Omit<QueuedEntry, "madeAt">): void {
  if (queue.some((e) => e.id === entry.id)) return;
  const made: QueuedEntry = { ...entry, madeAt: new Date().toISOString() };
  queue = [...queue, made];
  changed();
  persist((d) => d.queue.add({ ...made }));
}
/** Takes an entry out of the queue (sent, or dropped by the person). */
export function removeEntry(id: string): void {
  queue = queue.filter((e) => e.id !== id);
  changed();
  persist((d) => d.queue.where("id").equals(id).delete());
}
/** Keeps a refused entry where it is, with the server's reason, so the order holds. */
export function markRefused(id: string, error: string): void {
  queue = queue.map((e) => (e.id === id ? { ...e, error } : e));
  changed();
  persist((d) => d.queue.where("id").equals(id).modify({ error }));
}

export const useAnswers = (): Record<string, unknown> => useSyncExternalStore(subscribe, () => answers, () => EMPTY_ANSWERS);
export function saveAnswer(id: string, answer: unknown): void {
  answers = { ...answers, [id]: answer };
  changed();
  persist((d) => d.answers.put({ id, answer }));
}

function subscribeOnline(onChange: () => void): () => void {
  window.addEventListener("online", onChange);
  window.addEventListener("offline", onChange);
  return () => {
    window.removeEventListener("online", onChange);
    window.removeEventListener("offline", onChange);
  };
}
export const useOnline = (): boolean => useSyncExternalStore(subscribeOnline, () => navigator.onLine, () => true);

/** False while the server renders and until the device's own store is read. */
export const useHydrated = (): boolean => useSyncExternalStore(subscribe, () => loaded, () => false);
