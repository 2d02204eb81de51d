// What the floor device keeps for itself in IndexedDB (through Dexie), so nothing typed is lost on
// reload or when the tablet sleeps: the card each cylinder is on with its drafts, the server's answers,
// and the queue of entries to send, in the order they were made. Each entry carries the id made on the
// device, so sending it twice is answered once by the server, and the person who made it: a tablet is
// shared, and only its owner's session may send it (or see a draft).
//
// Components read a copy held in memory (useSyncExternalStore needs a synchronous snapshot); every
// change goes to memory first, re-renders, and is written to IndexedDB at once. The copy is read from
// IndexedDB once per page load (openDeviceStore), which also moves what older builds kept in
// localStorage, one time, and again whenever another tab of this device says it changed something
// (a BroadcastChannel), so every tab shows the same queue.
import Dexie, { type EntityTable } from "dexie";
import { useSyncExternalStore } from "react";
import { noteWaiting } from "./waiting-note";

/** Who made an entry: the signed-in person, in the shop they worked for. */
export type EntryOwner = { userId: string; shopId: string };
type JsonEntry = { kind?: "json"; url: "/api/floor/runs" | "/api/floor/inspections"; body: unknown };
/**
 * A file chosen at the machine (a profilometer report), kept until the network takes it. Its bytes are
 * stored as an ArrayBuffer, which every IndexedDB clones alike (a Blob does not survive everywhere).
 */
export type UploadEntry = { kind: "upload"; url: `/api/floor/surface-reports?${string}`; body: { bytes: ArrayBuffer; type: string; name: string } };
export type QueuedEntry = (JsonEntry | UploadEntry) & { id: string; madeAt: string; error?: string; owner?: EntryOwner };
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
const CYLINDER_PREFIX = "floor.cylinder.v2.";
/** A cylinder's drafts and card are the person's own: another person on the tablet starts afresh. */
export const cylinderKey = (planId: string, cylinder: number, userId: string) => `${CYLINDER_PREFIX}${userId}.${planId}.${cylinder}`;
const legacyCylinder = (key: string) => (key.startsWith(LEGACY_KEYS.cylinderPrefix) ? key.slice(LEGACY_KEYS.cylinderPrefix.length) : null);

const CHANNEL = "borewise-floor-store";
const EMPTY_QUEUE: QueuedEntry[] = [];
const EMPTY_ANSWERS: Record<string, unknown> = {};

let db: FloorDeviceDb | null = null;
let queue: StoredEntry[] = EMPTY_QUEUE;
let answers: Record<string, unknown> = EMPTY_ANSWERS;
const cylinders = new Map<string, unknown>();
let loaded = false;
let opening: Promise<void> | null = null;
/** Raised by every change made on this page, so a re-read never overwrites a newer change. */
let localChanges = 0;
let channel: BroadcastChannel | null = null;
const listeners = new Set<() => void>();
const changed = () => {
  noteWaiting(countByPerson());
  listeners.forEach((l) => l());
};

// Writes run one after another in the order they were made. A failed one (quota, private mode) leaves
// the memory copy in charge for this page's life.
let writing: Promise<unknown> = Promise.resolve();
const persist = (write: (d: FloorDeviceDb) => Promise<unknown>) => {
  localChanges++;
  const d = db;
  if (d) writing = writing.then(() => write(d)).then(() => channel?.postMessage("changed")).catch(() => undefined);
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

const readAll = (d: FloorDeviceDb) => Promise.all([d.queue.orderBy("seq").toArray(), d.cylinders.toArray(), d.answers.toArray()]);

async function load(): Promise<void> {
  try {
    const d = new FloorDeviceDb();
    await d.open();
    db = d;
    await moveLegacy(d);
    const [storedQueue, storedCylinders, storedAnswers] = await readAll(d);
    // Anything changed before the read finished (a tap in the first milliseconds) is newer: it wins, and is written.
    const early = queue;
    const earlyIds = new Set(early.map((e) => e.id));
    queue = [...storedQueue.filter((e) => !earlyIds.has(e.id)), ...early];
    await d.queue.bulkAdd(early.map((e) => ({ ...e })));
    await d.answers.bulkPut(Object.entries(answers).map(([id, answer]) => ({ id, answer })));
    answers = { ...Object.fromEntries(storedAnswers.map((a) => [a.id, a.answer])), ...answers };
    await d.cylinders.bulkPut([...cylinders].map(([key, value]) => ({ key, value })));
    for (const { key, value } of storedCylinders) if (!cylinders.has(key)) cylinders.set(key, value);
    listenToOtherTabs();
  } catch {
    db = null; // No IndexedDB here: the memory copy is all there is.
  }
  loaded = true;
  changed();
}

function listenToOtherTabs() {
  if (typeof BroadcastChannel === "undefined" || channel) return;
  channel = new BroadcastChannel(CHANNEL);
  channel.onmessage = () => void refreshFromDevice();
}

/**
 * Reads the queue, the answers and the cylinders again from IndexedDB (another tab changed them, or
 * the sender is about to send). A change made on this page while reading wins: the read is dropped
 * and tried again once it is written.
 */
export async function refreshFromDevice(): Promise<void> {
  const d = db;
  if (!d) return;
  for (let attempt = 0; attempt < 5; attempt++) {
    await whenWritten();
    const before = localChanges;
    let stored: Awaited<ReturnType<typeof readAll>>;
    try {
      stored = await readAll(d);
    } catch {
      return;
    }
    if (before !== localChanges) continue;
    const [storedQueue, storedCylinders, storedAnswers] = stored;
    queue = storedQueue;
    answers = Object.fromEntries(storedAnswers.map((a) => [a.id, a.answer]));
    cylinders.clear();
    for (const { key, value } of storedCylinders) cylinders.set(key, value);
    changed();
    return;
  }
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

/**
 * Entries and drafts kept before entries had an owner (older builds) go to the first person who opens
 * the floor on this tablet: they were made here, and the server checks who may log them anyway.
 */
export function adoptUnowned(owner: EntryOwner): void {
  const unowned = queue.filter((e) => !e.owner);
  // "<planId>.<cylinder>" under the old prefix becomes the same cylinder under this person's key.
  const moves = [...cylinders.keys()].flatMap((key) => {
    const rest = legacyCylinder(key);
    const dot = rest?.lastIndexOf(".") ?? -1;
    return rest && dot > 0 ? [{ from: key, to: cylinderKey(rest.slice(0, dot), Number(rest.slice(dot + 1)), owner.userId) }] : [];
  });
  if (!unowned.length && !moves.length) return;
  queue = queue.map((e) => (e.owner ? e : { ...e, owner }));
  const kept = moves.map(({ from, to }) => {
    if (!cylinders.has(to)) cylinders.set(to, cylinders.get(from));
    cylinders.delete(from);
    return { from, to, value: cylinders.get(to) };
  });
  changed();
  persist((d) =>
    d.transaction("rw", d.queue, d.cylinders, async () => {
      for (const e of unowned) await d.queue.where("id").equals(e.id).modify({ owner });
      for (const { from, to, value } of kept) {
        await d.cylinders.put({ key: to, value });
        await d.cylinders.delete(from);
      }
    }),
  );
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

const sameOwner = (a: EntryOwner | undefined, b: EntryOwner) => a?.userId === b.userId && a.shopId === b.shopId;

/** Every entry on the device, whoever made it (the store's own tests and the sign-out count). */
export const readQueue = (): QueuedEntry[] => queue;

// One filtered copy per person, made again only when the queue changes (a snapshot must be stable).
const mineCache = new Map<string, { from: StoredEntry[]; mine: QueuedEntry[]; others: number; otherShop: number }>();
function split(owner: EntryOwner) {
  const key = `${owner.userId}/${owner.shopId}`;
  const hit = mineCache.get(key);
  if (hit?.from === queue) return hit;
  const made = {
    from: queue,
    mine: queue.filter((e) => sameOwner(e.owner, owner)),
    others: queue.filter((e) => e.owner && e.owner.userId !== owner.userId).length,
    otherShop: queue.filter((e) => e.owner?.userId === owner.userId && e.owner.shopId !== owner.shopId).length,
  };
  mineCache.set(key, made);
  return made;
}
/** The entries this person made in this shop, in order: the only ones their session sends. */
export const readQueueOf = (owner: EntryOwner): QueuedEntry[] => split(owner).mine;
export const useQueueOf = (owner: EntryOwner): QueuedEntry[] => useSyncExternalStore(subscribe, () => split(owner).mine, () => EMPTY_QUEUE);
/** How many entries wait for someone else (another person, or this person in another shop); never their content. */
export const useWaitingForOthers = (owner: EntryOwner): { others: number; otherShop: number } => ({
  others: useSyncExternalStore(subscribe, () => split(owner).others, () => 0),
  otherShop: useSyncExternalStore(subscribe, () => split(owner).otherShop, () => 0),
});

function countByPerson(): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const e of queue) if (e.owner) counts[e.owner.userId] = (counts[e.owner.userId] ?? 0) + 1;
  return counts;
}

export function enqueue(entry: Omit<QueuedEntry, "madeAt" | "owner"> & { owner: EntryOwner }): void {
  if (queue.some((e) => e.id === entry.id)) return;
  const made = { ...entry, madeAt: new Date().toISOString() } as QueuedEntry;
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
