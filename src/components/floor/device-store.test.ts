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

const entry = (id: string) => ({ id, url: "/api/floor/runs" as const, body: { id, strokesDone: 12 } });
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
    store.writeCylinder(store.cylinderKey("plan-1", 2), { index: 7, readings: { m1: "93.98" } });
    store.saveAnswer("z", { verdict: "pass" });
    await store.whenWritten();

    const after = (await reload()).store;
    expect(after.readQueue().map((e) => e.id)).toEqual(["a", "b", "c"]);
    expect(after.readCylinder(after.cylinderKey("plan-1", 2))).toEqual({ index: 7, readings: { m1: "93.98" } });
    expect((await reload()).store.readQueue()).toHaveLength(3);
  });

  it("moves what an older build kept in localStorage once, in order, and removes it there", async () => {
    const legacyQueue = [entry("old-1"), entry("old-2")].map((e) => ({ ...e, madeAt: "2026-01-01T00:00:00.000Z" }));
    window.localStorage.setItem("borewise.floor.queue.v1", JSON.stringify(legacyQueue));
    window.localStorage.setItem("borewise.floor.answers.v1", JSON.stringify({ "old-0": { ok: true } }));
    window.localStorage.setItem("borewise.floor.cylinder.v1.plan-9.1", JSON.stringify({ index: 3 }));
    const { store } = await reload();
    store.enqueue(entry("new-1"));
    await store.whenWritten();
    expect(store.readQueue().map((e) => e.id)).toEqual(["old-1", "old-2", "new-1"]);
    expect(store.readCylinder("borewise.floor.cylinder.v1.plan-9.1")).toEqual({ index: 3 });
    expect(window.localStorage.length).toBe(0);

    window.localStorage.setItem("borewise.floor.queue.v1", JSON.stringify(legacyQueue)); // left by a second old tab
    const again = (await reload()).store;
    expect(again.readQueue().map((e) => e.id)).toEqual(["old-1", "old-2", "new-1"]);
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
    await Promise.all([sender.sendQueued(send), sender.sendQueued(send), sender.sendQueued(send)]);
    await sender.sendQueued(send);
    expect(posted).toEqual(["a", "b", "c", "d"]);
    expect(store.readQueue()).toEqual([]);
    await store.whenWritten();
    expect((await reload()).store.readQueue()).toEqual([]);
  });

  it("keeps everything while the network is gone or the server fails, and holds a refused entry at the head", async () => {
    const { store, sender } = await reload();
    for (const id of ["a", "b"]) store.enqueue(entry(id));
    await sender.sendQueued((async () => { throw new TypeError("Failed to fetch"); }) as typeof fetch);
    await sender.sendQueued((async () => new Response("{}", { status: 503 })) as typeof fetch);
    expect(store.readQueue().map((e) => e.id)).toEqual(["a", "b"]);
    await sender.sendQueued((async () => new Response(JSON.stringify({ message: "Not assigned to you." }), { status: 403 })) as typeof fetch);
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
            await sender.sendQueued((async (_u: RequestInfo | URL, init?: RequestInit) => {
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
});
