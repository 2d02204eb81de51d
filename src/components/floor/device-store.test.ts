// @vitest-environment jsdom
// The floor device's store on IndexedDB (fake-indexeddb stands in for the browser's): order kept, nothing
// lost across a reload (a fresh module over the same database), the one-time move from localStorage,
// and every queued entry sent once however often the send is started.
import Dexie from "dexie";
import { IDBFactory, IDBKeyRange } from "fake-indexeddb";
import fc from "fast-check";
import { beforeEach, describe, expect, it, vi } from "vitest";
import type * as StoreModule from "./device-store";
import type * as SenderModule from "./send-queue";

type Store = typeof StoreModule;
type Sender = typeof SenderModule;

/** A page load: the modules start from nothing, the database is what the last page left. */
async function reload(): Promise<{ store: Store; sender: Sender }> {
  vi.resetModules();
  const store = await import("./device-store");
  const sender = await import("./send-queue");
  await store.openDeviceStore();
  return { store, sender };
}

const ANA = { userId: "user-ana", shopId: "shop-1" };
const BEN = { userId: "user-ben", shopId: "shop-1" };
const entry = (id: string, owner = ANA) => ({ id, url: "/api/floor/runs" as const, body: { id, strokesDone: 12 }, owner });
const ok = (body: unknown) => new Response(JSON.stringify(body), { status: 200, headers: { "content-type": "application/json" } });

/** An empty browser database (jsdom has none; Dexie keeps what it found when first loaded, so it is told too). */
function freshIndexedDb() {
  const factory = new IDBFactory();
  for (const scope of [globalThis, window] as Array<{ indexedDB?: IDBFactory; IDBKeyRange?: typeof IDBKeyRange }>) Object.assign(scope, { indexedDB: factory, IDBKeyRange });
  Object.assign(Dexie.dependencies, { indexedDB: factory, IDBKeyRange });
}

beforeEach(() => {
  freshIndexedDb();
  window.localStorage.clear();
});

describe("device store", () => {
  it("keeps the queue in order, the cylinder's state and the answers across a reload", async () => {
    const { store } = await reload();
    for (const id of ["a", "b", "c"]) store.enqueue(entry(id));
    store.enqueue(entry("b")); // the same entry twice is queued once
    store.writeCylinder(store.cylinderKey("plan-1", 2, ANA.userId), { index: 7, readings: { m1: "93.98" } });
    store.saveAnswer("z", { verdict: "pass" });
    await store.whenWritten();

    const after = (await reload()).store;
    expect(after.readQueue().map((e) => e.id)).toEqual(["a", "b", "c"]);
    expect(after.readCylinder(after.cylinderKey("plan-1", 2, ANA.userId))).toEqual({ index: 7, readings: { m1: "93.98" } });
    expect((await reload()).store.readQueue()).toHaveLength(3);
  });

  it("moves what an older build kept in localStorage once, in order, and removes it there", async () => {
    const legacyQueue = [entry("old-1"), entry("old-2")].map((e) => ({ id: e.id, url: e.url, body: e.body, madeAt: "2026-01-01T00:00:00.000Z" }));
    window.localStorage.setItem("borewise.floor.queue.v1", JSON.stringify(legacyQueue));
    window.localStorage.setItem("borewise.floor.answers.v1", JSON.stringify({ "old-0": { ok: true } }));
    window.localStorage.setItem("borewise.floor.cylinder.v1.plan-9.1", JSON.stringify({ index: 3 }));
    const { store } = await reload();
    store.enqueue(entry("new-1"));
    await store.whenWritten();
    expect(store.readQueue().map((e) => e.id)).toEqual(["old-1", "old-2", "new-1"]);
    expect(store.readCylinder("borewise.floor.cylinder.v1.plan-9.1")).toEqual({ index: 3 });
    expect(Object.keys(window.localStorage).filter((k) => k !== "borewise.floor.waiting")).toEqual([]);
    // Kept before entries had owners: the first person to open the floor takes them, and the drafts.
    expect(store.readQueueOf(ANA).map((e) => e.id)).toEqual(["new-1"]);
    store.adoptUnowned(ANA);
    expect(store.readQueueOf(ANA).map((e) => e.id)).toEqual(["old-1", "old-2", "new-1"]);
    expect(store.readCylinder(store.cylinderKey("plan-9", 1, ANA.userId))).toEqual({ index: 3 });
    await store.whenWritten();

    window.localStorage.setItem("borewise.floor.queue.v1", JSON.stringify(legacyQueue)); // left by a second old tab
    const again = (await reload()).store;
    expect(again.readQueue().map((e) => e.id)).toEqual(["old-1", "old-2", "new-1"]);
    expect(again.readQueueOf(ANA).map((e) => e.id)).toEqual(["old-1", "old-2", "new-1"]);
    expect(again.readCylinder("borewise.floor.cylinder.v1.plan-9.1")).toBeNull();
    expect(again.useAnswers).toBeTypeOf("function");
  });

  it("sends each entry once and in order, however many sends are started at the same time", async () => {
    const { store, sender } = await reload();
    for (const id of ["a", "b", "c", "d"]) store.enqueue(entry(id));
    const posted: string[] = [];
    const send = vi.fn(async (_url: RequestInfo | URL, init?: RequestInit) => {
      const { id } = JSON.parse(String(init?.body)) as { id: string };
      posted.push(id);
      await new Promise((r) => setTimeout(r, 1));
      return ok({ id, written: true });
    }) as unknown as typeof fetch;
    await Promise.all([sender.sendQueued(ANA, send), sender.sendQueued(ANA, send), sender.sendQueued(ANA, send)]);
    await sender.sendQueued(ANA, send);
    expect(posted).toEqual(["a", "b", "c", "d"]);
    expect(store.readQueue()).toEqual([]);
    await store.whenWritten();
    expect((await reload()).store.readQueue()).toEqual([]);
  });

  it("keeps everything while the network is gone or the server fails, and holds a refused entry at the head", async () => {
    const { store, sender } = await reload();
    for (const id of ["a", "b"]) store.enqueue(entry(id));
    await sender.sendQueued(ANA, (async () => { throw new TypeError("Failed to fetch"); }) as typeof fetch);
    await sender.sendQueued(ANA, (async () => new Response("{}", { status: 503 })) as typeof fetch);
    expect(store.readQueue().map((e) => e.id)).toEqual(["a", "b"]);
    await sender.sendQueued(ANA, (async () => new Response(JSON.stringify({ message: "Not assigned to you." }), { status: 403 })) as typeof fetch);
    expect(store.readQueue().map((e) => [e.id, e.error])).toEqual([["a", "Not assigned to you."], ["b", undefined]]);
    await store.whenWritten();
    expect((await reload()).store.readQueue()[0]?.error).toBe("Not assigned to you.");
  });

  it("after any run of queueing and sending, a reload finds exactly the entries not yet sent, in order", async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(fc.oneof(fc.constant("send" as const), fc.integer({ min: 0, max: 5 })), { maxLength: 12 }), async (steps) => {
        freshIndexedDb();
        const { store, sender } = await reload();
        const model: string[] = [];
        let made = 0;
        for (const step of steps) {
          if (step === "send") {
            const first = model.shift();
            let sent = false;
            await sender.sendQueued(ANA, (async (_u: RequestInfo | URL, init?: RequestInit) => {
              if (sent) throw new TypeError("offline again"); // one entry goes, then the network drops
              sent = true;
              expect(JSON.parse(String(init?.body)).id).toBe(first);
              return ok({});
            }) as typeof fetch);
          } else {
            const id = `e${made++}-${step}`;
            store.enqueue(entry(id));
            model.push(id);
          }
        }
        await store.whenWritten();
        expect((await reload()).store.readQueue().map((e) => e.id)).toEqual(model);
      }),
      { numRuns: 40 },
    );
  });

  it("sends only the signed-in person's entries; another person's wait, unseen, until their owner signs in again", async () => {
    const { store, sender } = await reload();
    store.enqueue(entry("ana-1"));
    store.enqueue(entry("ben-1", BEN));
    store.enqueue(entry("ana-2"));
    store.writeCylinder(store.cylinderKey("plan-1", 1, ANA.userId), { index: 4 });
    const posted: string[] = [];
    const send = (async (_u: RequestInfo | URL, init?: RequestInit) => {
      posted.push(JSON.parse(String(init?.body)).id);
      return ok({});
    }) as typeof fetch;
    expect(store.readCylinder(store.cylinderKey("plan-1", 1, BEN.userId))).toBeNull();
    await sender.sendQueued(BEN, send);
    expect(posted).toEqual(["ben-1"]);
    expect(store.readQueueOf(BEN)).toEqual([]);
    expect(store.readQueueOf(ANA).map((e) => e.id)).toEqual(["ana-1", "ana-2"]);
    // The same person in another shop of theirs does not send them either.
    await sender.sendQueued({ ...ANA, shopId: "shop-2" }, send);
    expect(posted).toEqual(["ben-1"]);
    await store.whenWritten();
    const after = await reload();
    await after.sender.sendQueued(ANA, send);
    expect(posted).toEqual(["ben-1", "ana-1", "ana-2"]);
    // Every page of the device (the earlier "page" too, told through the channel) settles on the same count.
    await vi.waitFor(() => expect(JSON.parse(window.localStorage.getItem("borewise.floor.waiting") ?? "{}")).toEqual({}));
  });

  it("keeps a chosen file's bytes and sends them as a form, before the entry queued after it", async () => {
    const { store } = await reload();
    const bytes = new TextEncoder().encode("Ra 0.4").buffer as ArrayBuffer;
    store.enqueue({ id: "up-1", kind: "upload", url: "/api/floor/surface-reports?planId=p&cylinder=1", body: { bytes, type: "text/csv", name: "report.csv" }, owner: ANA });
    store.enqueue(entry("final-1"));
    await store.whenWritten();
    const again = await reload();
    const kept = again.store.readQueueOf(ANA)[0]!;
    expect(kept.kind).toBe("upload");
    const seen: Array<[string, string]> = [];
    await again.sender.sendQueued(ANA, (async (url: RequestInfo | URL, init?: RequestInit) => {
      const body = init?.body;
      if (body instanceof FormData) expect(await (body.get("file") as Blob).text()).toBe("Ra 0.4");
      seen.push([String(url), body instanceof FormData ? String(body.get("clientId")) : JSON.parse(String(body)).id]);
      return ok({});
    }) as typeof fetch);
    expect(seen).toEqual([["/api/floor/surface-reports?planId=p&cylinder=1", "up-1"], ["/api/floor/runs", "final-1"]]);
  });

  it("two tabs never send one entry twice: the send lock and a fresh read; both show the same count after", async () => {
    // Web Locks as the browser has them (jsdom has none): one holder per name; ifAvailable gets null when held.
    const held = new Set<string>();
    const locks = {
      request: async (name: string, _o: { ifAvailable: true }, run: (lock: unknown) => Promise<void>) => {
        if (held.has(name)) return run(null);
        held.add(name);
        try { await run({ name }); } finally { held.delete(name); }
      },
    };
    Object.defineProperty(window.navigator, "locks", { value: locks, configurable: true });
    try {
      const tabA = await reload();
      for (const id of ["a", "b", "c"]) tabA.store.enqueue(entry(id));
      await tabA.store.whenWritten();
      const tabB = await reload();
      expect(tabB.store.readQueueOf(ANA)).toHaveLength(3);
      const posted: string[] = [];
      const send = (async (_u: RequestInfo | URL, init?: RequestInit) => {
        posted.push(JSON.parse(String(init?.body)).id);
        await new Promise((r) => setTimeout(r, 2));
        return ok({});
      }) as typeof fetch;
      await Promise.all([tabA.sender.sendQueued(ANA, send), tabB.sender.sendQueued(ANA, send)]);
      // Tab B still holds its old copy until told; a later send re-reads under the lock and finds nothing.
      await tabB.sender.sendQueued(ANA, send);
      await tabA.sender.sendQueued(ANA, send);
      expect(posted.sort()).toEqual(["a", "b", "c"]);
      await vi.waitFor(() => {
        expect(tabA.store.readQueueOf(ANA)).toEqual([]);
        expect(tabB.store.readQueueOf(ANA)).toEqual([]);
      });
      // An entry made in one tab shows in the other's count.
      tabB.store.enqueue(entry("d"));
      await vi.waitFor(() => expect(tabA.store.readQueueOf(ANA).map((e) => e.id)).toEqual(["d"]));
    } finally {
      Reflect.deleteProperty(window.navigator, "locks");
    }
  });
});
