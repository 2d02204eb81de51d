import { describe, expect, it } from "vitest";
import { createShopWithMembers } from "../support/fixtures";
import { createJob, setJobArchived, setJobStatus, updateJob } from "@/server/jobs/mutations";
import { getJob, listJobs } from "@/server/jobs/queries";
import { createCustomer, updateCustomer } from "@/server/customers/mutations";
import { listCustomers } from "@/server/customers/queries";
import { expectAppError, jobInput, makeJob } from "./jobs-support";

describe("jobs: create, edit, list, archive", () => {
  it("numbers jobs per shop and makes one cylinder per bore", async () => {
    const a = await createShopWithMembers("jobs-a");
    const b = await createShopWithMembers("jobs-b");
    const first = await createJob({ actor: a.actors.machinist, input: jobInput() });
    const second = await createJob({ actor: a.actors.machinist, input: jobInput({ cylinderCount: 4 }) });
    const other = await createJob({ actor: b.actors.owner, input: jobInput() });
    expect([first.number, second.number, other.number]).toEqual([1, 2, 1]);
    const { detail } = await makeJob(a.actors.lead, { cylinderCount: 8 });
    expect(detail.cylinders.map((c) => c.number)).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    expect(detail.job.number).toBe(3);
    expect(detail.job.customer?.name).toBe("Test customer");
  });

  it("hands out distinct numbers to concurrent creators", async () => {
    const s = await createShopWithMembers("jobs-race");
    const made = await Promise.all(Array.from({ length: 6 }, () => createJob({ actor: s.actors.machinist, input: jobInput({ cylinderCount: 1 }) })));
    expect(new Set(made.map((m) => m.number)).size).toBe(6);
    expect(Math.max(...made.map((m) => m.number))).toBe(6);
  });

  it("refuses bad input with field errors and writes nothing", async () => {
    const s = await createShopWithMembers("jobs-bad");
    const bad = jobInput({ cylinderCount: 17, standardBoreUm: 2_000_000, engineDescription: "" });
    await expect(createJob({ actor: s.actors.machinist, input: bad })).rejects.toMatchObject({ name: "ZodError" });
    const list = await listJobs({ actor: s.actors.machinist, query: { status: "all" } });
    expect(list.total).toBe(0);
  });

  it("edits a job, grows and shrinks its cylinders, and refuses to drop measured ones", async () => {
    const s = await createShopWithMembers("jobs-edit");
    const { jobId } = await makeJob(s.actors.machinist, { cylinderCount: 4 });
    await updateJob({ actor: s.actors.machinist, jobId, input: jobInput({ cylinderCount: 6, engineDescription: "V6 demo block" }) });
    const job = await getJob({ actor: s.actors.machinist, jobId });
    expect(job.cylinderCount).toBe(6);
    expect(job.engineDescription).toBe("V6 demo block");
    await updateJob({ actor: s.actors.machinist, jobId, input: jobInput({ cylinderCount: 2 }) });
    expect((await getJob({ actor: s.actors.machinist, jobId })).cylinderCount).toBe(2);
  });

  it("sets status by hand, archives, and lists with search, filters, sort and pages", async () => {
    const s = await createShopWithMembers("jobs-list");
    const customer = await createCustomer({ actor: s.actors.machinist, input: { name: "Harbour Rowing Club (demo)" } });
    const ids: string[] = [];
    for (let i = 0; i < 7; i++) {
      const made = await createJob({ actor: s.actors.machinist, input: jobInput({ customerName: undefined, customerId: i < 3 ? customer.id : null, dueDate: `2030-01-0${i + 1}`, engineDescription: i === 6 ? "flat twin, air cooled" : "inline four" }) });
      ids.push(made.id);
    }
    await setJobStatus({ actor: s.actors.machinist, jobId: ids[0]!, input: { status: "in_work" } });
    await setJobStatus({ actor: s.actors.machinist, jobId: ids[1]!, input: { status: "delivered" } });
    await setJobArchived({ actor: s.actors.machinist, jobId: ids[2]!, archived: true });

    const open = await listJobs({ actor: s.actors.apprentice, query: {} });
    expect(open.total).toBe(5); // not delivered, not archived
    const inWork = await listJobs({ actor: s.actors.apprentice, query: { status: "in_work" } });
    expect(inWork.rows.map((r) => r.id)).toEqual([ids[0]]);
    const twin = await listJobs({ actor: s.actors.apprentice, query: { q: "flat twin" } });
    expect(twin.rows.map((r) => r.id)).toEqual([ids[6]]);
    const byCustomer = await listJobs({ actor: s.actors.apprentice, query: { q: "Rowing", status: "all" } });
    expect(byCustomer.total).toBe(2);
    const customers = await listCustomers({ actor: s.actors.apprentice, query: { sort: "jobCount", dir: "desc" } });
    expect(customers.rows.map((r) => [r.name, r.jobCount])).toEqual([["Harbour Rowing Club (demo)", 3]]);
    const byNumber = await listJobs({ actor: s.actors.apprentice, query: { q: "#4" } });
    expect(byNumber.rows.map((r) => r.number)).toEqual([4]);
    const due = await listJobs({ actor: s.actors.apprentice, query: { dueFrom: "2030-01-04", dueTo: "2030-01-06", sort: "dueDate", dir: "asc" } });
    expect(due.rows.map((r) => r.dueDate)).toEqual(["2030-01-04", "2030-01-05", "2030-01-06"]);
    const page2 = await listJobs({ actor: s.actors.apprentice, query: { status: "all", archived: "include", pageSize: 5, page: 2, sort: "number", dir: "asc" } });
    expect(page2.rows.map((r) => r.number)).toEqual([6, 7]);
    expect(page2.total).toBe(7);
  });

  it("keeps customers per shop, searchable and editable", async () => {
    const s = await createShopWithMembers("cust");
    const other = await createShopWithMembers("cust-other");
    const c = await createCustomer({ actor: s.actors.machinist, input: { name: "Valley Tractor Restorers (demo)", email: "", phone: "+1 555 0100" } });
    await createCustomer({ actor: other.actors.machinist, input: { name: "Valley elsewhere" } });
    const found = await listCustomers({ actor: s.actors.apprentice, query: { q: "valley" } });
    expect(found.rows.map((r) => r.name)).toEqual(["Valley Tractor Restorers (demo)"]);
    expect(found.rows[0]?.email).toBeNull();
    await expectAppError(updateCustomer({ actor: other.actors.machinist, customerId: c.id, input: { name: "taken" } }), "not_found");
    await expectAppError(createCustomer({ actor: s.actors.apprentice, input: { name: "x" } }), "forbidden");
  });

  it("answers another shop's job as not found and refuses roles without the permission", async () => {
    const s = await createShopWithMembers("jobs-perm");
    const other = await createShopWithMembers("jobs-perm-other");
    const { jobId } = await makeJob(s.actors.machinist);
    await expectAppError(getJob({ actor: other.actors.owner, jobId }), "not_found");
    await expectAppError(updateJob({ actor: other.actors.owner, jobId, input: jobInput() }), "not_found");
    await expectAppError(setJobStatus({ actor: other.actors.owner, jobId, input: { status: "delivered" } }), "not_found");
    await expectAppError(createJob({ actor: s.actors.apprentice, input: jobInput() }), "forbidden");
    await expectAppError(updateJob({ actor: s.actors.apprentice, jobId, input: jobInput() }), "forbidden");
    await expectAppError(setJobStatus({ actor: s.actors.apprentice, jobId, input: { status: "delivered" } }), "forbidden");
    await expectAppError(createJob({ actor: s.actors.machinist, input: jobInput({ assignedUserId: other.actors.apprentice.userId }) }), "bad_request");
  });
});
