import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { db } from "@/server/db";
import { jobs } from "@/server/db/schema";
import { createCustomer, updateCustomer } from "@/server/customers/mutations";
import { getCustomer } from "@/server/customers/queries";
import { getRecordView } from "@/server/records/queries";
import { defaultRecordUnit } from "@/server/records/source";
import { viewerUnits } from "@/server/units";
import { createShopWithMembers } from "../support/fixtures";
import { createPassedJob } from "./records-fixtures";

describe("the customer's unit on the record", () => {
  it("defaults the record to the customer's unit; none chosen falls back to the last sent, then the viewer's; the sender may still choose", async () => {
    const shop = await createShopWithMembers("record-units");
    const job = await createPassedJob(shop);
    const actor = shop.actors.machinist;
    const { id } = await createCustomer({ actor, input: { name: "Demo engine builder", unitSystem: "inch" } });
    await db.update(jobs).set({ customerId: id }).where(eq(jobs.id, job.job.jobId));
    expect((await getCustomer({ actor, customerId: id })).unitSystem).toBe("inch");
    expect(await defaultRecordUnit(actor, job.job.jobId, "metric")).toBe("inch");

    await updateCustomer({ actor, customerId: id, input: { name: "Demo engine builder", unitSystem: "" } });
    expect((await getCustomer({ actor, customerId: id })).unitSystem).toBeNull();
    expect(await defaultRecordUnit(actor, job.job.jobId, "inch")).toBe("inch");
    expect(await defaultRecordUnit(actor, job.job.jobId, null)).toBe((await viewerUnits(actor)).system);

    await updateCustomer({ actor, customerId: id, input: { name: "Demo engine builder", unitSystem: "metric" } });
    expect(await defaultRecordUnit(actor, job.job.jobId, "inch")).toBe("metric");
    const chosen = await getRecordView({ actor, jobId: job.job.jobId, unitSystem: "inch" });
    expect(chosen.unitSystem).toBe("inch");
    expect(chosen.cylinders[0]!.levels[0]!.a.text).toMatch(/in$/);
  });

  it("refuses a unit that is not mm or inch", async () => {
    const shop = await createShopWithMembers("record-units-bad");
    await expect(createCustomer({ actor: shop.actors.machinist, input: { name: "Demo", unitSystem: "furlong" } })).rejects.toThrow();
  });
});
