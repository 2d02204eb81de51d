import { beforeEach, describe, expect, it, vi } from "vitest";
import { databaseDownSince, databaseSeemsDown, noteDatabaseAnswered, noteDatabaseError, PROBE_INTERVAL_MS, resetDatabaseAvailability } from "./availability";

const refused = Object.assign(new Error("connect ECONNREFUSED"), { code: "ECONNREFUSED" });

beforeEach(() => resetDatabaseAvailability());

describe("database availability", () => {
  it("records down since the first connection error and clears it on an answer", () => {
    noteDatabaseError(refused, 1000);
    noteDatabaseError(refused, 2000);
    expect(databaseDownSince()).toBe(1000);
    noteDatabaseAnswered(3000);
    expect(databaseDownSince()).toBeNull();
  });

  it("ignores errors that are not about reaching the database", () => {
    noteDatabaseError(Object.assign(new Error("dup"), { code: "ER_DUP_ENTRY" }), 1000);
    expect(databaseDownSince()).toBeNull();
  });

  it("probes a down database at most once a second and recovers when a probe answers", async () => {
    const probe = vi.fn().mockRejectedValue(refused);
    expect(await databaseSeemsDown(probe, 10_000)).toBe(true);
    expect(await databaseSeemsDown(probe, 10_000 + PROBE_INTERVAL_MS - 1)).toBe(true);
    expect(probe).toHaveBeenCalledTimes(1);
    probe.mockResolvedValue([[{ 1: 1 }]]);
    expect(await databaseSeemsDown(probe, 20_000)).toBe(false);
    expect(probe).toHaveBeenCalledTimes(2);
  });

  it("shares one probe between concurrent page requests", async () => {
    let release!: () => void;
    const probe = vi.fn(() => new Promise<void>((resolve) => (release = resolve)));
    const both = Promise.all([databaseSeemsDown(probe, 50_000), databaseSeemsDown(probe, 50_000)]);
    release();
    expect(await both).toEqual([false, false]);
    expect(probe).toHaveBeenCalledTimes(1);
  });

  it("counts a probe that fails for another reason (a hang past its bound) as down", async () => {
    expect(await databaseSeemsDown(() => Promise.reject(new Error("timeout")), 70_000)).toBe(true);
  });
});
