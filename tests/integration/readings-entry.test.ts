import { describe, expect, it } from "vitest";
import { createShopWithMembers } from "../support/fixtures";
import { createReadingSet, deleteReadingSet } from "@/server/readings/mutations";
import { assignCylinder, setJobStatus } from "@/server/jobs/mutations";
import { getJobDetail } from "@/server/jobs/detail";
import { expectAppError, levels, makeJob } from "./jobs-support";

describe("reading sets", () => {
  it("records a set, computes geometry in the summary and moves the job to measured", async () => {
    const s = await createShopWithMembers("readings");
    const { jobId, cylinderIds } = await makeJob(s.actors.machinist, { cylinderCount: 2 });
    // Worked example, derived [D, DESIGN.md §5.2]: bottom 12 µm larger than top → taper 12; A/B 3 apart → out-of-round 3.
    await createReadingSet({ actor: s.actors.machinist, jobId, input: { cylinderId: cylinderIds[0], kind: "as_received", gauge: "dial bore gauge", temperatureC: 20, levels: levels(92_030, 12, 3) } });
    let detail = await getJobDetail({ actor: s.actors.machinist, jobId });
    expect(detail.job.status).toBe("received");
    const c1 = detail.summary.cylinders[0]!;
    expect(c1).toMatchObject({ taperUm: 12, outOfRoundUm: 3, spreadUm: 15, minUm: 92_030, maxUm: 92_045, taperOk: false, outOfRoundOk: true, tightEnd: "top" });
    expect(detail.summary.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(["NO_READINGS", "WORN_BEFORE_MACHINING"]));
    expect(detail.summary.warnings.find((w) => w.code === "WORN_BEFORE_MACHINING")?.message).toMatch(/worst taper 12.0 µm \(cylinder 1\), worst out-of-round 3.0 µm/);
    await createReadingSet({ actor: s.actors.machinist, jobId, input: { cylinderId: cylinderIds[1], kind: "as_received", levels: levels(92_010) } });
    detail = await getJobDetail({ actor: s.actors.machinist, jobId });
    expect(detail.job.status).toBe("measured");
    expect(detail.readingSets[0]?.takenByName).toBe("Test machinist");
    // Worst reading 92.045 mm; with the default 50 µm honing allowance, 0.25 mm is the smallest step that cleans up [D].
    expect(detail.summary.oversize).toMatchObject({ ok: true, stepUm: 250, finishedBoreUm: 92_250, worstReadingUm: 92_045 });
    expect(detail.summary.worst).toEqual({ cylinder: 1, readingUm: 92_045 });
  });

  it("writes a retried submission once (client key)", async () => {
    const s = await createShopWithMembers("readings-idem");
    const { jobId, cylinderIds } = await makeJob(s.actors.machinist, { cylinderCount: 1 });
    const input = { cylinderId: cylinderIds[0], kind: "checkpoint", clientKey: "retry-key-123456", levels: levels(92_100) };
    const [a, b] = await Promise.all([createReadingSet({ actor: s.actors.machinist, jobId, input }), createReadingSet({ actor: s.actors.machinist, jobId, input })]);
    expect(a.id).toBe(b.id);
    expect([a.created, b.created].sort()).toEqual([false, true]);
    expect((await getJobDetail({ actor: s.actors.machinist, jobId })).readingSets).toHaveLength(1);
  });

  it("refuses readings far from the standard bore (a unit slip) with a field error", async () => {
    const s = await createShopWithMembers("readings-range");
    const { jobId, cylinderIds } = await makeJob(s.actors.machinist, { cylinderCount: 1 });
    const bad = levels(92_000);
    bad[1]!.bUm = 36_220; // 3.622 typed as mm when it was inches
    const err = await expectAppError(createReadingSet({ actor: s.actors.machinist, jobId, input: { cylinderId: cylinderIds[0], kind: "as_received", levels: bad } }), "bad_request");
    expect(Object.keys(err.fieldErrors ?? {})).toEqual(["levels.1.bUm"]);
    expect((await getJobDetail({ actor: s.actors.machinist, jobId })).readingSets).toHaveLength(0);
  });

  it("lets an apprentice enter checkpoint and final sets only on work assigned to them", async () => {
    const s = await createShopWithMembers("readings-floor");
    const { jobId, cylinderIds } = await makeJob(s.actors.machinist, { cylinderCount: 2 });
    const apprentice = s.actors.apprentice;
    const input = (cylinderId: string, kind: string) => ({ cylinderId, kind, levels: levels(92_250) });
    await expectAppError(createReadingSet({ actor: apprentice, jobId, input: input(cylinderIds[0]!, "final") }), "forbidden");
    await assignCylinder({ actor: s.actors.machinist, jobId, cylinderId: cylinderIds[0]!, userId: apprentice.userId });
    await createReadingSet({ actor: apprentice, jobId, input: input(cylinderIds[0]!, "checkpoint") });
    await createReadingSet({ actor: apprentice, jobId, input: input(cylinderIds[0]!, "final") });
    await expectAppError(createReadingSet({ actor: apprentice, jobId, input: input(cylinderIds[0]!, "as_received") }), "forbidden");
    await expectAppError(createReadingSet({ actor: apprentice, jobId, input: input(cylinderIds[1]!, "final") }), "forbidden");
    const detail = await getJobDetail({ actor: apprentice, jobId });
    expect(detail.permissions.readingKindsByCylinder[cylinderIds[0]!]).toEqual(["checkpoint", "final"]);
    expect(detail.permissions.readingKindsByCylinder[cylinderIds[1]!]).toEqual([]);
    await expectAppError(deleteReadingSet({ actor: apprentice, jobId, readingSetId: detail.readingSets[0]!.id }), "forbidden");
  });

  it("moves an in-work job to inspected when every bore has a final set", async () => {
    const s = await createShopWithMembers("readings-final");
    const { jobId, cylinderIds } = await makeJob(s.actors.machinist, { cylinderCount: 2 });
    await setJobStatus({ actor: s.actors.machinist, jobId, input: { status: "in_work" } });
    for (const id of cylinderIds) await createReadingSet({ actor: s.actors.machinist, jobId, input: { cylinderId: id, kind: "final", levels: levels(92_250, 2, 1) } });
    const detail = await getJobDetail({ actor: s.actors.machinist, jobId });
    expect(detail.job.status).toBe("inspected");
    expect(detail.summary.warnings.filter((w) => w.tone === "stop")).toEqual([]);
    // A final set out of round by 8 µm (> 5 µm) is a stop, named by cylinder [C, DESIGN.md §5.2].
    await createReadingSet({ actor: s.actors.machinist, jobId, input: { cylinderId: cylinderIds[1], kind: "final", levels: levels(92_250, 2, 8) } });
    const after = await getJobDetail({ actor: s.actors.machinist, jobId });
    expect(after.summary.warnings.filter((w) => w.tone === "stop").map((w) => [w.code, w.cylinder])).toEqual([["OUT_OF_ROUND", 2]]);
  });

  it("answers another shop's job and cylinder as not found", async () => {
    const s = await createShopWithMembers("readings-tenant");
    const other = await createShopWithMembers("readings-tenant-o");
    const { jobId, cylinderIds } = await makeJob(s.actors.machinist, { cylinderCount: 1 });
    const mine = await makeJob(other.actors.machinist, { cylinderCount: 1 });
    await expectAppError(createReadingSet({ actor: other.actors.owner, jobId, input: { cylinderId: cylinderIds[0], kind: "as_received", levels: levels(92_000) } }), "not_found");
    await expectAppError(createReadingSet({ actor: other.actors.owner, jobId: mine.jobId, input: { cylinderId: cylinderIds[0], kind: "as_received", levels: levels(92_000) } }), "not_found");
  });
});
