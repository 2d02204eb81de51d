import { describe, expect, it } from "vitest";
import { createShopWithMembers } from "../support/fixtures";
import { createPiston, deletePiston, updatePiston } from "@/server/pistons/mutations";
import { createReadingSet } from "@/server/readings/mutations";
import { getJobDetail } from "@/server/jobs/detail";
import { expectAppError, levels, makeJob } from "./jobs-support";

const piston = (label: string, diameterUm: number, extra: Record<string, unknown> = {}) => ({
  label, diameterUm, sizingHeightUm: 12_700, type: "forged", clearanceMinUm: 90, clearanceMaxUm: 115, ...extra,
});

describe("piston records", () => {
  it("records pistons loose and per cylinder, edits and deletes them", async () => {
    const s = await createShopWithMembers("pistons");
    const { jobId, cylinderIds } = await makeJob(s.actors.machinist, { cylinderCount: 2 });
    const a = await createPiston({ actor: s.actors.machinist, jobId, input: piston("1", 93_920, { cylinderId: cylinderIds[0] }) });
    await createPiston({ actor: s.actors.machinist, jobId, input: piston("2", 93_925) });
    await updatePiston({ actor: s.actors.machinist, jobId, pistonId: a.id, input: piston("1", 93_918, { cylinderId: cylinderIds[0] }) });
    let detail = await getJobDetail({ actor: s.actors.machinist, jobId });
    expect(detail.pistons.map((p) => [p.label, p.diameterUm, p.cylinderId])).toEqual([["1", 93_918, cylinderIds[0]], ["2", 93_925, null]]);
    await deletePiston({ actor: s.actors.machinist, jobId, pistonId: a.id });
    detail = await getJobDetail({ actor: s.actors.machinist, jobId });
    expect(detail.pistons).toHaveLength(1);
  });

  it("proposes the pairing with every clearance in the band", async () => {
    const s = await createShopWithMembers("pistons-match");
    const { jobId, cylinderIds } = await makeJob(s.actors.machinist, { cylinderCount: 2, standardBoreUm: 94_000 });
    // Bores 94.020 and 94.030 mm; pistons 93.925 and 93.918 mm; band 0.090–0.115 mm.
    await createReadingSet({ actor: s.actors.machinist, jobId, input: { cylinderId: cylinderIds[0], kind: "final", levels: levels(94_020) } });
    await createReadingSet({ actor: s.actors.machinist, jobId, input: { cylinderId: cylinderIds[1], kind: "final", levels: levels(94_030) } });
    const p1 = await createPiston({ actor: s.actors.machinist, jobId, input: piston("A", 93_925) });
    const p2 = await createPiston({ actor: s.actors.machinist, jobId, input: piston("B", 93_918) });
    const { summary } = await getJobDetail({ actor: s.actors.machinist, jobId });
    expect(summary.pairing?.result.ok).toBe(true);
    if (!summary.pairing?.result.ok) return;
    const pairs = Object.fromEntries(summary.pairing.result.pairs.map((p) => [p.boreId, p.pistonId]));
    // 94.020−93.918 = 102 and 94.030−93.925 = 105 (spread 3) beats 95 and 112 (spread 17) [D].
    expect(pairs).toEqual({ [cylinderIds[0]!]: p2.id, [cylinderIds[1]!]: p1.id });
    expect(summary.pairing.result.spreadUm).toBeCloseTo(3, 6);
  });

  it("refuses an inverted band, absurd sizes, other shops and apprentices", async () => {
    const s = await createShopWithMembers("pistons-bad");
    const other = await createShopWithMembers("pistons-bad-o");
    const { jobId } = await makeJob(s.actors.machinist, { cylinderCount: 1 });
    const err = await createPiston({ actor: s.actors.machinist, jobId, input: piston("1", 93_920, { clearanceMinUm: 120, clearanceMaxUm: 80 }) }).catch((e: unknown) => e);
    expect((err as { issues: Array<{ path: string[] }> }).issues[0]?.path).toEqual(["clearanceMaxUm"]);
    await expect(createPiston({ actor: s.actors.machinist, jobId, input: piston("1", 9_392_000) })).rejects.toMatchObject({ name: "ZodError" });
    await expectAppError(createPiston({ actor: s.actors.apprentice, jobId, input: piston("1", 93_920) }), "forbidden");
    await expectAppError(createPiston({ actor: other.actors.owner, jobId, input: piston("1", 93_920) }), "not_found");
    const otherJob = await makeJob(other.actors.owner, { cylinderCount: 1 });
    await expectAppError(createPiston({ actor: s.actors.machinist, jobId, input: piston("1", 93_920, { cylinderId: otherJob.cylinderIds[0] }) }), "not_found");
  });
});
